// Writes sent with an `Idempotency-Key` header (the IETF httpapi draft "The Idempotency-Key HTTP
// Header Field"): a double tap, a retry after a lost answer or a phone's queue sending again gets
// the first answer back and writes nothing twice.
import { createHash } from 'node:crypto';
import { and, eq, lt } from 'drizzle-orm';
import { idempotencyKey } from '../../shared/schemas/repairs.js';
import { db, type Tx } from '../db/client.js';
import { idempotentRequests } from '../db/schema/visits.js';
import { AppError, validationFailed } from '../errors.js';
import type { Actor } from '../middleware/auth.js';

export const IDEMPOTENCY_HEADER = 'Idempotency-Key';

/** The header's key, or the 400 that names the header. */
export function parseIdempotencyKey(value: string | undefined): string {
  if (value === undefined || value.trim() === '') {
    throw validationFailed(
      { [IDEMPOTENCY_HEADER]: 'Required: a unique key made by the sender for this write (a UUID).' },
      `Send an ${IDEMPOTENCY_HEADER} header with this request.`,
    );
  }
  const parsed = idempotencyKey.safeParse(value);
  if (!parsed.success) {
    const message = parsed.error.issues[0]?.message ?? 'Not a valid key.';
    throw validationFailed({ [IDEMPOTENCY_HEADER]: message }, message);
  }
  return parsed.data;
}

/** JSON with object keys sorted at every level, so the same body always hashes the same. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

export const requestHash = (body: unknown) => createHash('sha256').update(canonical(body)).digest('hex');

export interface Answer<T> {
  statusCode: number;
  body: T;
  /** True when this is the stored answer of an earlier request with the same key. */
  replayed: boolean;
}

/**
 * Runs `work` once per (user, key) in one transaction with the record of its answer. The key's row
 * is inserted first: a concurrent request with the same key waits on the primary key until the
 * first commits (then finds its answer) or rolls back (then does the work itself). A failed write
 * rolls the key back with everything else, so the sender may try again.
 */
export async function oncePerKey<T>(
  actor: Actor,
  request: { key: string; route: string; body: unknown },
  work: (tx: Tx) => Promise<{ statusCode: number; body: T }>,
): Promise<Answer<T>> {
  const hash = requestHash(request.body);
  return db().transaction(async (tx) => {
    const [claimed] = await tx
      .insert(idempotentRequests)
      .values({ userId: actor.userId, key: request.key, route: request.route, requestHash: hash, statusCode: 0, response: {} })
      .onConflictDoNothing()
      .returning({ key: idempotentRequests.key });
    if (!claimed) {
      const [first] = await tx
        .select()
        .from(idempotentRequests)
        .where(and(eq(idempotentRequests.userId, actor.userId), eq(idempotentRequests.key, request.key)));
      if (!first || first.route !== request.route || first.requestHash !== hash) {
        throw new AppError(
          422,
          'idempotency_key_reused',
          `This ${IDEMPOTENCY_HEADER} was already used for another request. Send a new key for a new write.`,
          { [IDEMPOTENCY_HEADER]: 'Already used for another request.' },
        );
      }
      // The stored answer is the JSON the first request sent.
      return { statusCode: first.statusCode, body: first.response as T, replayed: true };
    }
    const answer = await work(tx);
    await tx
      .update(idempotentRequests)
      .set({ statusCode: answer.statusCode, response: answer.body as object })
      .where(and(eq(idempotentRequests.userId, actor.userId), eq(idempotentRequests.key, request.key)));
    return { ...answer, replayed: false };
  });
}

/**
 * How long a key's answer is kept. Longer than a queued repair may wait (a repair done more than
 * 30 days ago is refused), so a phone's retry always finds its first answer.
 */
export const KEEP_KEYS_DAYS = 35;

/** Forgets the answers older than `KEEP_KEYS_DAYS`; returns how many went. Run hourly by the server. */
export async function forgetOldKeys(now = new Date()): Promise<number> {
  const cutoff = new Date(now.getTime() - KEEP_KEYS_DAYS * 24 * 3600_000);
  const gone = await db()
    .delete(idempotentRequests)
    .where(lt(idempotentRequests.createdAt, cutoff))
    .returning({ key: idempotentRequests.key });
  return gone.length;
}
