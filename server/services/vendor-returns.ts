// Vendor returns (RMAs): a failed part sent back to its maker under warranty. Sending it takes it
// off the shelf it leaves from (`sent_to_vendor`); a repaired or replaced part comes back onto a
// shelf (`back_from_vendor`), each in the same transaction as the return's own row.
import { and, desc, eq, sql } from 'drizzle-orm';
import type { VendorReturn } from '../../shared/schemas/stock.js';
import type { listVendorReturnsQuery, vendorReturnInput, vendorReturnPatch } from '../../shared/schemas/stock.js';
import type { z } from 'zod';
import { db } from '../db/client.js';
import { parts, stockLocations, vendorReturns } from '../db/schema/stock.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { found } from './scope.js';
import { applyMovement } from './stock.js';

type ReturnRow = typeof vendorReturns.$inferSelect;

/** Pending past its expected date: compared with today's date where the server runs. */
const overdueSql = sql<boolean>`(${vendorReturns.outcome} = 'pending' and ${vendorReturns.expectedBackOn} < current_date)`;

function presentReturn(
  r: ReturnRow,
  part: { name: string; sku: string },
  fromName: string | null,
  backName: string | null,
  overdue: boolean,
): VendorReturn {
  return {
    id: r.id,
    part: { id: r.partId, name: part.name, sku: part.sku },
    serial: r.serial,
    batch: r.batch,
    quantity: r.quantity,
    fault: r.fault,
    from: r.fromLocationId ? { id: r.fromLocationId, name: fromName ?? '' } : null,
    rmaReference: r.rmaReference,
    sentOn: r.sentOn,
    expectedBackOn: r.expectedBackOn,
    outcome: r.outcome,
    backInStockOn: r.backInStockOn,
    backTo: r.backToLocationId ? { id: r.backToLocationId, name: backName ?? '' } : null,
    notes: r.notes,
    overdue,
    createdAt: r.createdAt.toISOString(),
  };
}

async function returnRows(where: ReturnType<typeof and>) {
  const from = sql.raw('from_location');
  const back = sql.raw('back_location');
  const rows = await db()
    .select({
      r: vendorReturns,
      partName: parts.name,
      partSku: parts.sku,
      fromName: sql<string | null>`(select name from stock_locations ${from} where ${from}.id = ${vendorReturns.fromLocationId})`,
      backName: sql<string | null>`(select name from stock_locations ${back} where ${back}.id = ${vendorReturns.backToLocationId})`,
      overdue: overdueSql,
    })
    .from(vendorReturns)
    .innerJoin(parts, eq(parts.id, vendorReturns.partId))
    .where(where)
    // Overdue first, then the pending by expected date, then the newest.
    .orderBy(
      desc(overdueSql),
      sql`${vendorReturns.outcome} = 'pending' desc`,
      sql`${vendorReturns.expectedBackOn} asc nulls last`,
      desc(vendorReturns.createdAt),
    );
  return rows.map((x) => presentReturn(x.r, { name: x.partName, sku: x.partSku }, x.fromName, x.backName, x.overdue));
}

export async function listVendorReturns(query: z.output<typeof listVendorReturnsQuery>): Promise<{ items: VendorReturn[] }> {
  return {
    items: await returnRows(
      and(query.outcome ? eq(vendorReturns.outcome, query.outcome) : undefined, query.overdue ? overdueSql : undefined),
    ),
  };
}

async function getVendorReturn(id: string): Promise<VendorReturn> {
  const [row] = await returnRows(eq(vendorReturns.id, id));
  return found(row, 'Vendor return');
}

/** Opens a return; from a shelf, the part leaves it in the same transaction. */
export async function openVendorReturn(actor: Actor, input: z.output<typeof vendorReturnInput>): Promise<VendorReturn> {
  const id = await db().transaction(async (tx) => {
    const [part] = await tx.select({ id: parts.id }).from(parts).where(eq(parts.id, input.partId));
    found(part, 'Part');
    const [row] = await tx
      .insert(vendorReturns)
      .values({
        partId: input.partId,
        serial: input.serial,
        batch: input.batch,
        quantity: input.quantity,
        fault: input.fault,
        fromLocationId: input.fromLocationId ?? null,
        rmaReference: input.rmaReference,
        sentOn: input.sentOn ?? null,
        expectedBackOn: input.expectedBackOn ?? null,
        notes: input.notes ?? '',
      })
      .returning();
    if (input.fromLocationId) {
      await applyMovement(
        tx,
        actor,
        {
          kind: 'sent_to_vendor',
          partId: input.partId,
          batch: input.batch,
          fromLocationId: input.fromLocationId,
          quantity: input.quantity,
          reason: input.fault,
        },
        { vendorReturnId: row.id },
      );
    }
    await recordAudit(tx, { actor, entity: 'vendor_return', entityId: row.id, action: 'created', after: row });
    return row.id;
  });
  return getVendorReturn(id);
}

/**
 * Records what the maker did. A repaired or replaced part put back on a shelf comes into stock
 * once (`back_from_vendor`) and the return notes the day.
 */
export async function updateVendorReturn(actor: Actor, id: string, patch: z.output<typeof vendorReturnPatch>): Promise<VendorReturn> {
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(vendorReturns).where(eq(vendorReturns.id, id)).for('update');
    found(before, 'Vendor return');
    const comingBack = patch.backToLocationId && !before.backToLocationId;
    if (comingBack) {
      const [location] = await tx
        .select({ id: stockLocations.id })
        .from(stockLocations)
        .where(eq(stockLocations.id, patch.backToLocationId!));
      found(location, 'Stock location');
    }
    const [after] = await tx
      .update(vendorReturns)
      .set({
        ...(patch.outcome ? { outcome: patch.outcome } : {}),
        ...(patch.rmaReference !== undefined ? { rmaReference: patch.rmaReference } : {}),
        ...(patch.sentOn ? { sentOn: patch.sentOn } : {}),
        ...(patch.expectedBackOn ? { expectedBackOn: patch.expectedBackOn } : {}),
        ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
        ...(comingBack ? { backToLocationId: patch.backToLocationId, backInStockOn: sql`current_date` } : {}),
        updatedAt: new Date(),
      })
      .where(eq(vendorReturns.id, id))
      .returning();
    if (comingBack) {
      await applyMovement(
        tx,
        actor,
        {
          kind: 'back_from_vendor',
          partId: before.partId,
          batch: before.batch,
          toLocationId: patch.backToLocationId!,
          quantity: before.quantity,
          reason: `Back from the maker (${after.outcome})`,
        },
        { vendorReturnId: id },
      );
    }
    await recordAudit(tx, { actor, entity: 'vendor_return', entityId: id, action: 'updated', before, after });
  });
  return getVendorReturn(id);
}
