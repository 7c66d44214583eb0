import {
  partsRouter,
  reorderPointsRouter,
  stockLocationsRouter,
  stockMovementsRouter,
  stockRouter,
  vendorReturnsRouter,
  wallSparesRouter,
} from './stock.js';
import type { Router } from 'express';
import { attachmentsRouter, wallDocumentsRouter } from './attachments.js';
import { authRouter } from './auth.js';
import { boardRouter } from './board.js';
import { calcRouter } from './calc.js';
import { devRouter } from './dev.js';
import {
  cabinetModelsRouter,
  cabinetsRouter,
  clientsRouter,
  contactsRouter,
  controllersRouter,
  searchRouter,
  servicePlansRouter,
  sitesRouter,
  wallsRouter,
} from './register.js';
import { repairsRouter } from './repairs.js';
import { staffRouter } from './staff.js';
import { ticketsRouter, ticketViewsRouter } from './tickets.js';
import { auditRouter, usersRouter } from './users.js';
import { visitsRouter } from './visits.js';
import { wallFromPlanRouter, wallPlanRouter } from './wall-plan.js';

/** Mounts every API router under /api. Keep one line per domain. */
export function apiRoutes(api: Router) {
  api.use('/dev', devRouter);
  api.use('/auth', authRouter);
  api.use('/calc', calcRouter);
  api.use('/users', usersRouter);
  api.use('/audit', auditRouter);
  api.use('/clients', clientsRouter);
  api.use('/service-plans', servicePlansRouter);
  api.use('/contacts', contactsRouter);
  api.use('/sites', sitesRouter);
  api.use('/walls/:id/documents', wallDocumentsRouter);
  api.use('/walls/:id/plan', wallPlanRouter);
  api.use('/walls/:id/spares', wallSparesRouter);
  api.use('/walls/from-plan', wallFromPlanRouter);
  api.use('/walls', wallsRouter);
  api.use('/attachments', attachmentsRouter);
  api.use('/cabinets', cabinetsRouter);
  api.use('/cabinet-models', cabinetModelsRouter);
  api.use('/controllers', controllersRouter);
  api.use('/search', searchRouter);
  api.use('/tickets', ticketsRouter);
  api.use('/ticket-views', ticketViewsRouter);
  api.use('/staff', staffRouter);
  api.use('/stock', stockRouter);
  api.use('/stock-movements', stockMovementsRouter);
  api.use('/parts', partsRouter);
  api.use('/stock-locations', stockLocationsRouter);
  api.use('/vendor-returns', vendorReturnsRouter);
  api.use('/reorder-points', reorderPointsRouter);
  api.use('/repairs', repairsRouter);
  api.use('/visits', visitsRouter);
  api.use('/board', boardRouter);
}
