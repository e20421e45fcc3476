import { Router } from 'express';
import { preferencesSchema } from '../../shared/schemas/preferences';
import { currentUser, requireSignedIn } from '../auth/session';
import { parseBody } from '../http/validate';
import type { PreferencesService } from './preferences.service';

/** The signed-in user's own preferences; there is no way to read or write another user's. */
export function preferencesRouter(service: PreferencesService): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/preferences', async (req, res) => {
    res.json({ preferences: await service.get(currentUser(req).id) });
  });

  router.put('/preferences', async (req, res) => {
    res.json({ preferences: await service.set(currentUser(req).id, parseBody(preferencesSchema, req.body)) });
  });

  return router;
}
