import { and, asc, inArray, isNull } from 'drizzle-orm';
import { Router } from 'express';
import { staffRoles } from '../../shared/schemas/enums.js';
import { db } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { requireRole } from '../middleware/auth.js';

/**
 * The team, for pickers (assignee, technicians of a visit): active staff by name, with only
 * what a picker needs. The full user list stays the admin's (`/api/users`).
 */
export const staffRouter = Router();
staffRouter.use(requireRole(...staffRoles));

staffRouter.get('/', async (_req, res) => {
  const rows = await db()
    .select({ id: users.id, name: users.name, role: users.role })
    .from(users)
    .where(and(inArray(users.role, [...staffRoles]), isNull(users.disabledAt)))
    .orderBy(asc(users.name), asc(users.id));
  res.json({ items: rows });
});
