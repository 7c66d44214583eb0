// The demo's parts stock: the opening story (receipts, transfers to the vans and site kits, a
// new module batch, a cycle count, a dead-on-arrival return), then the ledger settled with the
// repairs' consumptions into movements, balances and reorder points.
import { entries, pad, type Demo } from './build-context.js';
import { kitAt } from './build-register.js';
import type { WallBatches } from './build-cabinets.js';
import { settleLedger, type Move, type Settled } from './ledger.js';
import { company, modelSpecs, moduleForModel, wallSpecs, type LocationKey, type PartKey } from './register.js';

/** The stock story so far: the moves (repairs add theirs) and the newer module batch on the shelf. */
export interface StockStory {
  moves: Move[];
  shelfLaterHx26: string;
}

/** Receipts into the warehouse, the initial stocking of vans and site kits, a later batch, a cycle count. */
export function openingStock({ clock, ids }: Demo, wallBatches: WallBatches): StockStory {
  const moves: Move[] = [];
  const at = (daysAgo: number, hour = 10) => clock.at(company.defaultTimeZone, -daysAgo, hour);
  const receive = (part: PartKey, quantity: number, daysAgo: number, batch = '', reason = 'Purchase order received') =>
    moves.push({ part, batch, kind: 'receipt', to: 'warehouse', quantity, at: at(daysAgo, 9), reason, actorId: ids.user.office });
  const transfer = (part: PartKey, quantity: number, to: LocationKey, daysAgo: number, batch = '') =>
    moves.push({
      part,
      batch,
      kind: 'transfer',
      from: 'warehouse',
      to,
      quantity,
      at: at(daysAgo, 14),
      reason: 'Initial stocking',
      actorId: ids.user.office,
    });

  for (const [k, w] of entries(wallSpecs)) {
    if (w.sharesBatchesWith) continue;
    const kit = kitAt[w.site];
    for (const batch of wallBatches[k].original) {
      receive(moduleForModel[w.model], kit ? 4 : 3, 245, batch, "Spare modules matched to the wall's production batch");
      if (kit) transfer(moduleForModel[w.model], 2, kit, 238, batch);
    }
  }
  receive('psu200', 16, 245);
  receive('psu300', 4, 245);
  receive('rxc', 10, 245);
  receive('dataCable', 24, 245);
  receive('powerCable', 24, 245);
  receive('fan', 8, 245);
  for (const [part, qty] of [
    ['psu200', 2],
    ['rxc', 2],
    ['dataCable', 2],
    ['powerCable', 2],
  ] as const)
    transfer(part, qty, 'kitMain', 238);
  for (const [part, qty] of [
    ['psu200', 2],
    ['psu300', 1],
    ['rxc', 1],
    ['fan', 2],
  ] as const)
    transfer(part, qty, 'kitArena', 238);
  for (const [part, qty] of [
    ['psu200', 2],
    ['rxc', 2],
    ['dataCable', 4],
    ['powerCable', 4],
    ['fan', 1],
  ] as const)
    transfer(part, qty, 'van1', 237);
  for (const [part, qty] of [
    ['psu200', 2],
    ['rxc', 2],
    ['dataCable', 4],
    ['powerCable', 4],
    ['fan', 2],
  ] as const)
    transfer(part, qty, 'van2', 237);
  receive('psu200', 8, 150);
  receive('dataCable', 12, 150);
  const shelfLaterHx26 = `${modelSpecs.hx26.batchPrefix}-${clock.yymm(-135)}-A`;
  receive('modHx26', 6, 125, shelfLaterHx26, 'New production batch from the maker');
  moves.push({
    part: 'dataCable',
    batch: '',
    kind: 'adjustment',
    from: 'van2',
    quantity: 1,
    at: at(45, 17),
    reason: 'Cycle count: one data jumper missing from the van',
    actorId: ids.user.office,
  });
  return { moves, shelfLaterHx26 };
}

/** A receiving card found dead on arrival goes back to the maker and comes back replaced. */
export function addDeadOnArrivalReturn({ rows, rand, clock, id, ids }: Demo, { moves }: StockStory) {
  const at = (daysAgo: number, hour: number) => clock.at(company.defaultTimeZone, -daysAgo, hour);
  const doaId = id();
  rows.vendorReturns.push({
    id: doaId,
    partId: ids.part.rxc,
    serial: `RXA8-${pad(rand.int(10000, 99999), 6)}`,
    batch: '',
    quantity: 1,
    fault: 'Dead on arrival: no link LED when bench-tested.',
    fromLocationId: ids.location.warehouse,
    repairId: null,
    rmaReference: `TRN-RMA-${rand.int(20000, 29999)}`,
    sentOn: clock.isoDate(-200),
    expectedBackOn: clock.isoDate(-170),
    outcome: 'replaced',
    backInStockOn: clock.isoDate(-172),
    backToLocationId: ids.location.warehouse,
    notes: 'Maker sent a new card.',
    createdAt: at(200, 9),
    updatedAt: at(172, 9),
  });
  moves.push({
    part: 'rxc',
    batch: '',
    kind: 'sent_to_vendor',
    from: 'warehouse',
    quantity: 1,
    at: at(200, 15),
    vendorReturnId: doaId,
    reason: 'Warranty return: dead on arrival',
    actorId: ids.user.office,
  });
  moves.push({
    part: 'rxc',
    batch: '',
    kind: 'back_from_vendor',
    to: 'warehouse',
    quantity: 1,
    at: at(172, 11),
    vendorReturnId: doaId,
    reason: 'Replacement from the maker',
    actorId: ids.user.office,
  });
}

/** Settles the ledger (restocking where a location would go short) and writes the movements and balances it implies. */
export function settleStock({ rows, ids }: Demo, { moves }: StockStory): Settled {
  const restockActor = (to: LocationKey) => (to === 'van1' ? ids.user.tech1 : to === 'van2' ? ids.user.tech2 : ids.user.office);
  const settled = settleLedger(moves, restockActor);
  rows.stockMovements = settled.moves.map((m) => ({
    partId: ids.part[m.part],
    batch: m.batch,
    kind: m.kind,
    fromLocationId: m.from ? ids.location[m.from] : null,
    toLocationId: m.to ? ids.location[m.to] : null,
    quantity: m.quantity,
    reason: m.reason ?? '',
    repairId: m.repairId ?? null,
    vendorReturnId: m.vendorReturnId ?? null,
    actorId: m.actorId ?? null,
    createdAt: m.at,
  }));
  rows.stockBalances = [...settled.balances.values()].map((b) => ({
    partId: ids.part[b.part],
    batch: b.batch,
    locationId: ids.location[b.location],
    quantity: b.quantity,
    updatedAt: b.updatedAt,
  }));
  return settled;
}

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

/** Reorder points; an alert is recorded where stock already sits at or below the minimum. */
export function addReorderPoints({ rows, clock, ids }: Demo, settled: Settled) {
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
  for (const [part, location, minQuantity, reorderQuantity] of reorder) {
    const { total, last } = onHand(part, location);
    rows.reorderPoints.push({
      partId: ids.part[part],
      locationId: ids.location[location],
      minQuantity,
      reorderQuantity,
      alertedAt: total <= minQuantity && last ? clock.hoursFrom(last, 0.1) : null,
    });
  }
}
