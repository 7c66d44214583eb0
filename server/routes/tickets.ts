import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles } from '../../shared/schemas/enums.js';
import * as s from '../../shared/schemas/tickets.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { singleFile } from '../middleware/upload.js';
import { validate } from '../middleware/validate.js';
import * as files from '../services/attachments.js';
import * as tickets from '../services/tickets.js';

export const ticketsRouter = Router();
ticketsRouter.use(requireAuth);
const id = (req: { valid: { params?: unknown } }) => (req.valid.params as { id: string }).id;

ticketsRouter.get('/', validate({ query: s.listTicketsQuery }), async (req, res) => {
  res.json(await tickets.listTickets(actorOf(req), req.valid.query as s.ListTicketsQuery));
});
/** Open tickets by clock state, for the office board. */
ticketsRouter.get('/clock-counts', async (req, res) => {
  res.json(await tickets.clockCounts(actorOf(req)));
});
ticketsRouter.post('/', validate({ body: s.createTicketInput }), async (req, res) => {
  res.status(201).json(await tickets.createTicket(actorOf(req), req.valid.body as s.CreateTicketInput));
});
ticketsRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await tickets.getTicket(actorOf(req), id(req)));
});
ticketsRouter.patch('/:id', validate({ params: idParams, body: s.updateTicketInput }), async (req, res) => {
  res.json(await tickets.updateTicket(actorOf(req), id(req), req.valid.body as s.UpdateTicketInput));
});
ticketsRouter.post('/:id/merge', requireRole(...officeRoles), validate({ params: idParams, body: s.mergeTicketInput }), async (req, res) => {
  res.json(await tickets.mergeTicket(actorOf(req), id(req), (req.valid.body as { intoTicketId: string }).intoTicketId));
});
ticketsRouter.get('/:id/comments', validate({ params: idParams }), async (req, res) => {
  res.json(await tickets.listComments(actorOf(req), id(req)));
});
ticketsRouter.post('/:id/comments', validate({ params: idParams, body: s.commentInput }), async (req, res) => {
  res.status(201).json(await tickets.addComment(actorOf(req), id(req), req.valid.body as s.CommentInput));
});
ticketsRouter.get('/:id/attachments', validate({ params: idParams }), async (req, res) => {
  const actor = actorOf(req);
  await tickets.ticketForUpload(actor, id(req));
  res.json({ items: await files.listAttachments(actor, { ticketId: id(req) }) });
});
/** Photos or a short video of the fault, from the phone (multipart field `file`). */
ticketsRouter.post('/:id/attachments', validate({ params: idParams }), singleFile(), async (req, res) => {
  const actor = actorOf(req);
  const ticket = await tickets.ticketForUpload(actor, id(req));
  const stored = await files.storeAttachment(actor, { owner: { ticketId: ticket.id }, clientId: ticket.clientId, purpose: 'media', file: req.file! });
  res.status(201).json(stored);
});

export const ticketViewsRouter = Router();
ticketViewsRouter.use(requireAuth);
ticketViewsRouter.get('/', async (req, res) => {
  res.json(await tickets.listViews(actorOf(req)));
});
ticketViewsRouter.post('/', validate({ body: s.savedViewInput }), async (req, res) => {
  res.status(201).json(await tickets.saveView(actorOf(req), req.valid.body as s.SavedViewInput));
});
ticketViewsRouter.delete('/:id', validate({ params: idParams }), async (req, res) => {
  await tickets.deleteView(actorOf(req), id(req));
  res.status(204).end();
});
