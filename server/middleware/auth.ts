import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Request, RequestHandler } from 'express';
import jwt from 'jsonwebtoken';
import { csrfHeader } from '../../shared/schemas/auth.js';
import type { Role } from '../../shared/schemas/enums.js';
import { config } from '../config.js';
import { db } from '../db/client.js';
import { sessions, users } from '../db/schema/accounts.js';
import { forbidden, notFound, unauthorized } from '../errors.js';

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

export function signSessionToken(userId: string, sessionId: string, expiresAt: Date) {
  return jwt.sign({ sid: sessionId }, config().JWT_SECRET, {
    algorithm: ALGORITHM,
    issuer: ISSUER,
    audience: AUDIENCE,
    subject: userId,
    expiresIn: Math.max(1, Math.floor((expiresAt.getTime() - Date.now()) / 1000)),
  });
}

function verifySessionToken(token: string): { userId: string; sessionId: string } | null {
  try {
    const claims = jwt.verify(token, config().JWT_SECRET, {
      algorithms: [ALGORITHM],
      issuer: ISSUER,
      audience: AUDIENCE,
    });
    if (typeof claims !== 'object' || typeof claims.sub !== 'string' || typeof claims.sid !== 'string') return null;
    return { userId: claims.sub, sessionId: claims.sid };
  } catch {
    return null;
  }
}

/**
 * Reads the session cookie and, when its token is valid and its session row is live (not
 * signed out, not expired, user not disabled), puts the caller on `req.actor`.
 */
export const authenticate: RequestHandler = async (req, _res, next) => {
  const token = req.cookies?.[sessionCookieName()];
  if (typeof token !== 'string' || !token) return next();
  const claims = verifySessionToken(token);
  if (!claims) return next();
  const [row] = await db()
    .select({
      userId: users.id,
      role: users.role,
      clientId: users.clientId,
      email: users.email,
      name: users.name,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(
      and(
        eq(sessions.id, claims.sessionId),
        eq(sessions.userId, claims.userId),
        isNull(sessions.revokedAt),
        gt(sessions.expiresAt, new Date()),
        isNull(users.disabledAt),
      ),
    )
    .limit(1);
  if (row) req.actor = { ...row, sessionId: claims.sessionId, requestId: req.id };
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
