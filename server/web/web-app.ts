import fs from 'node:fs';
import path from 'node:path';
import { type RequestHandler, Router } from 'express';
import expressStaticGzip from 'express-static-gzip';

/** The export names scripts and fonts after a hash of their content, so a cached copy is never stale. */
export function isContentHashed(relativePath: string): boolean {
  relativePath = relativePath.replace(/\.(br|gz)$/, '');
  const inHashedFolder = relativePath.startsWith(`_expo${path.sep}static${path.sep}`) || relativePath.startsWith(`assets${path.sep}`);
  return inHashedFolder && /[.-][0-9a-f]{20,}\.[a-z0-9]+$/.test(relativePath);
}

/**
 * Serves the exported web app; every other GET that is not under /api gets index.html,
 * so that deep links such as /sign-in or /alloys/123 open in the app.
 */
export function webApp(webDir: string): Router {
  const router = Router();
  const indexFile = path.join(webDir, 'index.html');
  // The build writes .br and .gz beside the hashed files (scripts/compress-web.js); a file without them
  // goes out as it is and the app's compression middleware compresses it on the way.
  router.use(
    expressStaticGzip(webDir, {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      index: false,
      serveStatic: {
        index: false,
        maxAge: '1h',
        setHeaders: (res, filePath) => {
          if (isContentHashed(path.relative(webDir, filePath))) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        },
      },
    }),
  );
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
