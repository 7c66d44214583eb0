import { promisify } from 'node:util';
import { gzip } from 'node:zlib';
import express, { Router, type Request, type Response } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles, staffRoles } from '../../shared/schemas/enums.js';
import { cabinetModelInput, cabinetModelPatch } from '../../shared/schemas/cabinet-models.js';
import { cabinetPatch, listCabinetsQuery, moveCabinetInput, placeCabinetInput, swapCabinetInput } from '../../shared/schemas/cabinets.js';
import { clientInput, clientPatch, contactInput, contactPatch, listClientsQuery } from '../../shared/schemas/clients.js';
import { controllerInput, controllerPatch } from '../../shared/schemas/controllers.js';
import { searchQuery, serialTailQuery } from '../../shared/schemas/search.js';
import { listSitesQuery, siteInput, sitePatch } from '../../shared/schemas/sites.js';
import { listWallsQuery, wallInput, wallPatch } from '../../shared/schemas/walls.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';
import * as cabinets from '../services/cabinets.js';
import * as catalogue from '../services/catalogue.js';
import * as clients from '../services/clients.js';
import { search, serialsEndingIn } from '../services/search.js';
import * as sites from '../services/sites.js';
import * as walls from '../services/walls.js';
import { db } from '../db/client.js';
import { mayUploadTo } from './attachments.js';

// Thin routes: who may call → validated → service. Reads are open to every signed-in user and
// scoped by the services (client users see only their organisation); writes are the office's.
const office = requireRole(...officeRoles);

const gzipped = promisify(gzip);

/**
 * A large JSON answer, gzipped when the caller accepts it: the wall map of a full 500 × 500
 * wall (250,000 cabinets) is about 48 MB as JSON and a tenth of that gzipped. Small answers go
 * as they are.
 */
async function sendJsonCompressed(req: Request, res: Response, value: unknown) {
  const body = Buffer.from(JSON.stringify(value));
  res.vary('Accept-Encoding');
  res.type('json');
  if (body.length < 64 * 1024 || !req.acceptsEncodings('gzip')) {
    res.send(body);
    return;
  }
  res.setHeader('Content-Encoding', 'gzip');
  res.send(await gzipped(body, { level: 1 }));
}
const staff = requireRole(...staffRoles);

export const clientsRouter = Router();
clientsRouter.use(requireAuth);
clientsRouter.get(
  '/',
  validated({ query: listClientsQuery }, async ({ query }, req, res) => {
    res.json(await clients.listClients(actorOf(req), query));
  }),
);
clientsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await clients.getClient(actorOf(req), params.id));
  }),
);
clientsRouter.post(
  '/',
  office,
  validated({ body: clientInput }, async ({ body }, req, res) => {
    res.status(201).json(await clients.createClient(actorOf(req), body));
  }),
);
clientsRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: clientPatch }, async ({ params, body }, req, res) => {
    res.json(await clients.updateClient(actorOf(req), params.id, body));
  }),
);

export const servicePlansRouter = Router();
servicePlansRouter.get('/', staff, async (_req, res) => {
  res.json(await clients.listServicePlans());
});

export const contactsRouter = Router();
contactsRouter.use(office);
contactsRouter.post(
  '/',
  validated({ body: contactInput }, async ({ body }, req, res) => {
    res.status(201).json(await clients.createContact(actorOf(req), body));
  }),
);
contactsRouter.patch(
  '/:id',
  validated({ params: idParams, body: contactPatch }, async ({ params, body }, req, res) => {
    res.json(await clients.updateContact(actorOf(req), params.id, body));
  }),
);
contactsRouter.delete(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    await clients.deleteContact(actorOf(req), params.id);
    res.status(204).end();
  }),
);

export const sitesRouter = Router();
sitesRouter.use(requireAuth);
sitesRouter.get(
  '/',
  validated({ query: listSitesQuery }, async ({ query }, req, res) => {
    res.json(await sites.listSites(actorOf(req), query));
  }),
);
sitesRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await sites.getSite(actorOf(req), params.id));
  }),
);
sitesRouter.post(
  '/',
  office,
  validated({ body: siteInput }, async ({ body }, req, res) => {
    res.status(201).json(await sites.createSite(actorOf(req), body));
  }),
);
sitesRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: sitePatch }, async ({ params, body }, req, res) => {
    res.json(await sites.updateSite(actorOf(req), params.id, body));
  }),
);

export const wallsRouter = Router();
wallsRouter.use(requireAuth);
wallsRouter.get(
  '/',
  validated({ query: listWallsQuery }, async ({ query }, req, res) => {
    res.json(await walls.listWalls(actorOf(req), query));
  }),
);
wallsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await walls.getWall(actorOf(req), params.id));
  }),
);
wallsRouter.get(
  '/:id/cabinets',
  validated({ params: idParams }, async ({ params }, req, res) => {
    await sendJsonCompressed(req, res, await walls.wallCabinets(actorOf(req), params.id));
  }),
);
wallsRouter.post(
  '/',
  office,
  validated({ body: wallInput }, async ({ body }, req, res) => {
    res.status(201).json(await walls.createWall(actorOf(req), body));
  }),
);
wallsRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: wallPatch }, async ({ params, body }, req, res) => {
    res.json(await walls.updateWall(actorOf(req), params.id, body));
  }),
);
wallsRouter.post(
  '/:id/cabinets',
  office,
  validated({ params: idParams, body: placeCabinetInput }, async ({ params, body }, req, res) => {
    res.status(201).json(await cabinets.placeCabinet(actorOf(req), params.id, body));
  }),
);
wallsRouter.post(
  '/:id/cabinets/import',
  office,
  // The wall first: a file for a wall that is not there is refused before it is read.
  mayUploadTo((req, id) => walls.visibleWall(db(), actorOf(req), id)),
  express.text({ type: ['text/csv', 'text/plain', 'application/csv'], limit: '8mb' }),
  validated({ params: idParams }, async ({ params }, req, res) => {
    const csv = typeof req.body === 'string' ? req.body : '';
    res.status(201).json(await cabinets.importCabinets(actorOf(req), params.id, csv));
  }),
);

export const cabinetsRouter = Router();
cabinetsRouter.use(requireAuth);
cabinetsRouter.get(
  '/',
  validated({ query: listCabinetsQuery }, async ({ query }, req, res) => {
    res.json(await cabinets.listCabinets(actorOf(req), query));
  }),
);
cabinetsRouter.get('/by-serial/:serial', async (req, res) => {
  res.json(await cabinets.getCabinet(actorOf(req), { serial: String(req.params.serial).slice(0, 64) }));
});
cabinetsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await cabinets.getCabinet(actorOf(req), { id: params.id }));
  }),
);
// Technicians move and swap cabinets on site (a cabinet swap is a repair action).
cabinetsRouter.post(
  '/:id/move',
  staff,
  validated({ params: idParams, body: moveCabinetInput }, async ({ params, body }, req, res) => {
    res.json(await cabinets.moveCabinet(actorOf(req), params.id, body));
  }),
);
cabinetsRouter.post(
  '/:id/swap',
  staff,
  validated({ params: idParams, body: swapCabinetInput }, async ({ params, body }, req, res) => {
    res.json(await cabinets.swapCabinets(actorOf(req), params.id, body));
  }),
);
cabinetsRouter.patch(
  '/:id',
  staff,
  validated({ params: idParams, body: cabinetPatch }, async ({ params, body }, req, res) => {
    res.json(await cabinets.updateCabinet(actorOf(req), params.id, body));
  }),
);

export const cabinetModelsRouter = Router();
cabinetModelsRouter.use(requireAuth);
cabinetModelsRouter.get('/', async (_req, res) => {
  res.json(await catalogue.listCabinetModels());
});
cabinetModelsRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, _req, res) => {
    res.json(await catalogue.getCabinetModel(params.id));
  }),
);
cabinetModelsRouter.post(
  '/',
  office,
  validated({ body: cabinetModelInput }, async ({ body }, req, res) => {
    res.status(201).json(await catalogue.createCabinetModel(actorOf(req), body));
  }),
);
cabinetModelsRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: cabinetModelPatch }, async ({ params, body }, req, res) => {
    res.json(await catalogue.updateCabinetModel(actorOf(req), params.id, body));
  }),
);

export const controllersRouter = Router();
controllersRouter.use(requireAuth);
controllersRouter.get('/', async (req, res) => {
  const wallId = typeof req.query.wallId === 'string' && /^[0-9a-f-]{36}$/i.test(req.query.wallId) ? req.query.wallId : undefined;
  res.json(await catalogue.listControllers(actorOf(req), wallId));
});
controllersRouter.get(
  '/:id',
  validated({ params: idParams }, async ({ params }, req, res) => {
    res.json(await catalogue.getController(actorOf(req), params.id));
  }),
);
controllersRouter.post(
  '/',
  office,
  validated({ body: controllerInput }, async ({ body }, req, res) => {
    res.status(201).json(await catalogue.createController(actorOf(req), body));
  }),
);
controllersRouter.patch(
  '/:id',
  office,
  validated({ params: idParams, body: controllerPatch }, async ({ params, body }, req, res) => {
    res.json(await catalogue.updateController(actorOf(req), params.id, body));
  }),
);

export const searchRouter = Router();
searchRouter.get(
  '/',
  requireAuth,
  validated({ query: searchQuery }, async ({ query }, req, res) => {
    res.json(await search(actorOf(req), query.q));
  }),
);
// The Scan page's typed lookup: the serial, or the serials ending in what was read off a label.
searchRouter.get(
  '/serials',
  requireAuth,
  validated({ query: serialTailQuery }, async ({ query }, req, res) => {
    res.json(await serialsEndingIn(actorOf(req), query.tail));
  }),
);
