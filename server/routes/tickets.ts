import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles } from '../../shared/schemas/enums.js';
import * as s from '../../shared/schemas/tickets.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { singleFile } from '../middleware/upload.js';
import { validated } from '../middleware/validate.js';
import * as files from '../services/attachments.js';
import * as tickets from '../services/tickets.js';
import { mayUploadTo } from './attachments.js';

export const ticketsRouter = Router();
ticketsRouter.use(requireAuth);

ticketsRouter.get(
  '/',
  validated({ query: s.listTicketsQuery }, async ({ query }, req, res) => {
    res.json(await tickets.listTickets(actorOf(req), query));
  }),
);
/** Open tickets by clock state, for the office board. */
ticketsRouter.get('/clock-counts', async (req, res) => {
  res.json(await tickets.clockCounts(actorOf(req)));
});
ticketsRouter.post(
  '/',
  validated({ body: s.createTicketInput }, async ({ body }, req, res) => {
    res.status(201).json(await tickets.createTicket(actorOf(req), body));
  }),
);
ticketsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await tickets.getTicket(actorOf(req), params.id));
  }),
);
ticketsRouter.patch(
  '/:id',
  validated({ params: idParams, body: s.updateTicketInput }, async ({ params, body }, req, res) => {
    res.json(await tickets.updateTicket(actorOf(req), params.id, body));
  }),
);
ticketsRouter.post(
  '/:id/merge',
  requireRole(...officeRoles),
  validated({ params: idParams, body: s.mergeTicketInput }, async ({ params, body }, req, res) => {
    res.json(await tickets.mergeTicket(actorOf(req), params.id, body.intoTicketId));
  }),
);
ticketsRouter.get(
  '/:id/comments',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await tickets.listComments(actorOf(req), params.id));
  }),
);
ticketsRouter.post(
  '/:id/comments',
  validated({ params: idParams, body: s.commentInput }, async ({ params, body }, req, res) => {
    res.status(201).json(await tickets.addComment(actorOf(req), params.id, body));
  }),
);
ticketsRouter.get(
  '/:id/attachments',
  validated({ params: idParams }, async ({ params }, req, res) => {
    const actor = actorOf(req);
    await tickets.ticketForUpload(actor, params.id);
    res.json(await files.listAttachments(actor, { ticketId: params.id }));
  }),
);
/** Photos or a short video of the fault, from the phone (multipart field `file`). */
ticketsRouter.post(
  '/:id/attachments',
  mayUploadTo((req, id) => tickets.ticketForUpload(actorOf(req), id)),
  validated({ params: idParams }, singleFile(), async ({ params }, req, res) => {
    const actor = actorOf(req);
    const ticket = await tickets.ticketForUpload(actor, params.id);
    const stored = await files.storeAttachment(actor, {
      owner: { ticketId: ticket.id },
      clientId: ticket.clientId,
      purpose: 'media',
      file: req.file!,
    });
    res.status(201).json(stored);
  }),
);

export const ticketViewsRouter = Router();
ticketViewsRouter.use(requireAuth);
ticketViewsRouter.get('/', async (req, res) => {
  res.json(await tickets.listViews(actorOf(req)));
});
ticketViewsRouter.post(
  '/',
  validated({ body: s.savedViewInput }, async ({ body }, req, res) => {
    res.status(201).json(await tickets.saveView(actorOf(req), body));
  }),
);
ticketViewsRouter.delete(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    await tickets.deleteView(actorOf(req), params.id);
    res.status(204).end();
  }),
);
