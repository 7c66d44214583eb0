import type { DbOrTx } from '../db/client.js';
import { auditEvents } from '../db/schema/accounts.js';
import type { Actor } from '../middleware/auth.js';

const secretKeys = new Set(['passwordHash', 'tokenHash', 'password']);

/** Copies a record for the log: dates as ISO strings, secrets dropped. */
function snapshot(value: unknown): unknown {
  if (value === null || value === undefined) return null;
  if (value instanceof Date) return value.toISOString();
  if (Array.isArray(value)) return value.map(snapshot);
  if (typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) if (!secretKeys.has(k)) out[k] = snapshot(v);
    return out;
  }
  return value;
}

/** Keeps only what changed between two snapshots of a record (both sides). */
function changedOnly(before: Record<string, unknown>, after: Record<string, unknown>) {
  const b: Record<string, unknown> = {};
  const a: Record<string, unknown> = {};
  for (const key of new Set([...Object.keys(before), ...Object.keys(after)])) {
    if (key === 'updatedAt') continue;
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) {
      b[key] = before[key];
      a[key] = after[key];
    }
  }
  return { before: b, after: a };
}

export interface AuditInput {
  actor: Actor | null;
  entity: string;
  entityId: string;
  action: string;
  before?: unknown;
  after?: unknown;
  requestId?: string;
}

/**
 * Records one change, in the caller's transaction so the log and the change land together.
 * Updates keep only the fields that changed.
 */
export async function recordAudit(tx: DbOrTx, input: AuditInput) {
  let before = snapshot(input.before);
  let after = snapshot(input.after);
  if (before && after && typeof before === 'object' && typeof after === 'object' && !Array.isArray(before)) {
    ({ before, after } = changedOnly(before as Record<string, unknown>, after as Record<string, unknown>));
  }
  await tx.insert(auditEvents).values({
    actorId: input.actor?.userId ?? null,
    entity: input.entity,
    entityId: input.entityId,
    action: input.action,
    before,
    after,
    requestId: input.requestId ?? input.actor?.requestId ?? null,
  });
}
