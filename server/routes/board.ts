import { Router } from 'express';
import type { BoardWalls } from '../../shared/schemas/board.js';
import { officeRoles } from '../../shared/schemas/enums.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import * as board from '../services/board.js';

/**
 * The office's Today board. Only the office has it (technicians start on their own day, client
 * users on their overview): a technician gets 403, a client user 404 like every staff-only area.
 */
export const boardRouter = Router();
boardRouter.use(requireAuth, requireRole(...officeRoles));

/** The walls with open tickets, worst first, with their next visits; tickets on no wall; the counts. */
boardRouter.get('/walls', async (req, res) => {
  res.json((await board.boardWalls(actorOf(req))) satisfies BoardWalls);
});
