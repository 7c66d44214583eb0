import { Router } from 'express';
import { inviteUserInput, updateUserInput } from '../../shared/schemas/auth.js';
import { idParams } from '../../shared/schemas/common.js';
import { listAuditQuery, listUsersQuery } from '../../shared/schemas/users.js';
import { actorOf, requireRole } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';
import * as users from '../services/users.js';

export const usersRouter = Router();
usersRouter.use(requireRole('admin'));

usersRouter.get(
  '/',
  validated({ query: listUsersQuery }, async ({ query }, _req, res) => {
    res.json(await users.listUsers(query));
  }),
);

usersRouter.post(
  '/',
  validated({ body: inviteUserInput }, async ({ body }, req, res) => {
    res.status(201).json(await users.inviteUser(actorOf(req), body));
  }),
);

usersRouter.patch(
  '/:id',
  validated({ params: idParams, body: updateUserInput }, async ({ params, body }, req, res) => {
    res.json(await users.updateUser(actorOf(req), params.id, body));
  }),
);

usersRouter.post(
  '/:id/invite',
  validated({ params: idParams }, async ({ params }, req, res) => {
    await users.resendInvite(actorOf(req), params.id);
    res.status(202).json({ message: 'Invitation sent again.' });
  }),
);

export const auditRouter = Router();
auditRouter.use(requireRole('admin'));

auditRouter.get(
  '/',
  validated({ query: listAuditQuery }, async ({ query }, _req, res) => {
    res.json(await users.listAudit(query));
  }),
);
