import { Router } from 'express';
import { signInSchema } from '../../shared/schemas/auth';
import { parseBody } from '../http/validate';
import type { AuthService } from './auth.service';
import type { Auth } from './lucia';
import { writeSessionCookie } from './session';

export function authRouter(auth: Auth, service: AuthService): Router {
  const router = Router();

  router.post('/sign-in', async (req, res) => {
    const input = parseBody(signInSchema, req.body);
    const { user, sessionId } = await service.signIn(input, req.ip);
    writeSessionCookie(auth, req, res, sessionId);
    res.json({ user });
  });

  router.post('/sign-out', async (req, res) => {
    if (req.sessionId) await service.signOut(req.sessionId);
    writeSessionCookie(auth, req, res, null);
    res.status(204).end();
  });

  // Asked on every page load: being signed out is an answer, not an error.
  router.get('/me', (req, res) => {
    res.json({ user: req.user ?? null });
  });

  return router;
}
