// The demo's field work as rows: ticket comments, visits with their technicians, and repairs with
// their stock consumption, cabinet history and warranty returns (and the story's cabinet swap).
import { cellLabel } from '../../../shared/calc/grid.js';
import type * as schema from '../schema/index.js';
import { pad, type Demo, type Insert } from './build-context.js';
import { addSpare, type CabinetLog, type WallBatches } from './build-cabinets.js';
import { kitAt, vanOf } from './build-register.js';
import type { StockStory } from './build-stock.js';
import { HOUR } from './clock.js';
import { locationSpecs, partSpecs, siteSpecs, wallSpecs, type LocationKey, type PartKey, type WallKey } from './register.js';
import type { RepairSpec } from './work.js';

type Tech = 'tech1' | 'tech2';

/** Where and when a repair was done. */
export interface RepairContext {
  wall: WallKey;
  visitId: string;
  ticketId: string | null;
  tech: Tech;
  performedAt: Date;
}

export interface WorkLog {
  comment: (ticketId: string, authorId: string, body: string, visibility: 'public' | 'internal', createdAt: Date) => void;
  /** A visit and its technicians; returns the visit's id. */
  addVisit: (v: Omit<Insert<typeof schema.visits>, 'id'>, techs: string[]) => string;
  /** One repair with its stock consumption, cabinet history and any warranty return. */
  logRepair: (spec: RepairSpec, ctx: RepairContext) => void;
}

/** What the repairs draw on: the cabinets on the walls, the stock story, and the spare the story swaps in. */
interface RepairSources {
  cabinets: CabinetLog;
  stock: StockStory;
  kitSpareCabinet: { id: string };
  wallBatches: WallBatches;
}

export function createWorkLog(demo: Demo, sources: RepairSources): WorkLog {
  const { rows, id } = demo;
  return {
    comment: (ticketId, authorId, body, visibility, createdAt) => {
      rows.ticketComments.push({ id: id(), ticketId, authorId, body, visibility, createdAt });
    },
    addVisit: (v, techs) => {
      const visitId = id();
      rows.visits.push({ id: visitId, ...v });
      for (const t of techs) rows.visitTechnicians.push({ visitId, userId: t });
      return visitId;
    },
    logRepair: (spec, ctx) => logRepair(demo, sources, spec, ctx),
  };
}

function logRepair(demo: Demo, sources: RepairSources, spec: RepairSpec, ctx: RepairContext) {
  const { rows, id, ids } = demo;
  const { cabinets, stock } = sources;
  const w = wallSpecs[ctx.wall];
  const site = siteSpecs[w.site];
  const repairId = id();
  const cabinet = cabinets.at.get(`${ctx.wall}|${spec.column}|${spec.row}`)!;
  const part = spec.part;
  const batch = part && partSpecs[part].batched ? (spec.batch === 'later' ? stock.shelfLaterHx26 : cabinet.batch) : '';
  const kit = kitAt[w.site];
  const from: LocationKey | undefined = part ? (kit && spec.from !== 'van' ? kit : vanOf[ctx.tech]) : undefined;
  const swap = spec.action === 'cabinet_swapped';
  rows.repairs.push({
    id: repairId,
    clientId: ids.client[site.client],
    wallId: ids.wall[ctx.wall],
    visitId: ctx.visitId,
    ticketId: ctx.ticketId,
    cabinetId: cabinet.id,
    column: spec.column,
    row: spec.row,
    component: spec.component,
    moduleColumn: spec.module?.[0] ?? null,
    moduleRow: spec.module?.[1] ?? null,
    fault: spec.fault,
    action: spec.action,
    partId: part ? ids.part[part] : null,
    partBatch: part ? batch : null,
    fromLocationId: from ? ids.location[from] : null,
    removedPartFate: spec.fate ?? 'none',
    replacementCabinetId: swap ? sources.kitSpareCabinet.id : null,
    notes: spec.notes,
    technicianId: ids.user[ctx.tech],
    performedAt: ctx.performedAt,
    createdAt: ctx.performedAt,
  });
  if (part && from) {
    stock.moves.push({ part, batch, kind: 'consumption', from, quantity: 1, at: ctx.performedAt, repairId, actorId: ids.user[ctx.tech] });
  }
  if (!swap) {
    cabinets.event({
      cabinetId: cabinet.id,
      kind: 'repaired',
      repairId,
      actorId: ids.user[ctx.tech],
      createdAt: ctx.performedAt,
      note: `${spec.component.replace('_', ' ')}: ${spec.action.replace('_', ' ')} (${cellLabel(spec)}).`,
    });
  }
  if (spec.fate === 'to_vendor_return' && part) addWarrantyReturn(demo, stock, { spec, ctx, part, batch, repairId });
  if (swap) swapInKitSpare(demo, sources, { spec, ctx, old: cabinet.id, repairId });
}

/** The failed part goes back to the warehouse, then to the maker under warranty; the return is pending. */
function addWarrantyReturn(
  { rows, rand, clock, id, ids }: Demo,
  stock: StockStory,
  { spec, ctx, part, batch, repairId }: { spec: RepairSpec; ctx: RepairContext; part: PartKey; batch: string; repairId: string },
) {
  const w = wallSpecs[ctx.wall];
  const vrId = id();
  const turnaround = part === 'psu200' ? 45 : 30;
  const sentAt = clock.hoursFrom(ctx.performedAt, 72);
  const sentOffset = -Math.round((clock.nowMs - sentAt.getTime()) / (24 * HOUR));
  rows.vendorReturns.push({
    id: vrId,
    partId: ids.part[part],
    serial: `${partSpecs[part].sku.split('-')[0]}-${pad(rand.int(100000, 999999), 7)}`,
    batch,
    quantity: 1,
    fault: spec.notes,
    fromLocationId: ids.location.warehouse,
    repairId,
    rmaReference: `TRN-RMA-${rand.int(30000, 39999)}`,
    sentOn: clock.isoDate(sentOffset),
    expectedBackOn: clock.isoDate(sentOffset + turnaround),
    outcome: 'pending',
    backInStockOn: null,
    backToLocationId: null,
    notes: `Removed from ${w.name}, ${cellLabel(spec)}.`,
    createdAt: sentAt,
    updatedAt: sentAt,
  });
  stock.moves.push({
    part,
    batch,
    kind: 'return_from_wall',
    to: 'warehouse',
    quantity: 1,
    at: clock.hoursFrom(ctx.performedAt, 24),
    repairId,
    reason: `Failed unit from ${w.name} ${cellLabel(spec)}, held for a warranty return`,
    actorId: ids.user[ctx.tech],
  });
  stock.moves.push({
    part,
    batch,
    kind: 'sent_to_vendor',
    from: 'warehouse',
    quantity: 1,
    at: sentAt,
    vendorReturnId: vrId,
    reason: 'Warranty return',
    actorId: ids.user.office,
  });
}

/** The water-damaged cabinet leaves the wall; the site kit's spare takes its place, and a new spare is ordered. */
function swapInKitSpare(
  demo: Demo,
  { cabinets, kitSpareCabinet, wallBatches }: RepairSources,
  { spec, ctx, old, repairId }: { spec: RepairSpec; ctx: RepairContext; old: string; repairId: string },
) {
  const { rows, clock, ids } = demo;
  const site = siteSpecs[wallSpecs[ctx.wall].site];
  const replacement = kitSpareCabinet.id;
  const oldRow = rows.cabinets.find((c) => c.id === old)!;
  const newRow = rows.cabinets.find((c) => c.id === replacement)!;
  const retiredAt = clock.hoursFrom(ctx.performedAt, 9 * 24);
  const daysAgo = Math.round((clock.nowMs - ctx.performedAt.getTime()) / (24 * HOUR));
  Object.assign(oldRow, {
    wallId: null,
    column: null,
    row: null,
    status: 'retired',
    notes: 'Water damage: backplane corroded, not economical to repair.',
    updatedAt: retiredAt,
  });
  Object.assign(newRow, {
    wallId: ids.wall[ctx.wall],
    column: spec.column,
    row: spec.row,
    status: 'installed',
    stockLocationId: null,
    installedOn: clock.isoDate(-daysAgo, site.timeZone),
    updatedAt: ctx.performedAt,
  });
  cabinets.at.set(`${ctx.wall}|${spec.column}|${spec.row}`, { id: replacement, batch: newRow.batch as string });
  cabinets.event({
    cabinetId: old,
    kind: 'removed',
    fromWallId: ids.wall[ctx.wall],
    fromColumn: spec.column,
    fromRow: spec.row,
    otherCabinetId: replacement,
    repairId,
    fromStatus: 'installed',
    toStatus: 'at_bench',
    actorId: ids.user[ctx.tech],
    createdAt: ctx.performedAt,
    note: 'Removed after water damage; to the bench.',
  });
  cabinets.event({
    cabinetId: replacement,
    kind: 'placed',
    toWallId: ids.wall[ctx.wall],
    toColumn: spec.column,
    toRow: spec.row,
    otherCabinetId: old,
    repairId,
    fromStatus: 'spare',
    toStatus: 'installed',
    actorId: ids.user[ctx.tech],
    createdAt: ctx.performedAt,
    note: `Swapped in from ${locationSpecs.kitMain.name} for the water-damaged cabinet.`,
  });
  cabinets.event({
    cabinetId: old,
    kind: 'status_changed',
    fromStatus: 'at_bench',
    toStatus: 'retired',
    actorId: ids.user.admin,
    createdAt: retiredAt,
    note: 'Bench verdict: backplane corroded, not economical to repair.',
  });
  // A new spare cabinet for the site kit, ordered after the swap.
  addSpare(demo, cabinets, {
    model: 'hx26',
    batch: wallBatches.w01.later,
    location: 'kitMain',
    daysAgo: daysAgo - 30,
    note: 'Replacement on-site spare for the main hall walls.',
  });
}

/** A wall recalibrated by a repair (the lobby wall) takes that day as its calibration date. */
export function followRecalibrations({ rows, clock }: Demo) {
  for (const r of rows.repairs.filter((x) => x.action === 'recalibrated')) {
    const wall = rows.walls.find((w) => w.id === r.wallId)!;
    const site = rows.sites.find((s) => s.id === wall.siteId)!;
    const performedAt = r.performedAt as Date;
    wall.calibrationDate = clock.isoDate(-Math.round((clock.nowMs - performedAt.getTime()) / (24 * HOUR)), site.timeZone);
  }
}
