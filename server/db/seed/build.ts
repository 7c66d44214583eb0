// Turns the demo's story (register.ts, work.ts) into table rows, with every cross-reference,
// timestamp and stock quantity consistent. Pure: no database access.
import { addMonths, addYears, differenceInCalendarDays, parseISO } from 'date-fns';
import type * as schema from '../schema/index.js';
import type { ChecklistItem } from '../schema/visits.js';
import { planClock, ticketDueTimes } from '../../services/ticket-clock.js';
import { cellLabel } from '../../../shared/calc/grid.js';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS } from '../../../shared/calc/video-signal.js';
import { asBuiltPlan, dataLinesInUse } from './as-built.js';
import { demoAuditTrail } from './audit-trail.js';
import { createClock, HOUR } from './clock.js';
import { settleLedger, type Move } from './ledger.js';
import { createRandom } from './random.js';
import {
  clientSpecs,
  clientUsers,
  company,
  controllerModels,
  locationSpecs,
  maintenanceChecklist,
  modelSpecs,
  moduleForModel,
  partSpecs,
  plans,
  repairChecklist,
  siteSpecs,
  staffUsers,
  usualTechnician,
  wallSpecs,
  type ClientKey,
  type ClientUserKey,
  type LocationKey,
  type ModelKey,
  type PartKey,
  type PlanKey,
  type SiteKey,
  type WallKey,
} from './register.js';
import { maintenanceSpecs, ticketSpecs, type RepairSpec } from './work.js';

type Insert<T extends { $inferInsert: unknown }> = T['$inferInsert'];

export interface DemoRows {
  companySettings: Insert<typeof schema.companySettings>;
  servicePlans: Insert<typeof schema.servicePlans>[];
  clients: Insert<typeof schema.clients>[];
  sites: Insert<typeof schema.sites>[];
  contacts: Insert<typeof schema.contacts>[];
  users: Insert<typeof schema.users>[];
  cabinetModels: Insert<typeof schema.cabinetModels>[];
  walls: Insert<typeof schema.walls>[];
  controllers: Insert<typeof schema.controllers>[];
  parts: Insert<typeof schema.parts>[];
  stockLocations: Insert<typeof schema.stockLocations>[];
  cabinets: Insert<typeof schema.cabinets>[];
  cabinetEvents: Insert<typeof schema.cabinetEvents>[];
  maintenancePlans: Insert<typeof schema.maintenancePlans>[];
  tickets: Insert<typeof schema.tickets>[];
  ticketComments: Insert<typeof schema.ticketComments>[];
  visits: Insert<typeof schema.visits>[];
  visitTechnicians: Insert<typeof schema.visitTechnicians>[];
  repairs: Insert<typeof schema.repairs>[];
  vendorReturns: Insert<typeof schema.vendorReturns>[];
  stockMovements: Insert<typeof schema.stockMovements>[];
  stockBalances: Insert<typeof schema.stockBalances>[];
  reorderPoints: Insert<typeof schema.reorderPoints>[];
  auditEvents: Insert<typeof schema.auditEvents>[];
}

const letters = 'ABCDEFGH';
const pad = (n: number, width: number) => String(n).padStart(width, '0');

export function buildDemo(now: Date, passwordHash: string): DemoRows {
  const rand = createRandom(0x6b1d2e);
  const clock = createClock(now);
  const id = rand.uuid;
  const rows: DemoRows = {
    companySettings: { id: 1, ...company, updatedAt: now },
    servicePlans: [], clients: [], sites: [], contacts: [], users: [], cabinetModels: [], walls: [], controllers: [],
    parts: [], stockLocations: [], cabinets: [], cabinetEvents: [], maintenancePlans: [], tickets: [], ticketComments: [],
    visits: [], visitTechnicians: [], repairs: [], vendorReturns: [], stockMovements: [], stockBalances: [], reorderPoints: [], auditEvents: [],
  };
  const longAgo = clock.at(company.defaultTimeZone, -900, 9);

  // Service plans and clients.
  const planId = {} as Record<PlanKey, string>;
  for (const [k, p] of Object.entries(plans) as [PlanKey, (typeof plans)[PlanKey]][]) {
    planId[k] = id();
    rows.servicePlans.push({ id: planId[k], ...p, createdAt: longAgo, updatedAt: longAgo });
  }
  const clientId = {} as Record<ClientKey, string>;
  for (const [k, c] of Object.entries(clientSpecs) as [ClientKey, (typeof clientSpecs)[ClientKey]][]) {
    clientId[k] = id();
    rows.clients.push({ id: clientId[k], name: c.name, servicePlanId: planId[c.plan], notes: c.notes, createdAt: longAgo, updatedAt: longAgo });
    for (const contact of c.contacts) {
      rows.contacts.push({ id: id(), clientId: clientId[k], siteId: null, receivesUpdates: true, ...contact, createdAt: longAgo, updatedAt: longAgo });
    }
  }
  const siteId = {} as Record<SiteKey, string>;
  for (const [k, s] of Object.entries(siteSpecs) as [SiteKey, (typeof siteSpecs)[SiteKey]][]) {
    siteId[k] = id();
    rows.sites.push({
      id: siteId[k], clientId: clientId[s.client], name: s.name, address: s.address, city: s.city, region: s.region,
      postalCode: s.postalCode, country: 'US', timeZone: s.timeZone, accessNotes: s.accessNotes, internalNotes: s.internalNotes ?? '',
      createdAt: longAgo, updatedAt: longAgo,
    });
    rows.contacts.push({ id: id(), clientId: clientId[s.client], siteId: siteId[k], receivesUpdates: true, ...s.contact, createdAt: longAgo, updatedAt: longAgo });
  }

  // Accounts: one password hash for all of them.
  const userId = {} as Record<keyof typeof staffUsers | ClientUserKey, string>;
  const userName = {} as Record<keyof typeof staffUsers | ClientUserKey, string>;
  const joined = clock.at(company.defaultTimeZone, -420, 9);
  for (const [k, u] of Object.entries(staffUsers) as [keyof typeof staffUsers, (typeof staffUsers)[keyof typeof staffUsers]][]) {
    userId[k] = id();
    userName[k] = u.name;
    rows.users.push({
      id: userId[k], email: u.email, name: u.name, role: u.role, clientId: null, phone: u.phone, passwordHash,
      passwordChangedAt: joined, lastSignInAt: clock.hoursAgo(rand.int(1, 30)), createdAt: joined, updatedAt: joined,
    });
  }
  for (const [k, u] of Object.entries(clientUsers) as [ClientUserKey, (typeof clientUsers)[ClientUserKey]][]) {
    userId[k] = id();
    userName[k] = u.name;
    rows.users.push({
      id: userId[k], email: u.email, name: u.name, role: 'client', clientId: clientId[u.client], phone: u.phone, passwordHash,
      passwordChangedAt: joined, lastSignInAt: clock.hoursAgo(rand.int(20, 300)), createdAt: joined, updatedAt: joined,
    });
  }

  // Catalogue, parts and stock locations.
  const modelId = {} as Record<ModelKey, string>;
  for (const [k, m] of Object.entries(modelSpecs) as [ModelKey, (typeof modelSpecs)[ModelKey]][]) {
    modelId[k] = id();
    const { serialPrefix: _s, batchPrefix: _b, ...spec } = m;
    rows.cabinetModels.push({ id: modelId[k], ...spec, createdAt: longAgo, updatedAt: longAgo });
  }
  const partId = {} as Record<PartKey, string>;
  for (const [k, p] of Object.entries(partSpecs) as [PartKey, (typeof partSpecs)[PartKey]][]) {
    partId[k] = id();
    rows.parts.push({
      id: partId[k], sku: p.sku, name: p.name, kind: p.kind, cabinetModelId: p.model ? modelId[p.model] : null,
      unitCost: p.unitCost, leadTimeDays: p.leadTimeDays, createdAt: longAgo, updatedAt: longAgo,
    });
  }
  const locationId = {} as Record<LocationKey, string>;
  for (const [k, l] of Object.entries(locationSpecs) as [LocationKey, (typeof locationSpecs)[LocationKey]][]) {
    locationId[k] = id();
    rows.stockLocations.push({
      id: locationId[k], name: l.name, kind: l.kind, holderId: l.holder ? userId[l.holder] : null,
      siteId: l.site ? siteId[l.site] : null, clientId: l.site ? clientId[siteSpecs[l.site].client] : null,
      createdAt: longAgo, updatedAt: longAgo,
    });
  }
  const kitAt: Partial<Record<SiteKey, LocationKey>> = {};
  for (const [k, l] of Object.entries(locationSpecs) as [LocationKey, (typeof locationSpecs)[LocationKey]][]) {
    if (l.site) kitAt[l.site] = k;
  }
  const vanOf = { tech1: 'van1', tech2: 'van2' } as const satisfies Record<'tech1' | 'tech2', LocationKey>;

  // Walls, controllers and every cabinet.
  const wallId = {} as Record<WallKey, string>;
  const wallBatches = {} as Record<WallKey, { original: string[]; later: string }>;
  const cabinetAt = new Map<string, { id: string; batch: string }>();
  const serialSeq = {} as Record<ModelKey, number>;
  const serialFor = (model: ModelKey, yymm: string, letter: string) => {
    serialSeq[model] = (serialSeq[model] ?? rand.int(20, 90) * 10) + 1;
    const m = modelSpecs[model];
    if (model === 'mv15') return `${m.serialPrefix}-${yymm}${pad(serialSeq[model], 4)}`;
    if (model.startsWith('tw')) return `${m.serialPrefix}-${yymm.slice(0, 2)}${letter}-${pad(serialSeq[model], 6)}`;
    return `${m.serialPrefix}-${yymm}-${pad(serialSeq[model], 5)}`;
  };
  const addCabinet = (c: Insert<typeof schema.cabinets>) => {
    rows.cabinets.push(c);
    return c.id as string;
  };
  const event = (e: Omit<Insert<typeof schema.cabinetEvents>, 'id'>) => rows.cabinetEvents.push({ id: id(), ...e });

  const swapStory = { wall: 'w01' as WallKey, column: 3, row: 5 };
  const repairPositions = new Set(
    ticketSpecs.flatMap((t) => (t.wall ? (t.repairs ?? []).map((r) => `${t.wall}|${r.column}|${r.row}`) : [])),
  );

  for (const [k, w] of Object.entries(wallSpecs) as [WallKey, (typeof wallSpecs)[WallKey]][]) {
    const site = siteSpecs[w.site];
    const model = modelSpecs[w.model];
    wallId[k] = id();
    const installDate = clock.isoDate(-w.installedDaysAgo, site.timeZone);
    const installedAt = clock.at(site.timeZone, -w.installedDaysAgo, 10);
    const tech = userId[usualTechnician[site.client]];
    rows.walls.push({
      id: wallId[k], clientId: clientId[site.client], siteId: siteId[w.site], name: w.name, cabinetModelId: modelId[w.model],
      columns: w.columns, rows: w.rows, mounting: w.mounting, installDate,
      warrantyEnd: addYears(parseISO(installDate), w.warrantyYears).toISOString().slice(0, 10),
      calibrationDate: installDate, inputNotes: w.inputNotes, internalNotes: w.internalNotes,
      ...asBuiltPlan(w, model), createdAt: installedAt, updatedAt: installedAt,
    });
    const ctrl = controllerModels[w.controller];
    rows.controllers.push({
      id: id(), wallId: wallId[k], model: ctrl.model, serial: `${ctrl.serialPrefix}-${clock.yymm(-w.installedDaysAgo - 40)}-${pad(rand.int(1000, 99999), 5)}`,
      firmware: w.firmware, outputs: ctrl.outputs, outputsInUse: dataLinesInUse(w, model), pixelsPerOutput: DEFAULT_OUTPUT_CAPACITY_PIXELS,
      notes: '', createdAt: installedAt, updatedAt: installedAt,
    });

    // Production batches: the originals were made about two months before the install; the
    // commissioning replacements come from a later run.
    const made = clock.yymm(-w.installedDaysAgo - 60);
    const shared = w.sharesBatchesWith ? wallBatches[w.sharesBatchesWith] : undefined;
    const original = shared
      ? shared.original.slice(0, w.batches)
      : Array.from({ length: w.batches }, (_, i) => `${model.batchPrefix}-${made}-${letters[i]}`);
    const later = shared ? shared.later : `${model.batchPrefix}-${clock.yymm(-w.installedDaysAgo - 20)}-${letters[w.batches]}`;
    wallBatches[k] = { original, later };

    const swaps = new Set<string>();
    while (swaps.size < w.commissioningSwaps) {
      const c = rand.int(1, w.columns);
      const r = rand.int(1, w.rows);
      const pos = `${k}|${c}|${r}`;
      if (repairPositions.has(pos) || (k === swapStory.wall && c === swapStory.column && r === swapStory.row)) continue;
      swaps.add(`${c}|${r}`);
    }
    for (let r = 1; r <= w.rows; r++) {
      for (let c = 1; c <= w.columns; c++) {
        const replacement = swaps.has(`${c}|${r}`);
        const batch = replacement ? later : original[Math.floor(((c - 1) * w.batches) / w.columns)];
        const batchLetter = batch.slice(-1);
        const at = replacement ? clock.hoursFrom(installedAt, 14 * 24) : installedAt;
        const cabId = addCabinet({
          id: id(), serial: serialFor(w.model, batch.split('-')[1], batchLetter), cabinetModelId: modelId[w.model],
          wallId: wallId[k], column: c, row: r, batch, status: 'installed', stockLocationId: null,
          installedOn: replacement ? clock.isoDate(-w.installedDaysAgo + 14, site.timeZone) : installDate,
          notes: replacement ? 'Replacement for a cabinet that failed burn-in at commissioning.' : '',
          createdAt: at, updatedAt: at,
        });
        cabinetAt.set(`${k}|${c}|${r}`, { id: cabId, batch });
        event({
          cabinetId: cabId, kind: 'placed', toWallId: wallId[k], toColumn: c, toRow: r, toStatus: 'installed', actorId: tech,
          note: replacement ? 'Fitted at commissioning in place of a unit that failed burn-in.' : 'Installed.', createdAt: at,
        });
      }
    }
  }

  // Spare cabinets, kept as attic stock.
  const spare = (model: ModelKey, batch: string, location: LocationKey, daysAgo: number, note: string) => {
    const at = clock.at(company.defaultTimeZone, -daysAgo, 11);
    const cabId = addCabinet({
      id: id(), serial: serialFor(model, batch.split('-')[1], batch.slice(-1)), cabinetModelId: modelId[model], wallId: null,
      column: null, row: null, batch, status: 'spare', stockLocationId: locationId[location], installedOn: null, notes: note,
      createdAt: at, updatedAt: at,
    });
    event({ cabinetId: cabId, kind: 'status_changed', toStatus: 'spare', actorId: userId.office, note: `Received into ${locationSpecs[location].name}.`, createdAt: at });
    return { id: cabId, at };
  };
  const w1 = wallSpecs.w01;
  const kitSpareCabinet = spare('hx26', wallBatches.w01.later, 'kitMain', w1.installedDaysAgo - 14, 'On-site spare for the main hall walls.');
  spare('hx26', wallBatches.w01.original[0], 'warehouse', w1.installedDaysAgo - 14, 'Attic stock for the Cedar Hollow main hall.');
  spare('hx26', wallBatches.w11.later, 'warehouse', wallSpecs.w11.installedDaysAgo - 10, 'Attic stock for the exhibit hall curved wall.');
  spare('mv15', wallBatches.w12.original[1], 'warehouse', wallSpecs.w12.installedDaysAgo - 10, 'Attic stock for the Alderbrook lobby wall.');
  spare('tw39', wallBatches.w09.original[0], 'kitArena', wallSpecs.w09.installedDaysAgo - 7, 'On-site spare for the centre-hung wall.');

  // Stock: the opening story; repairs add their consumptions below.
  const moves: Move[] = [];
  const at = (daysAgo: number, hour = 10) => clock.at(company.defaultTimeZone, -daysAgo, hour);
  const receive = (part: PartKey, quantity: number, daysAgo: number, batch = '', reason = 'Purchase order received') =>
    moves.push({ part, batch, kind: 'receipt', to: 'warehouse', quantity, at: at(daysAgo, 9), reason, actorId: userId.office });
  const transfer = (part: PartKey, quantity: number, to: LocationKey, daysAgo: number, batch = '') =>
    moves.push({ part, batch, kind: 'transfer', from: 'warehouse', to, quantity, at: at(daysAgo, 14), reason: 'Initial stocking', actorId: userId.office });

  for (const [k, w] of Object.entries(wallSpecs) as [WallKey, (typeof wallSpecs)[WallKey]][]) {
    if (w.sharesBatchesWith) continue;
    const kit = kitAt[w.site];
    for (const batch of wallBatches[k].original) {
      receive(moduleForModel[w.model], kit ? 4 : 3, 245, batch, 'Spare modules matched to the wall\'s production batch');
      if (kit) transfer(moduleForModel[w.model], 2, kit, 238, batch);
    }
  }
  receive('psu200', 16, 245);
  receive('psu300', 4, 245);
  receive('rxc', 10, 245);
  receive('dataCable', 24, 245);
  receive('powerCable', 24, 245);
  receive('fan', 8, 245);
  for (const [part, qty] of [['psu200', 2], ['rxc', 2], ['dataCable', 2], ['powerCable', 2]] as const) transfer(part, qty, 'kitMain', 238);
  for (const [part, qty] of [['psu200', 2], ['psu300', 1], ['rxc', 1], ['fan', 2]] as const) transfer(part, qty, 'kitArena', 238);
  for (const [part, qty] of [['psu200', 2], ['rxc', 2], ['dataCable', 4], ['powerCable', 4], ['fan', 1]] as const) transfer(part, qty, 'van1', 237);
  for (const [part, qty] of [['psu200', 2], ['rxc', 2], ['dataCable', 4], ['powerCable', 4], ['fan', 2]] as const) transfer(part, qty, 'van2', 237);
  receive('psu200', 8, 150);
  receive('dataCable', 12, 150);
  const shelfLaterHx26 = `${modelSpecs.hx26.batchPrefix}-${clock.yymm(-135)}-A`;
  receive('modHx26', 6, 125, shelfLaterHx26, 'New production batch from the maker');
  moves.push({
    part: 'dataCable', batch: '', kind: 'adjustment', from: 'van2', quantity: 1, at: at(45, 17),
    reason: 'Cycle count: one data jumper missing from the van', actorId: userId.office,
  });

  // A receiving card found dead on arrival goes back to the maker and comes back replaced.
  const doaId = id();
  rows.vendorReturns.push({
    id: doaId, partId: partId.rxc, serial: `RXA8-${pad(rand.int(10000, 99999), 6)}`, batch: '', quantity: 1,
    fault: 'Dead on arrival: no link LED when bench-tested.', fromLocationId: locationId.warehouse, repairId: null,
    rmaReference: `TRN-RMA-${rand.int(20000, 29999)}`, sentOn: clock.isoDate(-200), expectedBackOn: clock.isoDate(-170),
    outcome: 'replaced', backInStockOn: clock.isoDate(-172), backToLocationId: locationId.warehouse,
    notes: 'Maker sent a new card.', createdAt: at(200, 9), updatedAt: at(172, 9),
  });
  moves.push({ part: 'rxc', batch: '', kind: 'sent_to_vendor', from: 'warehouse', quantity: 1, at: at(200, 15), vendorReturnId: doaId, reason: 'Warranty return: dead on arrival', actorId: userId.office });
  moves.push({ part: 'rxc', batch: '', kind: 'back_from_vendor', to: 'warehouse', quantity: 1, at: at(172, 11), vendorReturnId: doaId, reason: 'Replacement from the maker', actorId: userId.office });

  // Tickets, their visits and repairs.
  const ackDelayHours = { critical: 0.25, high: 0.75, normal: 2, low: 5 } as const;
  const visitAfterDays = { critical: 0, high: 1, normal: 3, low: 6 } as const;
  const ticketRows: (Insert<typeof schema.tickets> & { createdAt: Date })[] = [];
  const comment = (ticketId: string, authorId: string, body: string, visibility: 'public' | 'internal', createdAt: Date) =>
    rows.ticketComments.push({ id: id(), ticketId, authorId, body, visibility, createdAt });
  const dayLabel = (date: Date, timeZone: string) =>
    new Intl.DateTimeFormat('en-US', { weekday: 'long', month: 'long', day: 'numeric', hour: '2-digit', minute: '2-digit', hour12: false, timeZone }).format(date);

  const addVisit = (v: Omit<Insert<typeof schema.visits>, 'id'>, techs: string[]) => {
    const visitId = id();
    rows.visits.push({ id: visitId, ...v });
    for (const t of techs) rows.visitTechnicians.push({ visitId, userId: t });
    return visitId;
  };

  /** Logs one repair with its stock consumption, cabinet history and any warranty return. */
  const logRepair = (
    spec: RepairSpec,
    ctx: { wall: WallKey; visitId: string; ticketId: string | null; tech: 'tech1' | 'tech2'; performedAt: Date },
  ) => {
    const w = wallSpecs[ctx.wall];
    const site = siteSpecs[w.site];
    const repairId = id();
    const cabinet = cabinetAt.get(`${ctx.wall}|${spec.column}|${spec.row}`)!;
    const part = spec.part;
    const batch = part && partSpecs[part].batched ? (spec.batch === 'later' ? shelfLaterHx26 : cabinet.batch) : '';
    const kit = kitAt[w.site];
    const from: LocationKey | undefined = part ? (kit && spec.from !== 'van' ? kit : vanOf[ctx.tech]) : undefined;
    const swap = spec.action === 'cabinet_swapped';
    rows.repairs.push({
      id: repairId, clientId: clientId[site.client], wallId: wallId[ctx.wall], visitId: ctx.visitId, ticketId: ctx.ticketId,
      cabinetId: cabinet.id, column: spec.column, row: spec.row, component: spec.component,
      moduleColumn: spec.module?.[0] ?? null, moduleRow: spec.module?.[1] ?? null, fault: spec.fault, action: spec.action,
      partId: part ? partId[part] : null, partBatch: part ? batch : null, fromLocationId: from ? locationId[from] : null,
      removedPartFate: spec.fate ?? 'none', notes: spec.notes, technicianId: userId[ctx.tech],
      performedAt: ctx.performedAt, createdAt: ctx.performedAt,
    });
    if (part && from) {
      moves.push({ part, batch, kind: 'consumption', from, quantity: 1, at: ctx.performedAt, repairId, actorId: userId[ctx.tech] });
    }
    if (!swap) {
      event({
        cabinetId: cabinet.id, kind: 'repaired', repairId, actorId: userId[ctx.tech], createdAt: ctx.performedAt,
        note: `${spec.component.replace('_', ' ')}: ${spec.action.replace('_', ' ')} (${cellLabel(spec)}).`,
      });
    }
    if (spec.fate === 'to_vendor_return' && part) {
      const vrId = id();
      const turnaround = part === 'psu200' ? 45 : 30;
      const sentAt = clock.hoursFrom(ctx.performedAt, 72);
      const sentOffset = -Math.round((clock.nowMs - sentAt.getTime()) / (24 * HOUR));
      rows.vendorReturns.push({
        id: vrId, partId: partId[part], serial: `${partSpecs[part].sku.split('-')[0]}-${pad(rand.int(100000, 999999), 7)}`, batch,
        quantity: 1, fault: spec.notes, fromLocationId: locationId.warehouse, repairId,
        rmaReference: `TRN-RMA-${rand.int(30000, 39999)}`, sentOn: clock.isoDate(sentOffset), expectedBackOn: clock.isoDate(sentOffset + turnaround),
        outcome: 'pending', backInStockOn: null, backToLocationId: null,
        notes: `Removed from ${w.name}, ${cellLabel(spec)}.`, createdAt: sentAt, updatedAt: sentAt,
      });
      moves.push({
        part, batch, kind: 'return_from_wall', to: 'warehouse', quantity: 1, at: clock.hoursFrom(ctx.performedAt, 24), repairId,
        reason: `Failed unit from ${w.name} ${cellLabel(spec)}, held for a warranty return`, actorId: userId[ctx.tech],
      });
      moves.push({ part, batch, kind: 'sent_to_vendor', from: 'warehouse', quantity: 1, at: sentAt, vendorReturnId: vrId, reason: 'Warranty return', actorId: userId.office });
    }
    if (swap) {
      // The water-damaged cabinet leaves the wall; the site kit's spare takes its place.
      const old = cabinet.id;
      const replacement = kitSpareCabinet.id;
      const oldRow = rows.cabinets.find((c) => c.id === old)!;
      const newRow = rows.cabinets.find((c) => c.id === replacement)!;
      const retiredAt = clock.hoursFrom(ctx.performedAt, 9 * 24);
      Object.assign(oldRow, { wallId: null, column: null, row: null, status: 'retired', notes: 'Water damage: backplane corroded, not economical to repair.', updatedAt: retiredAt });
      Object.assign(newRow, {
        wallId: wallId[ctx.wall], column: spec.column, row: spec.row, status: 'installed', stockLocationId: null,
        installedOn: clock.isoDate(-Math.round((clock.nowMs - ctx.performedAt.getTime()) / (24 * HOUR)), site.timeZone), updatedAt: ctx.performedAt,
      });
      cabinetAt.set(`${ctx.wall}|${spec.column}|${spec.row}`, { id: replacement, batch: newRow.batch as string });
      event({
        cabinetId: old, kind: 'removed', fromWallId: wallId[ctx.wall], fromColumn: spec.column, fromRow: spec.row, otherCabinetId: replacement,
        repairId, fromStatus: 'installed', toStatus: 'at_bench', actorId: userId[ctx.tech], createdAt: ctx.performedAt,
        note: 'Removed after water damage; to the bench.',
      });
      event({
        cabinetId: replacement, kind: 'placed', toWallId: wallId[ctx.wall], toColumn: spec.column, toRow: spec.row, otherCabinetId: old,
        repairId, fromStatus: 'spare', toStatus: 'installed', actorId: userId[ctx.tech], createdAt: ctx.performedAt,
        note: `Swapped in from ${locationSpecs.kitMain.name} for the water-damaged cabinet.`,
      });
      event({
        cabinetId: old, kind: 'status_changed', fromStatus: 'at_bench', toStatus: 'retired', actorId: userId.admin, createdAt: retiredAt,
        note: 'Bench verdict: backplane corroded, not economical to repair.',
      });
      // A new spare cabinet for the site kit, ordered after the swap.
      spare('hx26', wallBatches.w01.later, 'kitMain', Math.round((clock.nowMs - ctx.performedAt.getTime()) / (24 * HOUR)) - 30, 'Replacement on-site spare for the main hall walls.');
    }
  };

  for (const t of ticketSpecs) {
    const wall = t.wall ? wallSpecs[t.wall] : undefined;
    const siteKey = (wall?.site ?? t.site)!;
    const site = siteSpecs[siteKey];
    const client = clientSpecs[site.client];
    const tz = site.timeZone;
    const createdAt = t.hoursAgo !== undefined ? clock.hoursAgo(t.hoursAgo) : clock.at(tz, -(t.ageDays ?? 0), t.hour ?? 10);
    const ticketId = id();
    const reporterId = t.reporter === 'office' ? userId.office : userId[t.reporter];
    const techKey = t.tech;
    const techId = techKey ? userId[techKey] : null;
    const ackAt = t.status === 'new' ? null : clock.hoursFrom(createdAt, ackDelayHours[t.priority]);
    let resolvedAt: Date | null = null;
    let closedAt: Date | null = null;
    let pausedAt: Date | null = null;
    let lastActivity = ackAt ?? createdAt;
    const contactName = site.contact.name;

    if (ackAt) {
      const when = t.noVisit
        ? `${userName[techKey!]} will call you shortly.`
        : t.priority === 'critical'
          ? `${userName[techKey!]} is on the way.`
          : `${userName[techKey!]} will look at it and we will confirm a time with you.`;
      comment(ticketId, userId.office, `Thanks, we have this. ${when}`, 'public', ackAt);
    }

    const done = ['closed', 'resolved', 'waiting_parts'].includes(t.status);
    if (done && !t.noVisit) {
      const after = t.visitAfterDays ?? visitAfterDays[t.priority];
      const planned = t.priority === 'critical'
        ? clock.hoursFrom(createdAt, 2.5)
        : clock.at(tz, clock.weekdayOffset(tz, -(t.ageDays ?? 0) + after), siteKey === 'fHq' ? 7 : 9);
      // A visit on the day of the call starts after the call was taken, not at the morning's start.
      const start = planned.getTime() < ackAt!.getTime() + HOUR ? clock.hoursFrom(ackAt!, 2) : planned;
      const repairs = t.repairs ?? [];
      const completedAt = clock.hoursFrom(start, 1 + 0.75 * Math.max(1, repairs.length));
      const visitId = addVisit({
        clientId: clientId[site.client], siteId: siteId[siteKey], wallId: t.wall ? wallId[t.wall] : null, ticketId,
        maintenancePlanId: null, kind: 'ticket', status: 'completed', windowStart: start, windowEnd: clock.hoursFrom(start, 3),
        checklist: repairChecklist.map((label): ChecklistItem =>
          t.status === 'waiting_parts' && label.startsWith('Repair tested')
            ? { label, done: false, note: 'Waiting for parts.' }
            : { label, done: true }),
        summary: t.resolution ?? '', internalNotes: (t.internal ?? []).join('\n'),
        signedByName: contactName, signedAt: completedAt, reportSentAt: clock.hoursFrom(completedAt, 0.1),
        startedAt: clock.hoursFrom(start, 0.2), completedAt, createdAt: ackAt!, updatedAt: completedAt,
      }, [userId[techKey!]]);
      repairs.forEach((r, i) =>
        logRepair(r, { wall: t.wall!, visitId, ticketId, tech: techKey!, performedAt: clock.hoursFrom(start, 0.5 + 0.75 * i) }));
      if (t.status === 'waiting_parts') {
        comment(ticketId, userId.office, t.partsNote!, 'public', clock.hoursFrom(completedAt, 2));
        lastActivity = clock.hoursFrom(completedAt, 2);
      } else {
        resolvedAt = completedAt;
        comment(ticketId, userId[techKey!], t.resolution!, 'public', completedAt);
      }
      (t.internal ?? []).forEach((text, i) => comment(ticketId, userId[techKey!], text, 'internal', clock.hoursFrom(completedAt, 1 + i)));
      lastActivity = new Date(Math.max(lastActivity.getTime(), completedAt.getTime()));
    } else if (done && t.noVisit) {
      resolvedAt = clock.hoursFrom(ackAt!, 3);
      comment(ticketId, userId[techKey!], t.resolution!, 'public', resolvedAt);
      (t.internal ?? []).forEach((text, i) => comment(ticketId, userId[techKey!], text, 'internal', clock.hoursFrom(resolvedAt!, 1 + i)));
    } else if (t.status === 'in_progress') {
      const start = clock.hoursAgo(1.5);
      addVisit({
        clientId: clientId[site.client], siteId: siteId[siteKey], wallId: wallId[t.wall!], ticketId, maintenancePlanId: null,
        kind: 'ticket', status: 'in_progress', windowStart: start, windowEnd: clock.hoursFrom(start, 4),
        checklist: repairChecklist.map((label, i): ChecklistItem => ({ label, done: i < 3 })),
        startedAt: clock.hoursAgo(1), createdAt: ackAt!, updatedAt: clock.hoursAgo(1),
      }, [userId[techKey!]]);
      comment(ticketId, userId.office, `Visit booked for ${dayLabel(start, tz)}.`, 'public', clock.hoursFrom(ackAt!, 0.5));
      (t.internal ?? []).forEach((text, i) => comment(ticketId, userId[techKey!], text, 'internal', clock.hoursAgo(0.5 - 0.1 * i)));
      lastActivity = clock.hoursAgo(0.5);
    } else if (t.status === 'scheduled') {
      const nth = t.priority === 'high' ? 1 : t.priority === 'normal' ? 2 : 4;
      const start = clock.at(tz, clock.businessDayOffset(tz, nth), siteKey === 'fHq' ? 7 : 9);
      addVisit({
        clientId: clientId[site.client], siteId: siteId[siteKey], wallId: t.wall ? wallId[t.wall] : null, ticketId,
        maintenancePlanId: null, kind: 'ticket', status: 'planned', windowStart: start, windowEnd: clock.hoursFrom(start, 3),
        checklist: repairChecklist.map((label): ChecklistItem => ({ label, done: false })), createdAt: ackAt!, updatedAt: ackAt!,
      }, [userId[techKey!]]);
      const booked = clock.hoursFrom(ackAt!, 1);
      comment(ticketId, userId.office, `Visit booked for ${dayLabel(start, tz)} (about three hours). ${userName[techKey!]} will sign in at reception.`, 'public', booked);
      lastActivity = booked;
    } else if (t.status === 'waiting_client') {
      pausedAt = clock.hoursFrom(ackAt!, 20);
      comment(ticketId, userId.office, t.ask!, 'public', pausedAt);
      lastActivity = pausedAt;
    } else if (ackAt) {
      (t.internal ?? []).forEach((text, i) => comment(ticketId, userId[techKey!], text, 'internal', clock.hoursFrom(ackAt, 2 + i)));
    }

    if (t.status === 'closed') {
      closedAt = clock.hoursFrom(resolvedAt!, 72);
      if (t.thanks && t.reporter !== 'office') comment(ticketId, reporterId, t.thanks, 'public', clock.hoursFrom(resolvedAt!, 5));
      lastActivity = closedAt;
    } else if (resolvedAt) {
      lastActivity = resolvedAt;
    }

    ticketRows.push({
      id: ticketId, clientId: clientId[site.client], siteId: siteId[siteKey], wallId: t.wall ? wallId[t.wall] : null,
      scope: t.scope ?? 'cells', cells: (t.cells ?? []).map(([column, row]) => ({ column, row })), title: t.title,
      description: t.description, priority: t.priority, status: t.status, reporterId,
      assigneeId: t.status === 'new' ? null : techId,
      // The same clock the app runs: business hours in the site's time zone, per the plan.
      ...ticketDueTimes(planClock(plans[client.plan], tz), t.priority, createdAt),
      pausedAt, pausedSeconds: 0, acknowledgedAt: ackAt, resolvedAt, closedAt, createdAt, updatedAt: lastActivity,
    });
  }
  ticketRows.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  ticketRows.forEach((t, i) => (t.number = 1001 + i));
  rows.tickets = ticketRows;

  // The lobby wall was recalibrated by a repair: its calibration date follows.
  const recal = rows.repairs.filter((r) => r.action === 'recalibrated');
  for (const r of recal) {
    const wall = rows.walls.find((w) => w.id === r.wallId)!;
    const site = rows.sites.find((s) => s.id === wall.siteId)!;
    const performedAt = r.performedAt as Date;
    wall.calibrationDate = clock.isoDate(-Math.round((clock.nowMs - performedAt.getTime()) / (24 * HOUR)), site.timeZone);
  }

  // Maintenance plans: completed visits in the past, planned ones when due within two weeks.
  const today = clock.isoDate(0);
  for (const m of maintenanceSpecs) {
    const w = wallSpecs[m.wall];
    const site = siteSpecs[w.site];
    const tz = site.timeZone;
    const doneOffset = clock.weekdayOffset(tz, -m.lastDoneDaysAgo);
    const lastDoneOn = clock.isoDate(doneOffset, tz);
    const nextDueOn = addMonths(parseISO(lastDoneOn), m.intervalMonths).toISOString().slice(0, 10);
    const planId = id();
    const installedAt = clock.at(tz, -w.installedDaysAgo, 10);
    rows.maintenancePlans.push({
      id: planId, wallId: wallId[m.wall], intervalMonths: m.intervalMonths, checklist: maintenanceChecklist,
      lastDoneOn, nextDueOn, active: true, createdAt: installedAt, updatedAt: clock.at(tz, doneOffset, 15),
    });
    const start = clock.at(tz, doneOffset, m.wall === 'w12' ? 6 : 8);
    const completedAt = clock.hoursFrom(start, 3.5);
    const visitId = addVisit({
      clientId: clientId[site.client], siteId: siteId[w.site], wallId: wallId[m.wall], ticketId: null, maintenancePlanId: planId,
      kind: 'maintenance', status: 'completed', windowStart: start, windowEnd: clock.hoursFrom(start, 4),
      checklist: maintenanceChecklist.map((label): ChecklistItem => ({ label, done: true })), summary: m.summary,
      signedByName: site.contact.name, signedAt: completedAt, reportSentAt: clock.hoursFrom(completedAt, 0.1),
      startedAt: clock.hoursFrom(start, 0.1), completedAt, createdAt: clock.hoursFrom(start, -14 * 24), updatedAt: completedAt,
    }, [userId[m.tech]]);
    (m.repairs ?? []).forEach((r, i) =>
      logRepair(r, { wall: m.wall, visitId, ticketId: null, tech: m.tech, performedAt: clock.hoursFrom(start, 1 + 0.5 * i) }));

    const dueIn = differenceInCalendarDays(parseISO(nextDueOn), parseISO(today));
    if (dueIn >= 0 && dueIn <= 14) {
      const offset = Math.max(1, clock.weekdayOffset(tz, dueIn));
      const planned = clock.at(tz, offset, m.wall === 'w12' ? 6 : 8);
      // The big centre wall takes both technicians.
      const techs = m.wall === 'w01' ? [userId.tech1, userId.tech2] : [userId[m.tech === 'tech1' ? 'tech1' : 'tech2']];
      addVisit({
        clientId: clientId[site.client], siteId: siteId[w.site], wallId: wallId[m.wall], ticketId: null, maintenancePlanId: planId,
        kind: 'maintenance', status: 'planned', windowStart: planned, windowEnd: clock.hoursFrom(planned, m.wall === 'w01' ? 6 : 4),
        checklist: maintenanceChecklist.map((label): ChecklistItem => ({ label, done: false })),
        createdAt: clock.hoursAgo(24 * 7), updatedAt: clock.hoursAgo(24 * 7),
      }, techs);
    }
  }

  // Settle the ledger and write the balances it implies.
  const restockActor = (to: LocationKey) =>
    to === 'van1' ? userId.tech1 : to === 'van2' ? userId.tech2 : userId.office;
  const settled = settleLedger(moves, restockActor);
  rows.stockMovements = settled.moves.map((m) => ({
    partId: partId[m.part], batch: m.batch, kind: m.kind, fromLocationId: m.from ? locationId[m.from] : null,
    toLocationId: m.to ? locationId[m.to] : null, quantity: m.quantity, reason: m.reason ?? '', repairId: m.repairId ?? null,
    vendorReturnId: m.vendorReturnId ?? null, actorId: m.actorId ?? null, createdAt: m.at,
  }));
  rows.stockBalances = [...settled.balances.values()].map((b) => ({
    partId: partId[b.part], batch: b.batch, locationId: locationId[b.location], quantity: b.quantity, updatedAt: b.updatedAt,
  }));

  // Reorder points; an alert is recorded where stock already sits at or below the minimum.
  const onHand = (part: PartKey, location: LocationKey) => {
    let total = 0;
    let last: Date | undefined;
    for (const b of settled.balances.values()) {
      if (b.part === part && b.location === location) {
        total += b.quantity;
        if (!last || b.updatedAt > last) last = b.updatedAt;
      }
    }
    return { total, last };
  };
  const reorder: [PartKey, LocationKey, number, number][] = [
    ['modHx26', 'warehouse', 4, 8],
    ['psu200', 'warehouse', 6, 10],
    ['rxc', 'warehouse', 3, 6],
    ['psu200', 'van1', 1, 2],
    ['psu200', 'van2', 1, 2],
    ['rxc', 'kitMain', 1, 2],
    ['psu300', 'kitArena', 1, 1],
    ['modTw39', 'kitArena', 2, 4],
  ];
  for (const [part, location, minQuantity, reorderQuantity] of reorder) {
    const { total, last } = onHand(part, location);
    rows.reorderPoints.push({
      partId: partId[part], locationId: locationId[location], minQuantity, reorderQuantity,
      alertedAt: total <= minQuantity && last ? clock.hoursFrom(last, 0.1) : null,
    });
  }

  rows.auditEvents = demoAuditTrail(rows, userId.office);
  return rows;
}
