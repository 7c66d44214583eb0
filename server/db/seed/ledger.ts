// The demo's stock ledger. The story gives receipts, transfers, vendor returns, an adjustment and
// the consumptions of repairs; settling it adds the restocking a warehouse would have done so that
// no location ever goes below zero, then replays the whole history to prove it.
import type { StockMovementKind } from '../../../shared/schemas/enums.js';
import type { LocationKey, PartKey } from './register.js';

export interface Move {
  part: PartKey;
  batch: string;
  kind: StockMovementKind;
  from?: LocationKey;
  to?: LocationKey;
  quantity: number;
  at: Date;
  reason?: string;
  repairId?: string;
  vendorReturnId?: string;
  actorId?: string;
}

export interface Settled {
  moves: Move[];
  /** Quantity on hand per part, batch and location after the last move. */
  balances: Map<string, { part: PartKey; batch: string; location: LocationKey; quantity: number; updatedAt: Date }>;
}

const key = (part: PartKey, batch: string, location: LocationKey) => `${part}|${batch}|${location}`;
const HOUR = 3_600_000;
const byTime = (a: Move, b: Move) => a.at.getTime() - b.at.getTime();

/**
 * Orders the moves in time and tops up any location that would go short: a transfer from the
 * warehouse three hours before, and a receipt into the warehouse two days before when it is short
 * itself. Throws if the settled ledger still goes negative anywhere.
 */
export function settleLedger(input: Move[], restockActor: (to: LocationKey) => string | undefined): Settled {
  const moves = [...input].sort(byTime);
  const onHand = new Map<string, number>();
  const get = (k: string) => onHand.get(k) ?? 0;
  const added: Move[] = [];

  const ensure = (part: PartKey, batch: string, location: LocationKey, quantity: number, at: Date) => {
    const short = quantity - get(key(part, batch, location));
    if (short <= 0) return;
    if (location === 'warehouse') {
      const receipt: Move = {
        part,
        batch,
        kind: 'receipt',
        to: 'warehouse',
        quantity: short + (batch ? 2 : 6),
        at: new Date(at.getTime() - 48 * HOUR),
        reason: batch ? `Batch-matched restock ordered from the maker (batch ${batch})` : 'Restock order',
        actorId: restockActor('warehouse'),
      };
      added.push(receipt);
      onHand.set(key(part, batch, 'warehouse'), get(key(part, batch, 'warehouse')) + receipt.quantity);
      return;
    }
    const topUp = batch ? short : Math.max(short, 2);
    ensure(part, batch, 'warehouse', topUp, at);
    const transfer: Move = {
      part,
      batch,
      kind: 'transfer',
      from: 'warehouse',
      to: location,
      quantity: topUp,
      at: new Date(at.getTime() - 3 * HOUR),
      reason: 'Restocked from the warehouse',
      actorId: restockActor(location),
    };
    added.push(transfer);
    onHand.set(key(part, batch, 'warehouse'), get(key(part, batch, 'warehouse')) - topUp);
    onHand.set(key(part, batch, location), get(key(part, batch, location)) + topUp);
  };

  for (const m of moves) {
    if (m.from) {
      ensure(m.part, m.batch, m.from, m.quantity, m.at);
      onHand.set(key(m.part, m.batch, m.from), get(key(m.part, m.batch, m.from)) - m.quantity);
    }
    if (m.to) onHand.set(key(m.part, m.batch, m.to), get(key(m.part, m.batch, m.to)) + m.quantity);
  }

  // Replay the settled history in order and check it never goes below zero.
  const all = [...moves, ...added].sort(byTime);
  const balances: Settled['balances'] = new Map();
  const apply = (part: PartKey, batch: string, location: LocationKey, delta: number, at: Date) => {
    const k = key(part, batch, location);
    const quantity = (balances.get(k)?.quantity ?? 0) + delta;
    if (quantity < 0) throw new Error(`demo ledger goes negative: ${k} at ${at.toISOString()}`);
    balances.set(k, { part, batch, location, quantity, updatedAt: at });
  };
  for (const m of all) {
    if (m.from) apply(m.part, m.batch, m.from, -m.quantity, m.at);
    if (m.to) apply(m.part, m.batch, m.to, m.quantity, m.at);
  }
  return { moves: all, balances };
}
