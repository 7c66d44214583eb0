import { createHash, createHmac, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import { and, count, desc, eq, gt, inArray, isNull, max, min, ne, sql, type SQL } from 'drizzle-orm';
import type { LinkToken, SessionUser } from '../../shared/schemas/auth.js';
import { config } from '../config.js';
import { db, type DbOrTx } from '../db/client.js';
import { authTokens, companySettings, sessions, signInAttempts, users } from '../db/schema/accounts.js';
import { clients } from '../db/schema/clients.js';
import { AppError, badRequest, notFound, tooManyRequests } from '../errors.js';
import { queueMail } from '../integrations/mail.js';
import { renderMail } from './mail-layout.js';
import { logger } from '../logger.js';
import type { Actor } from '../middleware/auth.js';
import { signSessionToken } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { sessionCache } from './session-cache.js';
import { passwordWeakness, type PasswordContext } from './common-passwords.js';
import { decoyHash, hashPassword, verifyPassword } from './passwords.js';

const invalidCredentials = () => new AppError(401, 'invalid_credentials', 'The e-mail address or password is not right.');

/** Where an attempt comes from: the caller's address, browser, and known-device cookie if any. */
export interface AttemptMeta {
  ip: string;
  userAgent: string;
  /** The known-device cookie as the browser sent it (checked here). */
  deviceToken?: string | undefined;
}

// ---------------------------------------------------------------------------------------------
// Throttling password checks (OWASP ASVS 5.0 6.3.1; OWASP Authentication Cheat Sheet, "Account
// lockout" and "device cookies"). Growing delays after repeated failures, never a permanent lock:
// the longest wait is MAX_DELAY_S, and a throttled attempt is not counted as a failure.
//
// Failures are counted per account and per account + address, for browsers the account has not
// signed in from before. A browser that has (it holds a signed device cookie for the account) is
// counted on its own, so failures by others (a shared office address, an attack from many
// addresses) never keep the account's own people out. There is no count per address alone: one
// address is often a whole office or a mobile network.
//
// Each check is recorded before the password is verified, in a transaction holding an advisory
// lock on the account, so parallel attempts queue and see each other: no more than the allowance
// is ever verified.
// ---------------------------------------------------------------------------------------------
const WINDOW_MS = 60 * 60 * 1000;
const MAX_DELAY_S = 15 * 60;
export interface ThrottleRule {
  freeFailures: number;
  firstDelayS: number;
}
export const throttlePolicy = {
  /** One account from one address (browsers not known to the account). */
  accountAddress: { freeFailures: 5, firstDelayS: 30 },
  /** One account from every address together (browsers not known to the account). */
  account: { freeFailures: 20, firstDelayS: 30 },
  /** One known browser on its account. */
  device: { freeFailures: 5, firstDelayS: 30 },
} satisfies Record<string, ThrottleRule>;

/** Seconds to wait after `failures` consecutive failures (0 while under the free allowance). */
export function throttleDelaySeconds(failures: number, policy: ThrottleRule) {
  if (failures < policy.freeFailures) return 0;
  return Math.min(MAX_DELAY_S, policy.firstDelayS * 2 ** (failures - policy.freeFailures));
}

/** Blocks other transactions taking the same key until this one ends (PostgreSQL advisory lock). */
export async function lockKey(tx: DbOrTx, key: string) {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${key}, 0))`);
}
export const passwordCheckLockKey = (email: string) => `password-check:${email}`;

const passwordChecks = inArray(signInAttempts.purpose, ['sign_in', 'password_check']);

/** Failures in the window since the last success, both within `scope`. */
async function failuresSince(tx: DbOrTx, scope: SQL | undefined) {
  const since = new Date(Date.now() - WINDOW_MS);
  const [lastSuccess] = await tx
    .select({ at: max(signInAttempts.createdAt) })
    .from(signInAttempts)
    .where(and(scope, passwordChecks, eq(signInAttempts.succeeded, true), gt(signInAttempts.createdAt, since)));
  const from = lastSuccess?.at && lastSuccess.at > since ? lastSuccess.at : since;
  const [row] = await tx
    .select({ failures: count(), last: max(signInAttempts.createdAt) })
    .from(signInAttempts)
    .where(and(scope, passwordChecks, eq(signInAttempts.succeeded, false), gt(signInAttempts.createdAt, from)));
  return { failures: Number(row?.failures ?? 0), last: row?.last ?? null };
}

/** Seconds until this account may be tried again from here; 0 when it may be tried now. */
export async function retryAfterSeconds(tx: DbOrTx, who: { email: string; ip: string; deviceId: string | null }): Promise<number> {
  const email = eq(signInAttempts.email, who.email);
  const scopes: [SQL | undefined, ThrottleRule][] = who.deviceId
    ? [[and(email, eq(signInAttempts.deviceId, who.deviceId)), throttlePolicy.device]]
    : [
        [and(email, eq(signInAttempts.ip, who.ip), isNull(signInAttempts.deviceId)), throttlePolicy.accountAddress],
        [and(email, isNull(signInAttempts.deviceId)), throttlePolicy.account],
      ];
  let wait = 0;
  for (const [scope, rule] of scopes) {
    const { failures, last } = await failuresSince(tx, scope);
    const delay = throttleDelaySeconds(failures, rule);
    if (delay && last) wait = Math.max(wait, Math.ceil((last.getTime() + delay * 1000 - Date.now()) / 1000));
  }
  return wait;
}

/** "1 minute", "15 minutes": a wait in seconds, rounded up, as a person reads it. */
const inMinutes = (seconds: number) => {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  return `${minutes} minute${minutes === 1 ? '' : 's'}`;
};
const throttled = (wait: number) => tooManyRequests(`Too many failed attempts. Try again in ${inMinutes(wait)}.`, wait);

/**
 * Admits one password check on the account of `email` (sign-in, or the current password on a
 * change) or refuses it with 429; an admitted check is recorded as failed until `passed`.
 */
async function admitPasswordCheck(email: string, meta: AttemptMeta, purpose: 'sign_in' | 'password_check') {
  return db().transaction(async (tx) => {
    await lockKey(tx, passwordCheckLockKey(email));
    const [user] = await tx
      .select({ id: users.id, passwordHash: users.passwordHash, disabledAt: users.disabledAt })
      .from(users)
      .where(eq(users.email, email));
    const deviceId = user ? knownDevice(meta.deviceToken, user.id) : null;
    const wait = await retryAfterSeconds(tx, { email, ip: meta.ip, deviceId });
    if (wait > 0) {
      logger.warn('password check throttled', { email, ip: meta.ip, retryAfter: wait, knownDevice: Boolean(deviceId) });
      throw throttled(wait);
    }
    const [attempt] = await tx
      .insert(signInAttempts)
      .values({ email, ip: meta.ip, succeeded: false, userId: user?.id ?? null, purpose, deviceId })
      .returning({ id: signInAttempts.id });
    return { user, attemptId: attempt.id, deviceId };
  });
}

const passed = (tx: DbOrTx, attemptId: number) =>
  tx.update(signInAttempts).set({ succeeded: true }).where(eq(signInAttempts.id, attemptId));

// ---------------------------------------------------------------------------------------------
// Known-device cookies (OWASP Authentication Cheat Sheet, "device cookies"): set after a
// successful sign-in, signed with a key derived from JWT_SECRET, naming the device and the account.
// ---------------------------------------------------------------------------------------------
export const DEVICE_COOKIE_MAX_AGE_MS = 90 * 24 * 3600 * 1000;
const deviceKey = () => createHmac('sha256', config().JWT_SECRET).update('gridkeep known-device cookie').digest();
const deviceSignature = (payload: string) => createHmac('sha256', deviceKey()).update(payload).digest('base64url');

export function signDeviceToken(deviceId: string, userId: string, issuedAt = Date.now()) {
  const payload = `${deviceId}.${userId}.${issuedAt}`;
  return `${payload}.${deviceSignature(payload)}`;
}

/** The device id when `token` is a valid, unexpired device cookie of this user; otherwise null. */
export function knownDevice(token: string | undefined, userId: string): string | null {
  if (!token || token.length > 300) return null;
  const parts = token.split('.');
  if (parts.length !== 4) return null;
  const [deviceId, tokenUser, issuedAt, signature] = parts;
  const expected = Buffer.from(deviceSignature(`${deviceId}.${tokenUser}.${issuedAt}`));
  const given = Buffer.from(signature);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null;
  const age = Date.now() - Number(issuedAt);
  if (tokenUser !== userId || !(age >= 0 && age < DEVICE_COOKIE_MAX_AGE_MS)) return null;
  return deviceId;
}

// ---------------------------------------------------------------------------------------------
// Sessions
// ---------------------------------------------------------------------------------------------
export interface IssuedSession {
  user: SessionUser;
  token: string;
  maxAgeMs: number;
  /** A fresh known-device cookie for this browser, after a successful sign-in. */
  deviceToken?: string;
}

/** The signed-in person as the client holds them: who, their role and organisation. */
function presentSessionUser(
  u: Pick<typeof users.$inferSelect, 'id' | 'email' | 'name' | 'role' | 'clientId'>,
  clientName: string | null,
): SessionUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, clientId: u.clientId, clientName };
}

const sessionUserFields = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  clientId: users.clientId,
  clientName: clients.name,
};

async function sessionUser(tx: DbOrTx, userId: string): Promise<SessionUser> {
  const [row] = await tx
    .select(sessionUserFields)
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
  // Before the write: this process stops answering from its memory of these sessions at once.
  sessionCache.forgetUser(userId);
  await tx
    .update(sessions)
    .set({ revokedAt: new Date() })
    .where(and(eq(sessions.userId, userId), isNull(sessions.revokedAt), keep ? ne(sessions.id, keep) : undefined));
}

export async function signIn(input: { email: string; password: string }, meta: AttemptMeta): Promise<IssuedSession> {
  const { user, attemptId, deviceId } = await admitPasswordCheck(input.email, meta, 'sign_in');
  // Verify against a decoy when the address is unknown, so both cases take the same time.
  const ok = await verifyPassword(user?.passwordHash ?? (await decoyHash()), input.password);
  const succeeded = Boolean(user && user.passwordHash && ok && !user.disabledAt);
  logger.info('sign-in attempt', { email: input.email, ip: meta.ip, succeeded, knownDevice: Boolean(deviceId) });
  if (!succeeded || !user) throw invalidCredentials();
  return db().transaction(async (tx) => {
    await passed(tx, attemptId);
    await tx.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
    const session = await issueSession(tx, user.id, meta);
    return { ...session, deviceToken: signDeviceToken(deviceId ?? randomUUID(), user.id) };
  });
}

export async function signOut(actor: Actor) {
  sessionCache.forgetSession(actor.sessionId);
  await db().update(sessions).set({ revokedAt: new Date() }).where(eq(sessions.id, actor.sessionId));
}

// What the app asks on every first load (/me, /session): prepared once per database handle.
const prepareCurrentUser = (database: ReturnType<typeof db>) =>
  database
    .select(sessionUserFields)
    .from(users)
    .leftJoin(clients, eq(clients.id, users.clientId))
    .where(eq(users.id, sql.placeholder('userId')))
    .prepare('gridkeep_current_user');
let currentUserQuery: { for: ReturnType<typeof db>; query: ReturnType<typeof prepareCurrentUser> } | undefined;

export async function currentUser(actor: Actor): Promise<SessionUser> {
  const database = db();
  if (currentUserQuery?.for !== database) currentUserQuery = { for: database, query: prepareCurrentUser(database) };
  const [row] = await currentUserQuery.query.execute({ userId: actor.userId });
  if (!row) throw notFound('User');
  return presentSessionUser(row, row.clientName);
}

export async function changePassword(actor: Actor, input: { currentPassword: string; newPassword: string }, meta: AttemptMeta) {
  // The current password is a password like any other: its checks are throttled with sign-in's.
  const { user, attemptId } = await admitPasswordCheck(actor.email, meta, 'password_check');
  if (!user || user.id !== actor.userId || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw badRequest('wrong_password', 'Your current password is not right.', { currentPassword: 'Not right.' });
  }
  await passed(db(), attemptId);
  assertStrongPassword(input.newPassword, await passwordContext(db(), user.id), 'newPassword');
  const passwordHash = await hashPassword(input.newPassword);
  return db().transaction(async (tx) => {
    await tx.update(users).set({ passwordHash, passwordChangedAt: new Date() }).where(eq(users.id, user.id));
    await revokeSessions(tx, user.id);
    await recordAudit(tx, { actor, entity: 'user', entityId: user.id, action: 'password_changed' });
    // Every other browser is signed out; this one gets a fresh session.
    return issueSession(tx, user.id, meta);
  });
}

/** The words of this account a password must not be built from (OWASP ASVS 5.0 6.2.11). */
export async function passwordContext(tx: DbOrTx, userId: string): Promise<PasswordContext> {
  const [row] = await tx
    .select({ email: users.email, name: users.name, organisation: clients.name })
    .from(users)
    .leftJoin(clients, eq(clients.id, users.clientId))
    .where(eq(users.id, userId));
  const [company] = await tx.select({ name: companySettings.name }).from(companySettings).limit(1);
  return { ...row, company: company?.name ?? null };
}

export function assertStrongPassword(password: string, context: PasswordContext, field: 'newPassword' | 'password') {
  const weakness = passwordWeakness(password, context);
  if (weakness) throw badRequest('weak_password', weakness, { [field]: weakness });
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

// ---------------------------------------------------------------------------------------------
// Reset requests (OWASP ASVS 5.0 6.3.1 and 6.4; OWASP Forgot Password Cheat Sheet): the answer
// goes out before any work that depends on the address, so known and unknown addresses take the
// same time; requests are limited per asking address (answered 429, whatever e-mail was given)
// and reset mails per account (silently: the answer never says whether an account exists).
// ---------------------------------------------------------------------------------------------
// Per address: enough for an office where several people forget on one morning.
export const resetPolicy = { perAddressPerHour: 20, perAccountPerHour: 3 };
export const resetAccountLockKey = (userId: string) => `password-reset:${userId}`;

/** Counts one reset request from `ip`, or refuses it with 429 when that address asked too often. */
export async function admitResetRequest(email: string, ip: string) {
  await db().transaction(async (tx) => {
    await lockKey(tx, `password-reset-address:${ip}`);
    const since = new Date(Date.now() - WINDOW_MS);
    const [row] = await tx
      .select({ requests: count(), first: min(signInAttempts.createdAt) })
      .from(signInAttempts)
      .where(and(eq(signInAttempts.ip, ip), eq(signInAttempts.purpose, 'reset'), gt(signInAttempts.createdAt, since)));
    if (Number(row?.requests ?? 0) >= resetPolicy.perAddressPerHour) {
      const wait = Math.max(1, Math.ceil(((row?.first?.getTime() ?? Date.now()) + WINDOW_MS - Date.now()) / 1000));
      logger.warn('password reset requests throttled', { ip, retryAfter: wait });
      throw tooManyRequests(`Too many reset requests. Try again in ${inMinutes(wait)}.`, wait);
    }
    await tx.insert(signInAttempts).values({ email, ip, succeeded: true, purpose: 'reset' });
  });
}

// Work done after the answer has been sent. Kept track of so tests (and a shutdown) can wait for it.
const pendingWork = new Set<Promise<void>>();

/** Runs `work` once the current answer has gone out; a failure is logged, never thrown. */
export function afterAnswer(what: string, work: () => Promise<void>) {
  const run: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
    .then(work)
    .catch((err: unknown) => logger.error(`${what} failed`, { err }))
    .finally(() => pendingWork.delete(run));
  pendingWork.add(run);
}

/** Resolves when every piece of work started by `afterAnswer` has finished. */
export async function workAfterAnswers() {
  while (pendingWork.size) await Promise.all([...pendingWork]);
}

/** Queues a reset mail when the address belongs to an active account that has not had too many. */
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
    // Parallel requests for one account queue here, so the count below is exact.
    await lockKey(tx, resetAccountLockKey(user.id));
    const [recent] = await tx
      .select({ links: count() })
      .from(authTokens)
      .where(and(eq(authTokens.userId, user.id), eq(authTokens.kind, 'reset'), gt(authTokens.createdAt, new Date(Date.now() - WINDOW_MS))));
    if (Number(recent?.links ?? 0) >= resetPolicy.perAccountPerHour) {
      logger.warn('password reset mail throttled for the account', { userId: user.id });
      return;
    }
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

export async function redeemLinkToken(input: { token: string; password: string }, meta: AttemptMeta): Promise<IssuedSession> {
  const preview = await liveToken(db(), input.token, false);
  assertStrongPassword(input.password, await passwordContext(db(), preview.userId), 'password');
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
    const session = await issueSession(tx, row.userId, meta);
    return { ...session, deviceToken: signDeviceToken(knownDevice(meta.deviceToken, row.userId) ?? randomUUID(), row.userId) };
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
      purpose: signInAttempts.purpose,
      createdAt: signInAttempts.createdAt,
    })
    .from(signInAttempts)
    .orderBy(desc(signInAttempts.createdAt))
    .limit(limit);
}
