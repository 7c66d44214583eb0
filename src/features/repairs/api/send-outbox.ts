// Sends the repairs waiting in the phone's outbox (lib/offline-queue.ts), oldest first: the
// repair with its Idempotency-Key, then its photos one by one. A lost connection leaves an item
// waiting for the next try (the `online` event, the app's start, every half minute while items
// wait, "Send now"); a refusal no retry can fix (a 4xx) moves it to "needs attention" with the
// server's words, for the technician to fix or discard.
import type { QueryClient } from '@tanstack/react-query';
import type { RepairItem } from '@shared/schemas/repairs';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/errors';
import { listOutbox, removeFromOutbox, updateOutboxItem, type OutboxPhoto, type OutboxRepair } from '@/lib/offline-queue';
import { uploadWithProgress } from '@/lib/upload-with-progress';
import { cabinetKeys } from '@/resources/cabinets';
import { repairKeys, repairRequests } from '@/resources/repairs';
import { stockKeys } from '@/resources/stock';
import { ticketKeys } from '@/resources/tickets';
import { visitKeys } from '@/resources/visits';
import { wallKeys } from '@/resources/walls';

/** Every screen a logged repair changes: the repairs, the visit, the ticket, the cabinet, the wall map, the stock. */
export const repairWriteKeys = [repairKeys.all, visitKeys.all, ticketKeys.all, cabinetKeys.all, wallKeys.all, stockKeys.all] as const;

/** Attaches a photo to a recorded repair (`POST /api/repairs/:id/photos`, multipart field `file`). */
function uploadRepairPhoto(repairId: string, photo: OutboxPhoto) {
  const body = new FormData();
  body.append('file', photo.blob, photo.name);
  return uploadWithProgress<unknown>(`/api/repairs/${encodeURIComponent(repairId)}/photos`, { body });
}

/**
 * Worth trying again later: no answer at all (offline, one bar of signal), the server busy or
 * restarting, or the session ended (the technician signs in again and the item goes then).
 */
export function isTransient(error: unknown): boolean {
  if (!isApiError(error)) return true;
  return error.status === 0 || error.status >= 500 || error.status === 401 || error.status === 408 || error.status === 429;
}

export type SendResult = 'sent' | 'waiting' | 'refused';

async function sendOne(item: OutboxRepair): Promise<SendResult> {
  const now = new Date().toISOString();
  await updateOutboxItem(item.key, (i) => ({ ...i, attempts: i.attempts + 1, lastTriedAt: now }));
  let repairId = item.repairId;
  try {
    if (!repairId) {
      // The same key on every try: if an earlier try reached the server and only its answer was
      // lost, the server answers with that first repair and writes nothing.
      const repair: RepairItem = await repairRequests.create({ key: item.key, input: item.input });
      repairId = repair.id;
      await updateOutboxItem(item.key, (i) => ({ ...i, repairId: repair.id }));
    }
    for (const photo of item.photos) {
      await uploadRepairPhoto(repairId, photo);
      await updateOutboxItem(item.key, (i) => ({ ...i, photos: i.photos.filter((p) => p.id !== photo.id) }));
    }
    await removeFromOutbox(item.key);
    return 'sent';
  } catch (error) {
    if (isTransient(error)) {
      await updateOutboxItem(item.key, (i) => ({ ...i, lastError: errorMessage(error) }));
      return 'waiting';
    }
    const status = isApiError(error) ? error.status : 0;
    const code = isApiError(error) ? error.code : 'unknown';
    const message = isApiError(error) && error.message ? error.message : errorMessage(error);
    await updateOutboxItem(item.key, (i) => ({
      ...i,
      state: 'needs_attention',
      lastError: null,
      problem: { status, code, message, afterSaved: repairId !== null },
    }));
    return 'refused';
  }
}

export interface SendSummary {
  sent: number;
  waiting: number;
  refused: number;
  /** What each item tried came to, by key. */
  results: Record<string, SendResult>;
}

let running: Promise<SendSummary> | null = null;

async function sendWaiting(queryClient: QueryClient, only?: string): Promise<SendSummary> {
  const summary: SendSummary = { sent: 0, waiting: 0, refused: 0, results: {} };
  const items = (await listOutbox()).filter((i) => i.state === 'waiting' && (!only || i.key === only));
  // The phone knows it has no network: nothing to try until the `online` event.
  if (typeof navigator !== 'undefined' && navigator.onLine === false) {
    for (const item of items) summary.results[item.key] = 'waiting';
    summary.waiting = items.length;
    return summary;
  }
  for (const item of items) {
    const result = await sendOne(item);
    summary.results[item.key] = result;
    summary[result] += 1;
    // No connection: the rest would fail the same way; they go at the next try.
    if (result === 'waiting') break;
  }
  if (summary.sent > 0) await Promise.all(repairWriteKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
  return summary;
}

/**
 * Sends what waits, one run at a time in this tab (a Web Lock keeps two tabs from sending the
 * same item at once; the key would make a double send harmless anyway).
 */
export function sendOutbox(queryClient: QueryClient, options: { only?: string } = {}): Promise<SendSummary> {
  if (running) {
    return running.then(
      () => sendOutbox(queryClient, options),
      () => sendOutbox(queryClient, options),
    );
  }
  const run = () => sendWaiting(queryClient, options.only);
  const locked: Promise<SendSummary> =
    typeof navigator !== 'undefined' && navigator.locks
      ? navigator.locks.request('gridkeep-outbox', run).then((summary) => summary)
      : run();
  running = locked.finally(() => {
    running = null;
  });
  return running;
}
