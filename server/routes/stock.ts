import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { staffRoles } from '../../shared/schemas/enums.js';
import {
  listPartsQuery,
  listStockLocationsQuery,
  listStockMovementsQuery,
  listStockQuery,
  stockMovementInput,
} from '../../shared/schemas/stock.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';
import * as stock from '../services/stock.js';
import { z } from 'zod';

const staff = requireRole(...staffRoles);

/** Quantities on hand: staff see every location, client users their own site kits' counts. */
export const stockRouter = Router();
stockRouter.use(requireAuth);
stockRouter.get(
  '/',
  validated({ query: listStockQuery }, async ({ query }, req, res) => {
    res.json(await stock.listStock(actorOf(req), query));
  }),
);
/** Reorder points at or below their mark (the office's low-stock list). */
stockRouter.get('/low', staff, async (_req, res) => {
  res.json(await stock.lowStock());
});

/** The ledger: staff read it; the office, and technicians within their rules, write it. */
export const stockMovementsRouter = Router();
stockMovementsRouter.use(staff);
stockMovementsRouter.get(
  '/',
  validated({ query: listStockMovementsQuery }, async ({ query }, _req, res) => {
    res.json(await stock.listMovements(query));
  }),
);
stockMovementsRouter.post(
  '/',
  validated({ body: stockMovementInput }, async ({ body }, req, res) => {
    res.status(201).json(await stock.recordMovement(actorOf(req), body));
  }),
);

export const partsRouter = Router();
partsRouter.use(staff);
partsRouter.get(
  '/',
  validated({ query: listPartsQuery }, async ({ query }, _req, res) => {
    res.json(await stock.listParts(query));
  }),
);

export const stockLocationsRouter = Router();
stockLocationsRouter.use(requireAuth);
stockLocationsRouter.get(
  '/',
  validated({ query: listStockLocationsQuery }, async ({ query }, req, res) => {
    res.json(await stock.listStockLocations(actorOf(req), query));
  }),
);

/** Spares for a wall's model, the wall's own batches first (mounted under /walls/:id/spares). */
export const wallSparesRouter = Router({ mergeParams: true });
wallSparesRouter.use(staff);
wallSparesRouter.get(
  '/',
  validated({ params: idParams, query: z.object({ locationId: z.uuid().optional() }) }, async ({ params, query }, _req, res) => {
    res.json(await stock.wallSpares(params.id, query.locationId));
  }),
);
