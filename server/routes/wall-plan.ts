import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles } from '../../shared/schemas/enums.js';
import { createWallFromPlanRequest, saveWallPlanRequest } from '../../shared/schemas/wall-plan.js';
import { actorOf, requireRole } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';
import { createWallFromPlan, saveWallPlan } from '../services/wall-plan.js';

/**
 * A wall's plan: supply, capacities, data and power runs (mounted at /api/walls/:id/plan).
 * Written by the office; read through GET /api/walls/:id.
 */
export const wallPlanRouter = Router({ mergeParams: true });

wallPlanRouter.put(
  '/',
  requireRole(...officeRoles),
  validated({ params: idParams, body: saveWallPlanRequest }, async ({ params, body }, req, res) => {
    res.json(await saveWallPlan(actorOf(req), params.id, body));
  }),
);

/**
 * A new wall from the planner's result, with the plan stored on it (mounted at
 * /api/walls/from-plan, ahead of the walls router). Written by the office.
 */
export const wallFromPlanRouter = Router();

wallFromPlanRouter.post(
  '/',
  requireRole(...officeRoles),
  validated({ body: createWallFromPlanRequest }, async ({ body }, req, res) => {
    res.status(201).json(await createWallFromPlan(actorOf(req), body));
  }),
);
