import { Router } from 'express';
import { forecastSpares } from '../../shared/calc/spares.js';
import { generateRuns, validateRuns } from '../../shared/calc/runs.js';
import { dueAt } from '../../shared/calc/service-clock.js';
import { planWall } from '../../shared/calc/wall-plan.js';
import {
  dueRequest,
  runsRequest,
  runsValidateRequest,
  sparesRequest,
  wallPlanRequest,
  type DueResponse,
  type RunsResponse,
  type RunsValidateResponse,
  type SparesResponse,
  type WallPlanResponse,
} from '../../shared/schemas/calc.js';
import { requireAuth } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';

/** The trade calculators: pure computation from shared/calc, for any signed-in user. */
export const calcRouter = Router();
calcRouter.use(requireAuth);

calcRouter.post(
  '/wall-plan',
  validated({ body: wallPlanRequest }, ({ body }, _req, res) => {
    res.json(planWall(body) satisfies WallPlanResponse);
  }),
);

calcRouter.post(
  '/runs',
  validated({ body: runsRequest }, ({ body: { columns, rows, pattern, limits } }, _req, res) => {
    res.json({ runs: generateRuns(columns, rows, pattern, limits) } satisfies RunsResponse);
  }),
);

calcRouter.post(
  '/runs/validate',
  validated({ body: runsValidateRequest }, ({ body: { columns, rows, runs, limits } }, _req, res) => {
    res.json({ problems: validateRuns(columns, rows, runs, limits) } satisfies RunsValidateResponse);
  }),
);

calcRouter.post(
  '/spares',
  validated({ body: sparesRequest }, ({ body }, _req, res) => {
    res.json(forecastSpares(body) satisfies SparesResponse);
  }),
);

calcRouter.post(
  '/due',
  validated({ body: dueRequest }, ({ body }, _req, res) => {
    res.json({ due: dueAt(body).toISOString() } satisfies DueResponse);
  }),
);
