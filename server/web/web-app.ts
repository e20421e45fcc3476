import fs from 'node:fs';
import path from 'node:path';
import express, { type RequestHandler, Router } from 'express';

/**
 * Serves the exported web app; every other GET that is not under /api gets index.html,
 * so that deep links such as /sign-in or /alloys/123 open in the app.
 */
export function webApp(webDir: string): Router {
  const router = Router();
  const indexFile = path.join(webDir, 'index.html');
  router.use(express.static(webDir, { index: false, maxAge: '1h' }));
  const fallback: RequestHandler = (req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path.startsWith('/api/') || req.path === '/api') {
      return next();
    }
    if (!fs.existsSync(indexFile)) {
      res
        .status(503)
        .type('text/plain')
        .send('The Dilato web app has not been built yet. Run `npm start` (it builds it) or `npm run build:web`.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  };
  router.use(fallback);
  return router;
}
