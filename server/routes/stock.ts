import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { staffRoles } from '../../shared/schemas/enums.js';
import {
  listPartsQuery,
  listStockLocationsQuery,
  listStockMovementsQuery,
  listStockQuery,
  listVendorReturnsQuery,
  partInput,
  partPatch,
  reorderPointInput,
  restockQuery,
  stockLocationInput,
  stockLocationPatch,
  stockMovementInput,
  vendorReturnInput,
  vendorReturnPatch,
} from '../../shared/schemas/stock.js';
import { officeRoles } from '../../shared/schemas/enums.js';
import * as restock from '../services/restock.js';
import * as returns from '../services/vendor-returns.js';
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
/** What each wall's site kit should hold of its own batches, and what to send (spares forecast). */
stockRouter.get(
  '/restock',
  staff,
  validated({ query: restockQuery }, async ({ query }, _req, res) => {
    res.json(await restock.restockList(query.serviceLevel));
  }),
);
/** Whole spare cabinets on the shelves, by model, batch and location. */
stockRouter.get(
  '/spare-cabinets',
  validated({ query: z.object({ locationId: z.uuid().optional() }) }, async ({ query }, req, res) => {
    res.json(await stock.spareCabinets(actorOf(req), query.locationId));
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

const office = requireRole(...officeRoles);
partsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, _req, res) => {
    res.json(await stock.getPart(params.id));
  }),
);
partsRouter.post(
  '/',
  office,
  validated({ body: partInput }, async ({ body }, req, res) => {
    res.status(201).json(await stock.createPart(actorOf(req), body));
  }),
);
partsRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: partPatch }, async ({ params, body }, req, res) => {
    res.json(await stock.updatePart(actorOf(req), params.id, body));
  }),
);

/** Reorder points per part and location (the office's). */
export const reorderPointsRouter = Router();
reorderPointsRouter.use(office);
reorderPointsRouter.put(
  '/',
  validated({ body: reorderPointInput }, async ({ body }, req, res) => {
    res.json(await stock.setReorderPoint(actorOf(req), body));
  }),
);
reorderPointsRouter.delete(
  '/',
  validated({ query: z.object({ partId: z.uuid(), locationId: z.uuid() }) }, async ({ query }, req, res) => {
    await stock.removeReorderPoint(actorOf(req), query.partId, query.locationId);
    res.status(204).end();
  }),
);

export const stockLocationsRouter = Router();
stockLocationsRouter.use(requireAuth);
stockLocationsRouter.post(
  '/',
  office,
  validated({ body: stockLocationInput }, async ({ body }, req, res) => {
    res.status(201).json(await stock.createStockLocation(actorOf(req), body));
  }),
);
stockLocationsRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: stockLocationPatch }, async ({ params, body }, req, res) => {
    res.json(await stock.updateStockLocation(actorOf(req), params.id, body));
  }),
);
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

/** Failed parts sent back to their maker: staff read them, the office records them. */
export const vendorReturnsRouter = Router();
vendorReturnsRouter.use(staff);
vendorReturnsRouter.get(
  '/',
  validated({ query: listVendorReturnsQuery }, async ({ query }, _req, res) => {
    res.json(await returns.listVendorReturns(query));
  }),
);
vendorReturnsRouter.post(
  '/',
  office,
  validated({ body: vendorReturnInput }, async ({ body }, req, res) => {
    res.status(201).json(await returns.openVendorReturn(actorOf(req), body));
  }),
);
vendorReturnsRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: vendorReturnPatch }, async ({ params, body }, req, res) => {
    res.json(await returns.updateVendorReturn(actorOf(req), params.id, body));
  }),
);
