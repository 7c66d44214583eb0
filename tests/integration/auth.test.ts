import { desc, eq, sql } from 'drizzle-orm';
import jwt from 'jsonwebtoken';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { authTokens, auditEvents, sessions, signInAttempts, users } from '../../server/db/schema/accounts.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { throttleDelaySeconds, throttlePolicy, workAfterAnswers } from '../../server/services/auth.js';
import { hashOptions } from '../../server/services/passwords.js';
import { anonymous, createOrganisation, createUser, signIn, signedIn, TEST_PASSWORD, unique } from '../factories/index.js';

const csrf = { 'X-Requested-With': 'gridkeep' };

async function linkFromLatestMail(to: string) {
  const [mail] = await db()
    .select()
    .from(outboundMail)
    .where(sql`${to} = any(${outboundMail.to})`)
    .orderBy(desc(outboundMail.id))
    .limit(1);
  const match = mail?.text.match(/set-password\?token=([\w%-]+)/);
  if (!match) throw new Error(`no link in mail to ${to}`);
  return decodeURIComponent(match[1]);
}

describe('sign-in', () => {
  let clientId: string;
  beforeAll(async () => {
    clientId = (await createOrganisation()).client.id;
  });

  it.each(['admin', 'coordinator', 'technician', 'client'] as const)('signs in a %s and answers /me', async (role) => {
    const user = await createUser({ role, clientId });
    const session = await signIn(user);
    const me = await session.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ id: user.id, email: user.email, role, clientId: role === 'client' ? clientId : null });
    expect(me.body.user.passwordHash).toBeUndefined();
  });

  it('sets an HttpOnly, SameSite=Strict session cookie for the whole app', async () => {
    const user = await createUser({ role: 'coordinator' });
    const res = await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/^gridkeep_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\//);
    expect(cookie).toMatch(/Max-Age=\d+/);
  });

  it('normalises the e-mail address (case and spaces)', async () => {
    const user = await createUser({ role: 'coordinator' });
    const res = await anonymous()
      .post('/api/auth/login')
      .set(csrf)
      .send({ email: `  ${user.email.toUpperCase()} `, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
  });

  it('says the same thing for a wrong password and an unknown address', async () => {
    const user = await createUser({ role: 'technician' });
    const wrong = await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: 'not the password' });
    const unknown = await anonymous()
      .post('/api/auth/login')
      .set(csrf)
      .send({ email: `${unique('nobody')}@example.test`, password: 'whatever1' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('logs every attempt', async () => {
    const user = await createUser({ role: 'technician' });
    await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: 'nope-nope' });
    await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: TEST_PASSWORD });
    const attempts = await db().select().from(signInAttempts).where(eq(signInAttempts.email, user.email));
    expect(attempts.map((a) => a.succeeded).sort()).toEqual([false, true]);
  });

  it('names the field when the body is not valid', async () => {
    const res = await anonymous().post('/api/auth/login').set(csrf).send({ email: 'not-an-address', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('refuses a state-changing request without the CSRF header', async () => {
    const user = await createUser({ role: 'coordinator' });
    const res = await anonymous().post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_header_missing');
    const session = await signIn(user);
    const logout = await session.agent.post('/api/auth/logout');
    expect(logout.status).toBe(403);
    expect((await session.get('/api/auth/me')).status).toBe(200);
  });

  it('answers 401 to /me when signed out', async () => {
    const res = await anonymous().get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('answers /session with the user, or 200 with no user when signed out (the app asks it on every first load)', async () => {
    const signedOut = await anonymous().get('/api/auth/session');
    expect(signedOut.status).toBe(200);
    expect(signedOut.body).toEqual({ user: null });
    const user = await createUser({ role: 'client', clientId });
    const session = await signIn(user);
    const me = await session.get('/api/auth/session');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ id: user.id, email: user.email, role: 'client', clientId });
    expect(me.body.user.passwordHash).toBeUndefined();
    expect((await session.post('/api/auth/logout')).status).toBe(204);
    expect((await session.get('/api/auth/session')).body).toEqual({ user: null });
  });

  it('hashes with argon2id at or above the OWASP minimum (m=19 MiB, t=2, p=1)', async () => {
    const user = await createUser({ role: 'coordinator', password: 'a fresh password 9' });
    // PHC string: $argon2id$v=19$m=<KiB>,t=<iterations>,p=<lanes>$…
    const match = user.passwordHash!.match(/^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$/);
    expect(match).not.toBeNull();
    expect(Number(match![1])).toBeGreaterThanOrEqual(19 * 1024);
    expect(Number(match![2])).toBeGreaterThanOrEqual(2);
    expect(Number(match![3])).toBe(1);
    expect(hashOptions.memoryCost).toBe(19456);
  });
});

describe('session tokens (RFC 8725)', () => {
  it('stops working after sign-out', async () => {
    const session = await signedIn('coordinator');
    expect((await session.get('/api/auth/me')).status).toBe(200);
    const stolen = (await session.agent.jar.getCookie('gridkeep_session', { path: '/', domain: '127.0.0.1', secure: false, script: false }))
      ?.value;
    expect((await session.post('/api/auth/logout')).status).toBe(204);
    expect((await session.get('/api/auth/me')).status).toBe(401);
    // The cookie a thief copied before sign-out (a JWT: header.payload.signature), replayed.
    expect(stolen).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    const replay = await anonymous().get('/api/auth/me').set('Cookie', `gridkeep_session=${stolen}`);
    expect(replay.status).toBe(401);
  });

  it('stops working when the user is disabled', async () => {
    const session = await signedIn('technician');
    const admin = await signedIn('admin');
    const res = await admin.patch(`/api/users/${session.user.id}`, { disabled: true });
    expect(res.status).toBe(200);
    expect(res.body.disabled).toBe(true);
    expect((await session.get('/api/auth/me')).status).toBe(401);
    const again = await anonymous().post('/api/auth/login').set(csrf).send({ email: session.user.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
  });

  it('ends other sessions when the password changes, and keeps this browser signed in', async () => {
    const user = await createUser({ role: 'coordinator' });
    const here = await signIn(user);
    const elsewhere = await signIn(user);
    const res = await here.post('/api/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'a new and long passphrase' });
    expect(res.status).toBe(204);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect((await here.get('/api/auth/me')).status).toBe(200);
    const old = await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: TEST_PASSWORD });
    expect(old.status).toBe(401);
  });

  it('refuses a wrong current password and a common new one, naming the field', async () => {
    const session = await signedIn('coordinator');
    const wrong = await session.post('/api/auth/password', { currentPassword: 'not it at all', newPassword: 'another long passphrase' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toHaveProperty('currentPassword');
    // "password1" is in the common-password list (OWASP ASVS 5.0 6.2.4).
    const common = await session.post('/api/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'password1' });
    expect(common.status).toBe(400);
    expect(common.body.error.code).toBe('weak_password');
    expect(common.body.error.fields).toHaveProperty('newPassword');
    const short = await session.post('/api/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'short7' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty('newPassword');
  });

  it('refuses tokens signed with another algorithm, another key, or expired', async () => {
    const session = await signedIn('coordinator');
    const [live] = await db().select().from(sessions).where(eq(sessions.userId, session.user.id));
    const secret = process.env.JWT_SECRET!;
    const claims = { sid: live.id };
    const base = { subject: session.user.id, issuer: 'gridkeep', audience: 'gridkeep-app' };
    const forged = [
      jwt.sign(claims, '', { ...base, algorithm: 'none' }),
      jwt.sign(claims, secret, { ...base, algorithm: 'HS512' }),
      jwt.sign(claims, 'another-secret-that-is-long-enough-000000', { ...base, algorithm: 'HS256' }),
      jwt.sign(claims, secret, { ...base, algorithm: 'HS256', expiresIn: -10 }),
      jwt.sign(claims, secret, { ...base, audience: 'someone-else', algorithm: 'HS256' }),
      jwt.sign(claims, secret, { ...base, issuer: 'someone-else', algorithm: 'HS256' }),
    ];
    for (const token of forged) {
      const res = await anonymous().get('/api/auth/me').set('Cookie', `gridkeep_session=${token}`);
      expect(res.status).toBe(401);
    }
    const good = jwt.sign(claims, secret, { ...base, algorithm: 'HS256', expiresIn: 60 });
    expect((await anonymous().get('/api/auth/me').set('Cookie', `gridkeep_session=${good}`)).status).toBe(200);
  });
});

describe('throttling', () => {
  it('slows an account down after repeated failures, with a Retry-After', async () => {
    const user = await createUser({ role: 'technician' });
    for (let i = 0; i < throttlePolicy.accountAddress.freeFailures; i++) {
      const res = await anonymous()
        .post('/api/auth/login')
        .set(csrf)
        .send({ email: user.email, password: `wrong-${i}-guess` });
      expect(res.status).toBe(401);
    }
    // Even the right password waits now: the delay, not the password, answers.
    const res = await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('too_many_requests');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(throttlePolicy.accountAddress.firstDelayS);
  });

  it('lets the account in again once the delay has passed', async () => {
    const user = await createUser({ role: 'technician' });
    for (let i = 0; i < throttlePolicy.accountAddress.freeFailures; i++) {
      await anonymous()
        .post('/api/auth/login')
        .set(csrf)
        .send({ email: user.email, password: `wrong-${i}-guess` });
    }
    // Move the failures back in time past the delay rather than waiting for it.
    await db()
      .update(signInAttempts)
      .set({ createdAt: sql`${signInAttempts.createdAt} - interval '31 seconds'` })
      .where(eq(signInAttempts.email, user.email));
    const res = await anonymous().post('/api/auth/login').set(csrf).send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
  });

  it('grows the delay and caps it: never a permanent lock', () => {
    const p = throttlePolicy.account;
    expect(throttleDelaySeconds(p.freeFailures - 1, p)).toBe(0);
    expect(throttleDelaySeconds(p.freeFailures, p)).toBe(p.firstDelayS);
    expect(throttleDelaySeconds(p.freeFailures + 1, p)).toBe(p.firstDelayS * 2);
    expect(throttleDelaySeconds(p.freeFailures + 100, p)).toBe(15 * 60);
  });
});

describe('invite and reset links', () => {
  it('invites a user by e-mail; the link works once and signs them in', async () => {
    const admin = await signedIn('admin');
    const email = `${unique('new')}@example.test`;
    const res = await admin.post('/api/users', { email, name: 'New Coordinator', role: 'coordinator' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, role: 'coordinator', invitePending: true, disabled: false });
    const token = await linkFromLatestMail(email);
    const preview = await anonymous().get(`/api/auth/tokens/${token}`);
    expect(preview.body).toEqual({ kind: 'invite', email, name: 'New Coordinator' });
    const redeem = await anonymous().post('/api/auth/redeem').set(csrf).send({ token, password: 'my own long passphrase' });
    expect(redeem.status).toBe(200);
    expect(redeem.body.user.email).toBe(email);
    expect(String(redeem.headers['set-cookie'])).toMatch(/gridkeep_session=/);
    const again = await anonymous().post('/api/auth/redeem').set(csrf).send({ token, password: 'another long passphrase' });
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe('link_invalid');
    const login = await anonymous().post('/api/auth/login').set(csrf).send({ email, password: 'my own long passphrase' });
    expect(login.status).toBe(200);
  });

  it('refuses an expired link', async () => {
    const admin = await signedIn('admin');
    const email = `${unique('late')}@example.test`;
    const created = await admin.post('/api/users', { email, name: 'Late Tech', role: 'technician' });
    const token = await linkFromLatestMail(email);
    await db()
      .update(authTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(authTokens.userId, created.body.id));
    expect((await anonymous().get(`/api/auth/tokens/${token}`)).status).toBe(404);
    const res = await anonymous().post('/api/auth/redeem').set(csrf).send({ token, password: 'my own long passphrase' });
    expect(res.status).toBe(404);
  });

  it('resets a forgotten password; answers the same for unknown addresses; old sessions end', async () => {
    const user = await createUser({ role: 'technician' });
    const session = await signIn(user);
    const known = await anonymous().post('/api/auth/forgot').set(csrf).send({ email: user.email });
    const unknown = await anonymous()
      .post('/api/auth/forgot')
      .set(csrf)
      .send({ email: `${unique('ghost')}@example.test` });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    await workAfterAnswers();
    const token = await linkFromLatestMail(user.email);
    const first = await anonymous().post('/api/auth/redeem').set(csrf).send({ token, password: 'brand new passphrase' });
    expect(first.status).toBe(200);
    expect((await session.get('/api/auth/me')).status).toBe(401);
    const second = await anonymous().post('/api/auth/redeem').set(csrf).send({ token, password: 'yet another passphrase' });
    expect(second.status).toBe(404);
  });

  it('a second reset link replaces the first', async () => {
    const user = await createUser({ role: 'technician' });
    await anonymous().post('/api/auth/forgot').set(csrf).send({ email: user.email });
    await workAfterAnswers();
    const first = await linkFromLatestMail(user.email);
    await anonymous().post('/api/auth/forgot').set(csrf).send({ email: user.email });
    await workAfterAnswers();
    const second = await linkFromLatestMail(user.email);
    expect(second).not.toBe(first);
    expect((await anonymous().get(`/api/auth/tokens/${first}`)).status).toBe(404);
    expect((await anonymous().get(`/api/auth/tokens/${second}`)).status).toBe(200);
  });
});

describe('accounts and roles', () => {
  it('only admins manage users: coordinators get 403, client users 404', async () => {
    const { client } = await createOrganisation();
    const coordinator = await signedIn('coordinator');
    const clientUser = await signedIn('client', client.id);
    expect((await coordinator.get('/api/users')).status).toBe(403);
    expect((await clientUser.get('/api/users')).status).toBe(404);
    expect((await clientUser.get('/api/audit')).status).toBe(404);
    expect((await anonymous().get('/api/users')).status).toBe(401);
  });

  it('needs an organisation for a client user, and none for staff', async () => {
    const admin = await signedIn('admin');
    const res = await admin.post('/api/users', { email: `${unique('c')}@example.test`, name: 'C', role: 'client' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('clientId');
  });

  it('refuses a second account with the same e-mail', async () => {
    const admin = await signedIn('admin');
    const user = await createUser({ role: 'technician' });
    const res = await admin.post('/api/users', { email: user.email.toUpperCase(), name: 'Dup', role: 'technician' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields).toHaveProperty('email');
  });

  it('changes a role; the change applies at once and is audited with before and after', async () => {
    const admin = await signedIn('admin');
    const user = await createUser({ role: 'technician' });
    const res = await admin.patch(`/api/users/${user.id}`, { role: 'coordinator' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('coordinator');
    const history = await admin.get(`/api/audit?entity=user&entityId=${user.id}`);
    expect(history.status).toBe(200);
    const change = history.body.items.find((e: { action: string }) => e.action === 'updated');
    expect(change.before).toEqual({ role: 'technician' });
    expect(change.after).toEqual({ role: 'coordinator' });
    expect(change.actor).toEqual({ id: admin.user.id, name: admin.user.name });
    const [row] = await db().select().from(auditEvents).where(eq(auditEvents.entityId, user.id)).limit(1);
    expect(JSON.stringify(row)).not.toMatch(/argon2/);
  });

  it('will not let an admin disable themselves', async () => {
    const admin = await signedIn('admin');
    const res = await admin.patch(`/api/users/${admin.user.id}`, { disabled: true });
    expect(res.status).toBe(409);
    const [me] = await db().select().from(users).where(eq(users.id, admin.user.id));
    expect(me.disabledAt).toBeNull();
  });

  it('lists users with keyset pagination', async () => {
    const admin = await signedIn('admin');
    const { client } = await createOrganisation();
    for (let i = 0; i < 3; i++) await createUser({ role: 'client', clientId: client.id });
    const first = await admin.get(`/api/users?clientId=${client.id}&limit=2`);
    expect(first.body.items).toHaveLength(2);
    expect(first.body.nextCursor).toBeTruthy();
    const second = await admin.get(`/api/users?clientId=${client.id}&limit=2&cursor=${first.body.nextCursor}`);
    expect(second.body.items).toHaveLength(1);
    expect(second.body.nextCursor).toBeNull();
    const emails = [...first.body.items, ...second.body.items].map((u: { email: string }) => u.email);
    expect(new Set(emails).size).toBe(3);
    expect(emails).toEqual([...emails].sort());
  });
});
