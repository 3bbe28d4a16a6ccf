// User administration for admins.
import { createUserSchema, updateUserSchema, userListQuerySchema } from '../../shared/users/user-schemas.js';
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { createUser, listUsers, updateUser } from './users-service.js';

export function usersRoutes(context: AppContext) {
  const router = createSecureRouter('/api/users');
  const admin = { roles: ['admin'] } as const;

  router.get('/', admin, async (req, res) => {
    res.json(await listUsers(parseInput(userListQuerySchema, req.query, 'query')));
  });

  router.post('/', admin, async (req, res) => {
    const input = parseInput(createUserSchema, req.body, 'user');
    res.status(201).json(await createUser(context, req.user!.id, input));
  });

  router.patch('/:id', admin, async (req, res) => {
    const input = parseInput(updateUserSchema, req.body, 'user');
    res.json(await updateUser(context, req.user!.id, parseIdParam(req.params.id), input));
  });

  return router;
}
