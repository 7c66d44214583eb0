import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles, staffRoles } from '../../shared/schemas/enums.js';
import { closeVisitInput, createVisitInput, listVisitsQuery, updateVisitInput } from '../../shared/schemas/visits.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';
import { contentDisposition } from '../services/attachments.js';
import * as visits from '../services/visits.js';

/**
 * Visits: everyone signed in reads what their role may see (technicians their own and the day's,
 * client users their organisation's); the office books, moves and cancels; the visit's
 * technicians start and close it.
 */
export const visitsRouter = Router();
visitsRouter.use(requireAuth);

visitsRouter.get(
  '/',
  validated({ query: listVisitsQuery }, async ({ query }, req, res) => {
    res.json(await visits.listVisits(actorOf(req), query));
  }),
);
visitsRouter.post(
  '/',
  requireRole(...officeRoles),
  validated({ body: createVisitInput }, async ({ body }, req, res) => {
    res.status(201).json(await visits.createVisit(actorOf(req), body));
  }),
);
visitsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await visits.getVisit(actorOf(req), params.id));
  }),
);
visitsRouter.patch(
  '/:id',
  requireRole(...staffRoles),
  validated({ params: idParams, body: updateVisitInput }, async ({ params, body }, req, res) => {
    res.json(await visits.updateVisit(actorOf(req), params.id, body));
  }),
);
visitsRouter.post(
  '/:id/close',
  requireRole(...staffRoles),
  validated({ params: idParams, body: closeVisitInput }, async ({ params, body }, req, res) => {
    res.json(await visits.closeVisit(actorOf(req), params.id, body));
  }),
);
/** The visit report PDF (client users download their own). */
visitsRouter.get(
  '/:id/report.pdf',
  validated({ params: idParams }, async ({ params }, req, res) => {
    const report = await visits.visitReport(actorOf(req), params.id);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', contentDisposition(report.fileName, false));
    res.setHeader('Cache-Control', 'private, no-store');
    if (Buffer.isBuffer(report.body)) return void res.end(report.body);
    report.body.on('error', () => res.destroy());
    report.body.pipe(res);
  }),
);
