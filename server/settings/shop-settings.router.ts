import { Router } from 'express';
import { shopSettingsSchema } from '../../shared/schemas/shop-settings';
import { requireRole, requireSignedIn } from '../auth/session';
import { parseBody } from '../http/validate';
import type { ShopSettingsService } from './shop-settings.service';

export function shopSettingsRouter(service: ShopSettingsService): Router {
  const router = Router();
  router.get('/', requireSignedIn, async (_req, res) => {
    res.json({ settings: await service.get() });
  });
  router.put('/', requireRole('admin'), async (req, res) => {
    res.json({ settings: await service.save(parseBody(shopSettingsSchema, req.body), req.user!.name) });
  });
  return router;
}
