import { Router } from 'express';
import { createUserSchema, updateUserSchema } from '../../shared/schemas/users';
import { requireRole } from '../auth/session';
import { parseBody, parsePatch } from '../http/validate';
import type { UsersService } from './users.service';

export function usersRouter(service: UsersService): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/', async (_req, res) => {
    res.json({ items: await service.list() });
  });

  router.post('/', async (req, res) => {
    const user = await service.create(parseBody(createUserSchema, req.body));
    res.status(201).json({ user });
  });

  router.patch('/:id', async (req, res) => {
    const user = await service.update(req.params.id as string, parsePatch(updateUserSchema, req.body));
    res.json({ user });
  });

  return router;
}
