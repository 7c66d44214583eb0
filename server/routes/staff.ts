import { Router } from 'express';
import { staffRoles } from '../../shared/schemas/enums.js';
import { requireRole } from '../middleware/auth.js';
import { listStaff } from '../services/users.js';

/** The team, for pickers: active staff by name (the full user list stays the admin's). */
export const staffRouter = Router();
staffRouter.use(requireRole(...staffRoles));

staffRouter.get('/', async (_req, res) => {
  res.json(await listStaff());
});
