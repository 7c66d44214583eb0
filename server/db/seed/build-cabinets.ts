// The demo's walls and every cabinet: each wall with its controller and production batches, the
// cabinets placed at install (a few replaced at commissioning), and the spare cabinets in stock.
import { addYears, parseISO } from 'date-fns';
import type * as schema from '../schema/index.js';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS } from '../../../shared/calc/video-signal.js';
import { asBuiltPlan, dataLinesInUse } from './as-built.js';
import { entries, pad, type Demo, type Insert } from './build-context.js';
import {
  company,
  controllerModels,
  locationSpecs,
  modelSpecs,
  siteSpecs,
  usualTechnician,
  wallSpecs,
  type LocationKey,
  type ModelKey,
  type WallKey,
} from './register.js';
import { ticketSpecs } from './work.js';

const letters = 'ABCDEFGH';

/** The cabinets written so far and where each one on a wall is. */
export interface CabinetLog {
  /** The cabinet at `wall|column|row` now, with its production batch. */
  at: Map<string, { id: string; batch: string }>;
  /** The next serial of a model, in the maker's format, for a batch made in `yymm`. */
  serialFor: (model: ModelKey, yymm: string, letter: string) => string;
  add: (c: Insert<typeof schema.cabinets>) => string;
  event: (e: Omit<Insert<typeof schema.cabinetEvents>, 'id'>) => void;
}

export function createCabinetLog({ rows, rand, id }: Demo): CabinetLog {
  const serialSeq = {} as Record<ModelKey, number>;
  return {
    at: new Map(),
    serialFor: (model, yymm, letter) => {
      serialSeq[model] = (serialSeq[model] ?? rand.int(20, 90) * 10) + 1;
      const m = modelSpecs[model];
      if (model === 'mv15') return `${m.serialPrefix}-${yymm}${pad(serialSeq[model], 4)}`;
      if (model.startsWith('tw')) return `${m.serialPrefix}-${yymm.slice(0, 2)}${letter}-${pad(serialSeq[model], 6)}`;
      return `${m.serialPrefix}-${yymm}-${pad(serialSeq[model], 5)}`;
    },
    add: (c) => {
      rows.cabinets.push(c);
      return c.id as string;
    },
    event: (e) => {
      rows.cabinetEvents.push({ id: id(), ...e });
    },
  };
}

/** Each wall's original production batches and the later batch of its commissioning replacements. */
export type WallBatches = Record<WallKey, { original: string[]; later: string }>;

type WallSpec = (typeof wallSpecs)[WallKey];

/** The water-damaged cabinet of the story keeps its place until the repair that swaps it. */
const swapStory = { wall: 'w01' as WallKey, column: 3, row: 5 };
/** The cells the story repairs, which keep an original cabinet. */
const repairPositions = new Set(ticketSpecs.flatMap((t) => (t.wall ? (t.repairs ?? []).map((r) => `${t.wall}|${r.column}|${r.row}`) : [])));

/** Every wall with its controller and cabinets. */
export function addWalls(demo: Demo, cabinets: CabinetLog): WallBatches {
  const wallBatches = {} as WallBatches;
  for (const [k, w] of entries(wallSpecs)) {
    const installed = addWall(demo, k, w);
    wallBatches[k] = batchesOf(demo, w, wallBatches);
    const swaps = commissioningSwaps(demo, k, w);
    placeCabinets(demo, cabinets, k, w, wallBatches[k], swaps, installed);
  }
  return wallBatches;
}

/** The wall's row and its controller's; when it was installed. */
function addWall({ rows, rand, clock, id, ids }: Demo, k: WallKey, w: WallSpec) {
  const site = siteSpecs[w.site];
  const model = modelSpecs[w.model];
  ids.wall[k] = id();
  const installDate = clock.isoDate(-w.installedDaysAgo, site.timeZone);
  const installedAt = clock.at(site.timeZone, -w.installedDaysAgo, 10);
  rows.walls.push({
    id: ids.wall[k],
    clientId: ids.client[site.client],
    siteId: ids.site[w.site],
    name: w.name,
    cabinetModelId: ids.model[w.model],
    columns: w.columns,
    rows: w.rows,
    mounting: w.mounting,
    installDate,
    warrantyEnd: addYears(parseISO(installDate), w.warrantyYears).toISOString().slice(0, 10),
    calibrationDate: installDate,
    inputNotes: w.inputNotes,
    internalNotes: w.internalNotes,
    ...asBuiltPlan(w, model),
    createdAt: installedAt,
    updatedAt: installedAt,
  });
  const ctrl = controllerModels[w.controller];
  rows.controllers.push({
    id: id(),
    wallId: ids.wall[k],
    model: ctrl.model,
    serial: `${ctrl.serialPrefix}-${clock.yymm(-w.installedDaysAgo - 40)}-${pad(rand.int(1000, 99999), 5)}`,
    firmware: w.firmware,
    outputs: ctrl.outputs,
    outputsInUse: dataLinesInUse(w, model),
    pixelsPerOutput: DEFAULT_OUTPUT_CAPACITY_PIXELS,
    notes: '',
    createdAt: installedAt,
    updatedAt: installedAt,
  });
  return { installDate, installedAt };
}

/**
 * Production batches: the originals were made about two months before the install; the
 * commissioning replacements come from a later run. A wall may share another wall's batches.
 */
function batchesOf({ clock }: Demo, w: WallSpec, wallBatches: WallBatches) {
  const model = modelSpecs[w.model];
  const made = clock.yymm(-w.installedDaysAgo - 60);
  const shared = w.sharesBatchesWith ? wallBatches[w.sharesBatchesWith] : undefined;
  const original = shared
    ? shared.original.slice(0, w.batches)
    : Array.from({ length: w.batches }, (_, i) => `${model.batchPrefix}-${made}-${letters[i]}`);
  const later = shared ? shared.later : `${model.batchPrefix}-${clock.yymm(-w.installedDaysAgo - 20)}-${letters[w.batches]}`;
  return { original, later };
}

/** The cells (`column|row`) whose cabinet failed burn-in at commissioning, away from the story's repairs. */
function commissioningSwaps({ rand }: Demo, k: WallKey, w: WallSpec) {
  const swaps = new Set<string>();
  while (swaps.size < w.commissioningSwaps) {
    const c = rand.int(1, w.columns);
    const r = rand.int(1, w.rows);
    const pos = `${k}|${c}|${r}`;
    if (repairPositions.has(pos) || (k === swapStory.wall && c === swapStory.column && r === swapStory.row)) continue;
    swaps.add(`${c}|${r}`);
  }
  return swaps;
}

/** Every cabinet of the wall, row by row, each with its "placed" event. */
function placeCabinets(
  { clock, id, ids }: Demo,
  cabinets: CabinetLog,
  k: WallKey,
  w: WallSpec,
  batches: { original: string[]; later: string },
  swaps: Set<string>,
  { installDate, installedAt }: { installDate: string; installedAt: Date },
) {
  const site = siteSpecs[w.site];
  const tech = ids.user[usualTechnician[site.client]];
  for (let r = 1; r <= w.rows; r++) {
    for (let c = 1; c <= w.columns; c++) {
      const replacement = swaps.has(`${c}|${r}`);
      const batch = replacement ? batches.later : batches.original[Math.floor(((c - 1) * w.batches) / w.columns)];
      const batchLetter = batch.slice(-1);
      const at = replacement ? clock.hoursFrom(installedAt, 14 * 24) : installedAt;
      const cabId = cabinets.add({
        id: id(),
        serial: cabinets.serialFor(w.model, batch.split('-')[1], batchLetter),
        cabinetModelId: ids.model[w.model],
        wallId: ids.wall[k],
        column: c,
        row: r,
        batch,
        status: 'installed',
        stockLocationId: null,
        installedOn: replacement ? clock.isoDate(-w.installedDaysAgo + 14, site.timeZone) : installDate,
        notes: replacement ? 'Replacement for a cabinet that failed burn-in at commissioning.' : '',
        createdAt: at,
        updatedAt: at,
      });
      cabinets.at.set(`${k}|${c}|${r}`, { id: cabId, batch });
      cabinets.event({
        cabinetId: cabId,
        kind: 'placed',
        toWallId: ids.wall[k],
        toColumn: c,
        toRow: r,
        toStatus: 'installed',
        actorId: tech,
        note: replacement ? 'Fitted at commissioning in place of a unit that failed burn-in.' : 'Installed.',
        createdAt: at,
      });
    }
  }
}

/** A spare cabinet received into a stock location `daysAgo` days ago. */
export function addSpare(
  { clock, id, ids }: Demo,
  cabinets: CabinetLog,
  spec: { model: ModelKey; batch: string; location: LocationKey; daysAgo: number; note: string },
) {
  const { model, batch, location, daysAgo, note } = spec;
  const at = clock.at(company.defaultTimeZone, -daysAgo, 11);
  const cabId = cabinets.add({
    id: id(),
    serial: cabinets.serialFor(model, batch.split('-')[1], batch.slice(-1)),
    cabinetModelId: ids.model[model],
    wallId: null,
    column: null,
    row: null,
    batch,
    status: 'spare',
    stockLocationId: ids.location[location],
    installedOn: null,
    notes: note,
    createdAt: at,
    updatedAt: at,
  });
  cabinets.event({
    cabinetId: cabId,
    kind: 'status_changed',
    toStatus: 'spare',
    actorId: ids.user.office,
    note: `Received into ${locationSpecs[location].name}.`,
    createdAt: at,
  });
  return { id: cabId, at };
}

/** Spare cabinets kept as attic stock; returns the main hall's on-site spare (the story swaps it in). */
export function addAtticStock(demo: Demo, cabinets: CabinetLog, wallBatches: WallBatches) {
  const w1 = wallSpecs.w01;
  const spare = (model: ModelKey, batch: string, location: LocationKey, daysAgo: number, note: string) =>
    addSpare(demo, cabinets, { model, batch, location, daysAgo, note });
  const kitSpareCabinet = spare(
    'hx26',
    wallBatches.w01.later,
    'kitMain',
    w1.installedDaysAgo - 14,
    'On-site spare for the main hall walls.',
  );
  spare('hx26', wallBatches.w01.original[0], 'warehouse', w1.installedDaysAgo - 14, 'Attic stock for the Cedar Hollow main hall.');
  spare('hx26', wallBatches.w11.later, 'warehouse', wallSpecs.w11.installedDaysAgo - 10, 'Attic stock for the exhibit hall curved wall.');
  spare(
    'mv15',
    wallBatches.w12.original[1],
    'warehouse',
    wallSpecs.w12.installedDaysAgo - 10,
    'Attic stock for the Alderbrook lobby wall.',
  );
  spare('tw39', wallBatches.w09.original[0], 'kitArena', wallSpecs.w09.installedDaysAgo - 7, 'On-site spare for the centre-hung wall.');
  return kitSpareCabinet;
}
