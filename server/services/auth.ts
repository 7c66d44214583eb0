import { createHash, randomBytes } from 'node:crypto';
import { and, count, desc, eq, gt, isNull, max, ne } from 'drizzle-orm';
import type { LinkToken, SessionUser } from '../../shared/schemas/auth.js';
import { config } from '../config.js';
import { db, type DbOrTx } from '../db/client.js';
import { authTokens, sessions, signInAttempts, users } from '../db/schema/accounts.js';
import { clients } from '../db/schema/clients.js';
import { AppError, badRequest, notFound, tooManyRequests } from '../errors.js';
import { queueMail } from '../integrations/mail.js';
import { renderMail } from './mail-layout.js';
import { logger } from '../logger.js';
import type { Actor } from '../middleware/auth.js';
import { signSessionToken } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { passwordWeakness } from './common-passwords.js';
import { decoyHash, hashPassword, verifyPassword } from './passwords.js';

const invalidCredentials = () => new AppError(401, 'invalid_credentials', 'The e-mail address or password is not right.');

// ---------------------------------------------------------------------------------------------
// Throttling: growing delays after repeated failures, per account and per address. Never a
// permanent lock: the longest wait is MAX_DELAY_S, and a throttled attempt is not counted as a
// failure, so nobody can lock another person out for longer than that.
// ---------------------------------------------------------------------------------------------
const WINDOW_MS = 60 * 60 * 1000;
const MAX_DELAY_S = 15 * 60;
export const throttlePolicy = {
  account: { freeFailures: 5, firstDelayS: 30 },
  address: { freeFailures: 50, firstDelayS: 30 },
};

/** Seconds to wait after `failures` consecutive failures (0 while under the free allowance). */
export function throttleDelaySeconds(failures: number, policy: { freeFailures: number; firstDelayS: number }) {
  if (failures < policy.freeFailures) return 0;
  return Math.min(MAX_DELAY_S, policy.firstDelayS * 2 ** (failures - policy.freeFailures));
}

async function failuresSince(where: ReturnType<typeof eq>) {
  const since = new Date(Date.now() - WINDOW_MS);
  const [lastSuccess] = await db()
    .select({ at: max(signInAttempts.createdAt) })
    .from(signInAttempts)
    .where(and(where, eq(signInAttempts.succeeded, true), gt(signInAttempts.createdAt, since)));
  const from = lastSuccess?.at && lastSuccess.at > since ? lastSuccess.at : since;
  const [row] = await db()
    .select({ failures: count(), last: max(signInAttempts.createdAt) })
    .from(signInAttempts)
    .where(and(where, eq(signInAttempts.succeeded, false), gt(signInAttempts.createdAt, from)));
  return { failures: Number(row?.failures ?? 0), last: row?.last ?? null };
}

/** Seconds until this e-mail / address may try again; 0 when it may try now. */
export async function retryAfterSeconds(email: string, ip: string): Promise<number> {
  const waits = await Promise.all(
    (
      [
        [eq(signInAttempts.email, email), throttlePolicy.account],
        [eq(signInAttempts.ip, ip), throttlePolicy.address],
      ] as const
    ).map(async ([where, policy]) => {
      const { failures, last } = await failuresSince(where);
      const delay = throttleDelaySeconds(failures, policy);
      if (!delay || !last) return 0;
      return Math.max(0, Math.ceil((last.getTime() + delay * 1000 - Date.now()) / 1000));
    }),
  );
  return Math.max(...waits);
}

// ---------------------------------------------------------------------------------------------
// Sessions
// ---------------------------------------------------------------------------------------------
export interface IssuedSession {
  user: SessionUser;
  token: string;
  maxAgeMs: number;
}

/** The signed-in person as the client holds them: who, their role and organisation. */
function presentSessionUser(
  u: Pick<typeof users.$inferSelect, 'id' | 'email' | 'name' | 'role' | 'clientId'>,
  clientName: string | null,
): SessionUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, clientId: u.clientId, clientName };
}

async function sessionUser(tx: DbOrTx, userId: string): Promise<SessionUser> {
  const [row] = await tx
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      clientId: users.clientId,
      clientName: clients.name,
    })
    .from(users)
    .leftJoin(clients, eq(clients.id, users.clientId))
    .where(eq(users.id, userId));
  if (!row) throw notFound('User');
  return presentSessionUser(row, row.clientName);
}

async function issueSession(tx: DbOrTx, userId: string, meta: { ip: string; userAgent: string }): Promise<IssuedSession> {
  const maxAgeMs = config().SESSION_HOURS * 3600 * 1000;
  const expiresAt = new Date(Date.now() + maxAgeMs);
  const [session] = await tx
    .insert(sessions)
    .values({ userId, expiresAt, ip: meta.ip, userAgent: meta.userAgent.slice(0, 300) })
    .returning({ id: sessions.id });
  return { user: await sessionUser(tx, userId), token: signSessionToken(userId, session.id, expiresAt), maxAgeMs };
}

/** Ends every live session of a user (password change, reset, disabling), except `keep`. */
export async function revokeSessions(tx: DbOrTx, userId: string, keep?: string) {
  await tx
    .update(sessions)
    .set({ revokedAt: new Date() })
    .where(and(eq(sessions.userId, userId), isNull(sessions.revokedAt), keep ? ne(sessions.id, keep) : undefined));
}

export async function signIn(input: { email: string; password: string }, meta: { ip: string; userAgent: string }): Promise<IssuedSession> {
  const wait = await retryAfterSeconds(input.email, meta.ip);
  if (wait > 0) {
    logger.warn('sign-in throttled', { email: input.email, ip: meta.ip, retryAfter: wait });
    throw tooManyRequests(`Too many failed attempts. Try again in ${Math.ceil(wait / 60)} minute(s).`, wait);
  }
  const [user] = await db()
    .select({ id: users.id, passwordHash: users.passwordHash, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.email, input.email));
  // Verify against a decoy when the address is unknown, so both cases take the same time.
  const ok = await verifyPassword(user?.passwordHash ?? (await decoyHash()), input.password);
  const succeeded = Boolean(user && user.passwordHash && ok && !user.disabledAt);
  await db()
    .insert(signInAttempts)
    .values({ email: input.email, ip: meta.ip, succeeded, userId: user?.id ?? null });
  logger.info('sign-in attempt', { email: input.email, ip: meta.ip, succeeded });
  if (!succeeded || !user) throw invalidCredentials();
  return db().transaction(async (tx) => {
    await tx.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
    return issueSession(tx, user.id, meta);
  });
}

export async function signOut(actor: Actor) {
  await db().update(sessions).set({ revokedAt: new Date() }).where(eq(sessions.id, actor.sessionId));
}

export const currentUser = (actor: Actor) => sessionUser(db(), actor.userId);

export async function changePassword(
  actor: Actor,
  input: { currentPassword: string; newPassword: string },
  meta: { ip: string; userAgent: string },
) {
  const [user] = await db().select().from(users).where(eq(users.id, actor.userId));
  if (!user || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw badRequest('wrong_password', 'Your current password is not right.', { currentPassword: 'Not right.' });
  }
  assertStrongPassword(input.newPassword, user);
  const passwordHash = await hashPassword(input.newPassword);
  return db().transaction(async (tx) => {
    await tx.update(users).set({ passwordHash, passwordChangedAt: new Date() }).where(eq(users.id, user.id));
    await revokeSessions(tx, user.id);
    await recordAudit(tx, { actor, entity: 'user', entityId: user.id, action: 'password_changed' });
    // Every other browser is signed out; this one gets a fresh session.
    return issueSession(tx, user.id, meta);
  });
}

export function assertStrongPassword(password: string, user: { email: string; name?: string }) {
  const weakness = passwordWeakness(password, user);
  if (weakness) throw badRequest('weak_password', weakness, { newPassword: weakness, password: weakness });
}

// ---------------------------------------------------------------------------------------------
// Invite and reset links: single use, expiring; only a hash of the token is stored.
// ---------------------------------------------------------------------------------------------
const TOKEN_LIFETIME_MS = { invite: 7 * 24 * 3600 * 1000, reset: 60 * 60 * 1000 };
const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export async function createLinkToken(tx: DbOrTx, userId: string, kind: 'invite' | 'reset') {
  const token = randomBytes(32).toString('base64url');
  // A new link replaces any earlier unused one of the same kind.
  await tx
    .update(authTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(authTokens.userId, userId), eq(authTokens.kind, kind), isNull(authTokens.usedAt)));
  await tx.insert(authTokens).values({
    userId,
    kind,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + TOKEN_LIFETIME_MS[kind]),
  });
  return token;
}

export function setPasswordLink(token: string) {
  return `${config().APP_URL}/set-password?token=${encodeURIComponent(token)}`;
}

export async function queueInviteMail(tx: DbOrTx, user: { id: string; email: string; name: string }, invitedBy: string) {
  const token = await createLinkToken(tx, user.id, 'invite');
  const link = setPasswordLink(token);
  await queueMail(tx, {
    to: [user.email],
    subject: 'You are invited to Gridkeep',
    ...renderMail({
      preview: `${invitedBy} has invited you to Gridkeep.`,
      heading: 'You are invited to Gridkeep',
      paragraphs: [
        `Hello ${user.name},`,
        `${invitedBy} has invited you to Gridkeep.`,
        'Choose your password: the link works once and expires in 7 days.',
      ],
      action: { label: 'Choose your password', url: link },
      footnote: 'If you did not expect this, you can ignore this message.',
    }),
  });
}

/** Always answers the same way, whether or not the address belongs to someone. */
export async function requestPasswordReset(email: string) {
  const [user] = await db()
    .select({ id: users.id, email: users.email, name: users.name, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.email, email));
  if (!user || user.disabledAt) {
    logger.info('password reset asked for an unknown or disabled address', { email });
    return;
  }
  await db().transaction(async (tx) => {
    const token = await createLinkToken(tx, user.id, 'reset');
    await queueMail(tx, {
      to: [user.email],
      subject: 'Reset your Gridkeep password',
      ...renderMail({
        preview: 'Choose a new password for Gridkeep.',
        heading: 'Reset your Gridkeep password',
        paragraphs: [
          `Hello ${user.name},`,
          'Someone (we hope you) asked to reset your Gridkeep password.',
          'Choose a new password: the link works once and expires in 1 hour.',
        ],
        action: { label: 'Choose a new password', url: setPasswordLink(token) },
        footnote: 'If you did not ask for this, ignore this message: your password stays as it is.',
      }),
    });
  });
}

async function liveToken(tx: DbOrTx, token: string, lock: boolean) {
  const query = tx
    .select({ id: authTokens.id, kind: authTokens.kind, userId: authTokens.userId, email: users.email, name: users.name })
    .from(authTokens)
    .innerJoin(users, eq(users.id, authTokens.userId))
    .where(
      and(
        eq(authTokens.tokenHash, hashToken(token)),
        isNull(authTokens.usedAt),
        gt(authTokens.expiresAt, new Date()),
        isNull(users.disabledAt),
      ),
    );
  const [row] = lock ? await query.for('update', { of: authTokens }) : await query;
  if (!row) throw new AppError(404, 'link_invalid', 'This link is not valid any more: it was used or has expired.');
  return row;
}

/** What a link is for, and for whom: never its user id or expiry. */
function presentLinkToken(t: { kind: LinkToken['kind']; email: string; name: string }): LinkToken {
  return { kind: t.kind, email: t.email, name: t.name };
}

export async function describeLinkToken(token: string): Promise<LinkToken> {
  return presentLinkToken(await liveToken(db(), token, false));
}

export async function redeemLinkToken(input: { token: string; password: string }, meta: { ip: string; userAgent: string }) {
  const preview = await liveToken(db(), input.token, false);
  assertStrongPassword(input.password, preview);
  const passwordHash = await hashPassword(input.password);
  return db().transaction(async (tx) => {
    // Locked and re-checked inside the transaction: two clicks on one link set one password.
    const row = await liveToken(tx, input.token, true);
    await tx.update(authTokens).set({ usedAt: new Date() }).where(eq(authTokens.id, row.id));
    await tx.update(users).set({ passwordHash, passwordChangedAt: new Date() }).where(eq(users.id, row.userId));
    await revokeSessions(tx, row.userId);
    await recordAudit(tx, {
      actor: null,
      entity: 'user',
      entityId: row.userId,
      action: row.kind === 'invite' ? 'invite_accepted' : 'password_reset',
    });
    return issueSession(tx, row.userId, meta);
  });
}

/** Sign-in attempts for the security log (admin). */
export async function recentSignInAttempts(limit = 100) {
  return db()
    .select({
      id: signInAttempts.id,
      email: signInAttempts.email,
      ip: signInAttempts.ip,
      succeeded: signInAttempts.succeeded,
      createdAt: signInAttempts.createdAt,
    })
    .from(signInAttempts)
    .orderBy(desc(signInAttempts.createdAt))
    .limit(limit);
}
