// The phone's outbox: repairs logged behind a wall with no signal wait here, in IndexedDB, until
// they are sent. An item is written BEFORE the first try to send it, so nothing typed is lost to
// a dropped connection, a reload or a closed tab; its `key` (the Idempotency-Key) is made once,
// so every try of it is the same request and the server never writes it twice.
//
// This module only keeps the items and tells screens when they change (in this tab and in the
// others, through a BroadcastChannel); sending them is the repairs feature's (features/repairs).
import type { CreateRepairInput } from '@shared/schemas/repairs';
import { createStore, del, get, set, values, type UseStore } from 'idb-keyval';
import { useSyncExternalStore } from 'react';

export interface OutboxPhoto {
  id: string;
  name: string;
  type: string;
  blob: Blob;
}

/** What the outbox shows of a repair, written when it was saved (the phone may be offline then). */
export interface OutboxSummary {
  wallId: string;
  wallName: string;
  /** `C{col}·R{row}`. */
  position: string;
  cabinetSerial: string;
  /** "Module 2·1 · Module dark · Replaced". */
  what: string;
  /** The spare fitted or the replacement cabinet, in words. */
  part: string | null;
  visitId?: string;
  ticketId?: string;
  /** The ticket's reference or the visit's site, to say where it came from. */
  origin?: string;
}

/** A problem the server reported that no retry fixes (a 4xx): the technician resolves it. */
export interface OutboxProblem {
  status: number;
  code: string;
  message: string;
  /** The repair was recorded and only photos failed. */
  afterSaved: boolean;
}

export type OutboxState = 'waiting' | 'needs_attention';

export interface OutboxRepair {
  /** The Idempotency-Key, made once when Save was tapped; also the item's id. */
  key: string;
  input: CreateRepairInput;
  /** Photos still to upload (each leaves the list once the server has it). */
  photos: OutboxPhoto[];
  summary: OutboxSummary;
  state: OutboxState;
  savedAt: string;
  attempts: number;
  lastTriedAt: string | null;
  /** The last reason a try did not go through (offline, signed out…), for the outbox. */
  lastError: string | null;
  /** Set once the server has the repair; its photos may still be on their way. */
  repairId: string | null;
  problem: OutboxProblem | null;
  /** The form as it was at Save, so the technician can open it again to fix a refusal. */
  draft: unknown;
}

const hasIndexedDb = typeof indexedDB !== 'undefined';
let store: UseStore | null = null;
/** One database per store: idb-keyval opens each database with exactly one object store. */
const outboxStore = () => (store ??= createStore('gridkeep-outbox', 'repairs'));

// ---- change notifications: this tab's screens, and the other tabs of the app ----

const listeners = new Set<() => void>();
const channel = typeof BroadcastChannel !== 'undefined' ? new BroadcastChannel('gridkeep-outbox') : null;
let snapshot: OutboxRepair[] | null = null;
let loading: Promise<void> | null = null;

async function reload() {
  const items = hasIndexedDb ? await values<OutboxRepair>(outboxStore()) : [];
  snapshot = items.sort((a, b) => a.savedAt.localeCompare(b.savedAt));
  for (const listener of listeners) listener();
}

function changed() {
  channel?.postMessage('changed');
  loading = reload();
  return loading;
}
channel?.addEventListener('message', () => void reload());

function subscribe(listener: () => void) {
  listeners.add(listener);
  if (snapshot === null && !loading) loading = reload();
  return () => listeners.delete(listener);
}

// ---- reads and writes ----

/** Every item, oldest first. */
export async function listOutbox(): Promise<OutboxRepair[]> {
  if (!hasIndexedDb) return [];
  const items = await values<OutboxRepair>(outboxStore());
  return items.sort((a, b) => a.savedAt.localeCompare(b.savedAt));
}

export async function getOutboxItem(key: string): Promise<OutboxRepair | undefined> {
  return hasIndexedDb ? get<OutboxRepair>(key, outboxStore()) : undefined;
}

/** Keeps a repair on the phone; resolves once it is written to disk. */
export async function addToOutbox(item: OutboxRepair): Promise<void> {
  await set(item.key, item, outboxStore());
  await changed();
}

/** Changes an item (if it is still there) and returns it as stored. */
export async function updateOutboxItem(key: string, change: (item: OutboxRepair) => OutboxRepair): Promise<OutboxRepair | undefined> {
  const item = await getOutboxItem(key);
  if (!item) return undefined;
  const next = change(item);
  await set(key, next, outboxStore());
  await changed();
  return next;
}

export async function removeFromOutbox(key: string): Promise<void> {
  await del(key, outboxStore());
  await changed();
}

/** A sent or discarded item is gone; a waiting one is tried again; a refused one waits for the technician. */
export const isWaiting = (item: OutboxRepair) => item.state === 'waiting';

// ---- hooks for screens ----

const emptyList: OutboxRepair[] = [];

/** The outbox's items (oldest first); `null` while they are read from the phone. */
export function useOutbox(): OutboxRepair[] | null {
  return useSyncExternalStore(
    subscribe,
    () => snapshot,
    () => emptyList,
  );
}

export interface OutboxCounts {
  waiting: number;
  needsAttention: number;
  total: number;
}

/** How many repairs wait on this phone, and how many need the technician's attention. */
export function useOutboxCounts(): OutboxCounts {
  const items = useOutbox() ?? emptyList;
  const waiting = items.filter(isWaiting).length;
  return { waiting, needsAttention: items.length - waiting, total: items.length };
}

/** A random UUID (v4): `crypto.randomUUID` where the page is a secure context, else from random bytes. */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
