// A short-lived, bounded in-process memory of live sessions, so that the session check
// (server/middleware/auth.ts) does not ask PostgreSQL, nor verify the same token again, on every
// request. It is keyed by the whole session token: only the very token that was verified (its
// signature, algorithm, issuer, audience and expiry) and found live is answered from memory.
//
// What it promises:
//  - In this process, a revocation is honoured at once: signing out, `revokeSessions` (password
//    change or reset, a user disabled or moved to another role or organisation) call `forget…`
//    before they write, and a forgotten session or user is neither read from nor written to the
//    memory for FENCE_MS afterwards (long enough for the revoking transaction to commit), so a
//    request racing the revocation cannot put the old row back.
//  - In any other process on the same database, a revocation is honoured within TTL_MS of its
//    commit: an entry is kept at most TTL_MS from the moment its query was sent.
//  - At most MAX_ENTRIES sessions are held; the least recently used one is dropped first.
//  - A session or token past its expiry is never answered from memory.
import { LRUCache } from 'lru-cache';
import type { Role } from '../../shared/schemas/enums.js';

/** How long a remembered session may be used: the bound on staleness across processes. */
export const SESSION_CACHE_TTL_MS = 5_000;
/** How many sessions one process remembers (about 1 KB each with its token). */
export const SESSION_CACHE_MAX_ENTRIES = 10_000;
/** How long after a revocation its session or user bypasses the memory. */
const FENCE_MS = SESSION_CACHE_TTL_MS;
/** Past this many revocations within FENCE_MS, the memory is bypassed altogether for FENCE_MS. */
const MAX_FENCES = 10_000;

export interface LiveSession {
  sessionId: string;
  userId: string;
  role: Role;
  clientId: string | null;
  email: string;
  name: string;
  /** When the session or its token ends by itself, whichever is first (ms since the epoch). */
  expiresAt: number;
}

export class SessionCache {
  readonly ttlMs: number;
  readonly max: number;
  private readonly entries: LRUCache<string, LiveSession>;
  /** `s:<session id>` or `u:<user id>` → until when (ms) it bypasses the memory. */
  private readonly fences = new Map<string, number>();
  private bypassUntil = 0;

  constructor(options: { ttlMs?: number; max?: number } = {}) {
    this.ttlMs = options.ttlMs ?? SESSION_CACHE_TTL_MS;
    this.max = options.max ?? SESSION_CACHE_MAX_ENTRIES;
    this.entries = new LRUCache<string, LiveSession>({ max: this.max, ttl: this.ttlMs, ttlResolution: 0 });
  }

  get size() {
    return this.entries.size;
  }

  private fenced(sessionId: string, userId: string, now: number) {
    if (now < this.bypassUntil) return true;
    const s = this.fences.get(`s:${sessionId}`);
    const u = this.fences.get(`u:${userId}`);
    return (s !== undefined && now < s) || (u !== undefined && now < u);
  }

  /** The live session of this exact token, or undefined: verify it and ask the database then. */
  get(token: string, now = Date.now()): LiveSession | undefined {
    const hit = this.entries.get(token);
    if (!hit) return undefined;
    if (hit.expiresAt <= now || this.fenced(hit.sessionId, hit.userId, now)) {
      this.entries.delete(token);
      return undefined;
    }
    return hit;
  }

  /**
   * Remembers the live session of a verified token, read by a query sent at `queriedAt`, until
   * `queriedAt + ttlMs` at the latest.
   */
  remember(token: string, session: LiveSession, queriedAt: number, now = Date.now()) {
    if (this.fenced(session.sessionId, session.userId, now)) return;
    const ttl = Math.min(queriedAt + this.ttlMs, session.expiresAt) - now;
    if (ttl <= 0) return;
    this.entries.set(token, session, { ttl });
  }

  private drop(matches: (entry: LiveSession) => boolean) {
    for (const [token, entry] of this.entries.entries()) if (matches(entry)) this.entries.delete(token);
  }

  private fence(key: string, now: number) {
    if (this.fences.size >= MAX_FENCES) {
      for (const [k, until] of this.fences) if (until <= now) this.fences.delete(k);
      if (this.fences.size >= MAX_FENCES) {
        // Too many revocations at once to track one by one: stop remembering for a while.
        this.bypassUntil = now + FENCE_MS;
        this.entries.clear();
        this.fences.clear();
        return;
      }
    }
    this.fences.set(key, now + FENCE_MS);
  }

  /** One session signed out. */
  forgetSession(sessionId: string, now = Date.now()) {
    this.fence(`s:${sessionId}`, now);
    this.drop((entry) => entry.sessionId === sessionId);
  }

  /** Every session of a user (revoked, disabled, role or organisation changed). */
  forgetUser(userId: string, now = Date.now()) {
    this.fence(`u:${userId}`, now);
    this.drop((entry) => entry.userId === userId);
  }

  clear() {
    this.entries.clear();
    this.fences.clear();
    this.bypassUntil = 0;
  }
}

/** This process's memory of sessions. */
export const sessionCache = new SessionCache();
