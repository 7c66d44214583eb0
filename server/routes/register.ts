import express, { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles, staffRoles } from '../../shared/schemas/enums.js';
import * as s from '../../shared/schemas/register.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { validate } from '../middleware/validate.js';
import * as cabinets from '../services/cabinets.js';
import * as catalogue from '../services/catalogue.js';
import * as clients from '../services/clients.js';
import { search } from '../services/search.js';
import * as sites from '../services/sites.js';
import * as walls from '../services/walls.js';

// Thin routes: who may call → validate → service. Reads are open to every signed-in user and
// scoped by the services (client users see only their organisation); writes are the office's.
const office = requireRole(...officeRoles);
const staff = requireRole(...staffRoles);
const id = (req: { valid: { params?: unknown } }) => (req.valid.params as { id: string }).id;

export const clientsRouter = Router();
clientsRouter.use(requireAuth);
clientsRouter.get('/', validate({ query: s.listClientsQuery }), async (req, res) => {
  res.json(await clients.listClients(actorOf(req), req.valid.query as s.ListClientsQuery));
});
clientsRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await clients.getClient(actorOf(req), id(req)));
});
clientsRouter.post('/', office, validate({ body: s.clientInput }), async (req, res) => {
  res.status(201).json(await clients.createClient(actorOf(req), req.valid.body as s.ClientInput));
});
clientsRouter.patch('/:id', office, validate({ params: idParams, body: s.clientPatch }), async (req, res) => {
  res.json(await clients.updateClient(actorOf(req), id(req), req.valid.body as s.ClientPatch));
});

export const servicePlansRouter = Router();
servicePlansRouter.get('/', staff, async (_req, res) => {
  res.json(await clients.listServicePlans());
});

export const contactsRouter = Router();
contactsRouter.use(office);
contactsRouter.post('/', validate({ body: s.contactInput }), async (req, res) => {
  res.status(201).json(await clients.createContact(actorOf(req), req.valid.body as s.ContactInput));
});
contactsRouter.patch('/:id', validate({ params: idParams, body: s.contactPatch }), async (req, res) => {
  res.json(await clients.updateContact(actorOf(req), id(req), req.valid.body as s.ContactPatch));
});
contactsRouter.delete('/:id', validate({ params: idParams }), async (req, res) => {
  await clients.deleteContact(actorOf(req), id(req));
  res.status(204).end();
});

export const sitesRouter = Router();
sitesRouter.use(requireAuth);
sitesRouter.get('/', validate({ query: s.listSitesQuery }), async (req, res) => {
  res.json(await sites.listSites(actorOf(req), req.valid.query as s.ListSitesQuery));
});
sitesRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await sites.getSite(actorOf(req), id(req)));
});
sitesRouter.post('/', office, validate({ body: s.siteInput }), async (req, res) => {
  res.status(201).json(await sites.createSite(actorOf(req), req.valid.body as s.SiteInput));
});
sitesRouter.patch('/:id', office, validate({ params: idParams, body: s.sitePatch }), async (req, res) => {
  res.json(await sites.updateSite(actorOf(req), id(req), req.valid.body as s.SitePatch));
});

export const wallsRouter = Router();
wallsRouter.use(requireAuth);
wallsRouter.get('/', validate({ query: s.listWallsQuery }), async (req, res) => {
  res.json(await walls.listWalls(actorOf(req), req.valid.query as s.ListWallsQuery));
});
wallsRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await walls.getWall(actorOf(req), id(req)));
});
wallsRouter.get('/:id/cabinets', validate({ params: idParams }), async (req, res) => {
  res.json(await walls.wallCabinets(actorOf(req), id(req)));
});
wallsRouter.post('/', office, validate({ body: s.wallInput }), async (req, res) => {
  res.status(201).json(await walls.createWall(actorOf(req), req.valid.body as s.WallInput));
});
wallsRouter.patch('/:id', office, validate({ params: idParams, body: s.wallPatch }), async (req, res) => {
  res.json(await walls.updateWall(actorOf(req), id(req), req.valid.body as s.WallPatch));
});
wallsRouter.post('/:id/cabinets', office, validate({ params: idParams, body: s.placeCabinetInput }), async (req, res) => {
  res.status(201).json(await cabinets.placeCabinet(actorOf(req), id(req), req.valid.body as s.PlaceCabinetInput));
});
wallsRouter.post(
  '/:id/cabinets/import',
  office,
  express.text({ type: ['text/csv', 'text/plain', 'application/csv'], limit: '8mb' }),
  validate({ params: idParams }),
  async (req, res) => {
    const csv = typeof req.body === 'string' ? req.body : '';
    res.status(201).json(await cabinets.importCabinets(actorOf(req), id(req), csv));
  },
);

export const cabinetsRouter = Router();
cabinetsRouter.use(requireAuth);
cabinetsRouter.get('/', validate({ query: s.listCabinetsQuery }), async (req, res) => {
  res.json(await cabinets.listCabinets(actorOf(req), req.valid.query as s.ListCabinetsQuery));
});
cabinetsRouter.get('/by-serial/:serial', async (req, res) => {
  res.json(await cabinets.getCabinet(actorOf(req), { serial: String(req.params.serial).slice(0, 64) }));
});
cabinetsRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await cabinets.getCabinet(actorOf(req), { id: id(req) }));
});
// Technicians move and swap cabinets on site (a cabinet swap is a repair action).
cabinetsRouter.post('/:id/move', staff, validate({ params: idParams, body: s.moveCabinetInput }), async (req, res) => {
  res.json(await cabinets.moveCabinet(actorOf(req), id(req), req.valid.body as s.MoveCabinetInput));
});
cabinetsRouter.post('/:id/swap', staff, validate({ params: idParams, body: s.swapCabinetInput }), async (req, res) => {
  res.json(await cabinets.swapCabinets(actorOf(req), id(req), req.valid.body as s.SwapCabinetInput));
});
cabinetsRouter.patch('/:id', staff, validate({ params: idParams, body: s.cabinetPatch }), async (req, res) => {
  res.json(await cabinets.updateCabinet(actorOf(req), id(req), req.valid.body as s.CabinetPatch));
});

export const cabinetModelsRouter = Router();
cabinetModelsRouter.use(requireAuth);
cabinetModelsRouter.get('/', async (_req, res) => {
  res.json(await catalogue.listCabinetModels());
});
cabinetModelsRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await catalogue.getCabinetModel(id(req)));
});
cabinetModelsRouter.post('/', office, validate({ body: s.cabinetModelInput }), async (req, res) => {
  res.status(201).json(await catalogue.createCabinetModel(actorOf(req), req.valid.body as s.CabinetModelInput));
});
cabinetModelsRouter.patch('/:id', office, validate({ params: idParams, body: s.cabinetModelPatch }), async (req, res) => {
  res.json(await catalogue.updateCabinetModel(actorOf(req), id(req), req.valid.body as s.CabinetModelPatch));
});

export const controllersRouter = Router();
controllersRouter.use(requireAuth);
controllersRouter.get('/', async (req, res) => {
  const wallId = typeof req.query.wallId === 'string' && /^[0-9a-f-]{36}$/i.test(req.query.wallId) ? req.query.wallId : undefined;
  res.json(await catalogue.listControllers(actorOf(req), wallId));
});
controllersRouter.get('/:id', validate({ params: idParams }), async (req, res) => {
  res.json(await catalogue.getController(actorOf(req), id(req)));
});
controllersRouter.post('/', office, validate({ body: s.controllerInput }), async (req, res) => {
  res.status(201).json(await catalogue.createController(actorOf(req), req.valid.body as s.ControllerInput));
});
controllersRouter.patch('/:id', office, validate({ params: idParams, body: s.controllerPatch }), async (req, res) => {
  res.json(await catalogue.updateController(actorOf(req), id(req), req.valid.body as s.ControllerPatch));
});

export const searchRouter = Router();
searchRouter.get('/', requireAuth, validate({ query: s.searchQuery }), async (req, res) => {
  res.json(await search(actorOf(req), (req.valid.query as { q: string }).q));
});
