import { Router } from 'express';
import type { z } from 'zod';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles } from '../../shared/schemas/enums.js';
import { saveWallPlanRequest } from '../../shared/schemas/wall-plan.js';
import { actorOf, requireRole } from '../middleware/auth.js';
import { validate } from '../middleware/validate.js';
import { saveWallPlan } from '../services/wall-plan.js';

/**
 * A wall's plan: supply, capacities, data and power runs (mounted at /api/walls/:id/plan).
 * Written by the office; read through GET /api/walls/:id.
 */
export const wallPlanRouter = Router({ mergeParams: true });

wallPlanRouter.put('/', requireRole(...officeRoles), validate({ params: idParams, body: saveWallPlanRequest }), async (req, res) => {
  const { id } = req.valid.params as { id: string };
  res.json(await saveWallPlan(actorOf(req), id, req.valid.body as z.output<typeof saveWallPlanRequest>));
});
