import { Router } from 'express';
import { inviteUserInput, updateUserInput, type InviteUserInput, type UpdateUserInput } from '../../shared/schemas/auth.js';
import { idParams } from '../../shared/schemas/common.js';
import { listAuditQuery, listUsersQuery, type ListAuditQuery, type ListUsersQuery } from '../../shared/schemas/users.js';
import { actorOf, requireRole } from '../middleware/auth.js';
import { validate } from '../middleware/validate.js';
import * as users from '../services/users.js';

export const usersRouter = Router();
usersRouter.use(requireRole('admin'));

usersRouter.get('/', validate({ query: listUsersQuery }), async (req, res) => {
  res.json(await users.listUsers(req.valid.query as ListUsersQuery));
});

usersRouter.post('/', validate({ body: inviteUserInput }), async (req, res) => {
  res.status(201).json(await users.inviteUser(actorOf(req), req.valid.body as InviteUserInput));
});

usersRouter.patch('/:id', validate({ params: idParams, body: updateUserInput }), async (req, res) => {
  const { id } = req.valid.params as { id: string };
  res.json(await users.updateUser(actorOf(req), id, req.valid.body as UpdateUserInput));
});

usersRouter.post('/:id/invite', validate({ params: idParams }), async (req, res) => {
  await users.resendInvite(actorOf(req), (req.valid.params as { id: string }).id);
  res.status(202).json({ message: 'Invitation sent again.' });
});

export const auditRouter = Router();
auditRouter.use(requireRole('admin'));

auditRouter.get('/', validate({ query: listAuditQuery }), async (req, res) => {
  res.json(await users.listAudit(req.valid.query as ListAuditQuery));
});
