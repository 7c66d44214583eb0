import { Router } from 'express';
import type { z } from 'zod';
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
import { validate } from '../middleware/validate.js';

/** The trade calculators: pure computation from shared/calc, for any signed-in user. */
export const calcRouter = Router();
calcRouter.use(requireAuth);

calcRouter.post('/wall-plan', validate({ body: wallPlanRequest }), (req, res) => {
  const body = req.valid.body as z.output<typeof wallPlanRequest>;
  res.json(planWall(body) satisfies WallPlanResponse);
});

calcRouter.post('/runs', validate({ body: runsRequest }), (req, res) => {
  const { columns, rows, pattern, limits } = req.valid.body as z.output<typeof runsRequest>;
  res.json({ runs: generateRuns(columns, rows, pattern, limits) } satisfies RunsResponse);
});

calcRouter.post('/runs/validate', validate({ body: runsValidateRequest }), (req, res) => {
  const { columns, rows, runs, limits } = req.valid.body as z.output<typeof runsValidateRequest>;
  res.json({ problems: validateRuns(columns, rows, runs, limits) } satisfies RunsValidateResponse);
});

calcRouter.post('/spares', validate({ body: sparesRequest }), (req, res) => {
  res.json(forecastSpares(req.valid.body as z.output<typeof sparesRequest>) satisfies SparesResponse);
});

calcRouter.post('/due', validate({ body: dueRequest }), (req, res) => {
  const due = dueAt(req.valid.body as z.output<typeof dueRequest>);
  res.json({ due: due.toISOString() } satisfies DueResponse);
});
