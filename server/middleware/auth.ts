import { createSecretKey, type KeyObject } from 'node:crypto';
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Request, RequestHandler } from 'express';
import jwt from 'jsonwebtoken';
import { csrfHeader } from '../../shared/schemas/auth.js';
import type { Role } from '../../shared/schemas/enums.js';
import { config } from '../config.js';
import { db } from '../db/client.js';
import { sessions, users } from '../db/schema/accounts.js';
import { forbidden, notFound, unauthorized } from '../errors.js';
import { sessionCache, type LiveSession } from '../services/session-cache.js';

/** Who is calling: every service takes one and scopes what it reads and writes by it. */
export interface Actor {
  userId: string;
  sessionId: string;
  role: Role;
  /** Set for client users: the only organisation they may see. */
  clientId: string | null;
  email: string;
  name: string;
  /** The request this actor is acting in, for the audit log. */
  requestId?: string;
}

declare module 'express-serve-static-core' {
  interface Request {
    actor?: Actor;
  }
}

// RFC 8725: one pinned algorithm, and issuer, audience and expiry always checked.
const ALGORITHM = 'HS256' as const;
const ISSUER = 'gridkeep';
const AUDIENCE = 'gridkeep-app';

export function sessionCookieName() {
  return config().COOKIE_SECURE ? '__Host-gridkeep_session' : 'gridkeep_session';
}

export function sessionCookieOptions(maxAgeMs?: number) {
  return {
    httpOnly: true,
    sameSite: 'strict' as const,
    secure: config().COOKIE_SECURE,
    path: '/',
    ...(maxAgeMs !== undefined ? { maxAge: maxAgeMs } : {}),
  };
}

// The secret as a key object, made once: given a string, jsonwebtoken first tries (and fails) to
// read it as a PEM public key on every call, which cost more than the rest of the session check.
let signingKey: { secret: string; key: KeyObject } | undefined;
function sessionKey(): KeyObject {
  const secret = config().JWT_SECRET;
  if (signingKey?.secret !== secret) signingKey = { secret, key: createSecretKey(Buffer.from(secret)) };
  return signingKey.key;
}

export function signSessionToken(userId: string, sessionId: string, expiresAt: Date) {
  return jwt.sign({ sid: sessionId }, sessionKey(), {
    algorithm: ALGORITHM,
    issuer: ISSUER,
    audience: AUDIENCE,
    subject: userId,
    expiresIn: Math.max(1, Math.floor((expiresAt.getTime() - Date.now()) / 1000)),
  });
}

function verifySessionToken(token: string): { userId: string; sessionId: string; expiresAt: number } | null {
  try {
    const claims = jwt.verify(token, sessionKey(), {
      algorithms: [ALGORITHM],
      issuer: ISSUER,
      audience: AUDIENCE,
    });
    if (typeof claims !== 'object' || typeof claims.sub !== 'string' || typeof claims.sid !== 'string') return null;
    if (typeof claims.exp !== 'number') return null;
    return { userId: claims.sub, sessionId: claims.sid, expiresAt: claims.exp * 1000 };
  } catch {
    return null;
  }
}

/**
 * The live session and its user: one indexed query (sessions by primary key, users by primary
 * key), prepared once per database handle so that neither Drizzle nor PostgreSQL plans it again.
 */
let sessionQuery: { for: ReturnType<typeof db>; query: ReturnType<typeof prepareSessionQuery> } | undefined;
function prepareSessionQuery(database: ReturnType<typeof db>) {
  return database
    .select({
      userId: users.id,
      role: users.role,
      clientId: users.clientId,
      email: users.email,
      name: users.name,
      expiresAt: sessions.expiresAt,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(
      and(
        eq(sessions.id, sql.placeholder('sessionId')),
        eq(sessions.userId, sql.placeholder('userId')),
        isNull(sessions.revokedAt),
        gt(sessions.expiresAt, sql`now()`),
        isNull(users.disabledAt),
      ),
    )
    .limit(1)
    .prepare('gridkeep_session_check');
}

async function liveSession(token: string): Promise<LiveSession | undefined> {
  const remembered = sessionCache.get(token);
  if (remembered) return remembered;
  const claims = verifySessionToken(token);
  if (!claims) return undefined;
  const database = db();
  if (sessionQuery?.for !== database) sessionQuery = { for: database, query: prepareSessionQuery(database) };
  const queriedAt = Date.now();
  const [row] = await sessionQuery.query.execute({ sessionId: claims.sessionId, userId: claims.userId });
  if (!row) return undefined;
  const live = { ...row, sessionId: claims.sessionId, expiresAt: Math.min(row.expiresAt.getTime(), claims.expiresAt) };
  sessionCache.remember(token, live, queriedAt);
  return live;
}

/**
 * Reads the session cookie and, when its token is valid and its session row is live (not
 * signed out, not expired, user not disabled), puts the caller on `req.actor`. A token already
 * verified and found live may be answered from this process's short memory of sessions
 * (server/services/session-cache.ts): a revocation is honoured at once in the process that made
 * it and within SESSION_CACHE_TTL_MS (5 s) in others.
 */
export const authenticate: RequestHandler = async (req, _res, next) => {
  const token = req.cookies?.[sessionCookieName()];
  if (typeof token !== 'string' || !token) return next();
  const live = await liveSession(token);
  if (live) {
    const { userId, sessionId, role, clientId, email, name } = live;
    req.actor = { userId, role, clientId, email, name, sessionId, requestId: req.id };
  }
  next();
};

/** CSRF: a state-changing API request must carry `X-Requested-With: gridkeep`, or it is refused. */
export const requireSameOriginWrites: RequestHandler = (req, _res, next) => {
  if (['GET', 'HEAD', 'OPTIONS'].includes(req.method)) return next();
  if (req.get(csrfHeader.name) !== csrfHeader.value) {
    return next(forbidden('csrf_header_missing', `State-changing requests must carry the ${csrfHeader.name} header.`));
  }
  next();
};

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.actor ? undefined : unauthorized());
};

/** Allows only the given roles. Client users asking for a staff-only area get 404, never 403. */
export function requireRole(...allowed: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.actor) return next(unauthorized());
    if (allowed.includes(req.actor.role)) return next();
    if (req.actor.role === 'client') return next(notFound());
    next(forbidden());
  };
}

/** The signed-in caller; call only after requireAuth / requireRole. */
export function actorOf(req: Request): Actor {
  if (!req.actor) throw unauthorized();
  return req.actor;
}
