// Sign-in, reset and password hardening (issue 16, findings 4, 5 and 6). Each check names the
// OWASP ASVS 5.0 requirement it keeps.
import { and, eq, sql } from 'drizzle-orm';
import express from 'express';
import request from 'supertest';
import { once } from 'node:events';
import http, { type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { signInAttempts } from '../../server/db/schema/accounts.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import {
  admitResetRequest,
  createLinkToken,
  lockKey,
  requestPasswordReset,
  resetAccountLockKey,
  resetPolicy,
  signDeviceToken,
  signIn as signInService,
  throttlePolicy,
  workAfterAnswers,
} from '../../server/services/auth.js';
import { anonymous, createOrganisation, createUser, signIn, TEST_PASSWORD, testApp, unique } from '../factories/index.js';

const csrf = { 'X-Requested-With': 'gridkeep' };
// 203.0.113.0/24 and 198.51.100.0/24 are reserved for documentation (RFC 5737): no real caller.
const docAddress = () => `203.0.113.${Math.floor(Math.random() * 250) + 1}`;
const otherDocAddress = () => `198.51.100.${Math.floor(Math.random() * 250) + 1}`;
const status = (p: Promise<unknown>) =>
  p.then(
    () => 200,
    (e: { status?: number }) => e.status ?? 500,
  );
const tally = (xs: number[]) => xs.reduce<Record<number, number>>((t, x) => ({ ...t, [x]: (t[x] ?? 0) + 1 }), {});
const mailsTo = async (email: string) =>
  (
    await db()
      .select({ id: outboundMail.id })
      .from(outboundMail)
      .where(sql`${email} = any(${outboundMail.to})`)
  ).length;
const login = (agent: ReturnType<typeof anonymous>, email: string, password: string) =>
  agent.post('/api/auth/login').set(csrf).send({ email, password });

describe('sign-in throttling (ASVS 6.3.1; OWASP Authentication Cheat Sheet, account lockout)', () => {
  it('verifies at most the allowance when 40 wrong passwords arrive at once', async () => {
    const user = await createUser({ role: 'technician' });
    const ip = docAddress();
    const results = await Promise.all(
      Array.from({ length: 40 }, (_, i) =>
        status(signInService({ email: user.email, password: `wrong guess ${i}` }, { ip, userAgent: 't' })),
      ),
    );
    // Each admitted attempt is recorded once, before its argon2 verification.
    const recorded = await db().select().from(signInAttempts).where(eq(signInAttempts.email, user.email));
    expect(recorded).toHaveLength(throttlePolicy.accountAddress.freeFailures);
    expect(tally(results)).toEqual({
      401: throttlePolicy.accountAddress.freeFailures,
      429: 40 - throttlePolicy.accountAddress.freeFailures,
    });
  });

  it('slows one account from one address without keeping out another account from that address', async () => {
    const target = await createUser({ role: 'coordinator' });
    const neighbour = await createUser({ role: 'technician' });
    const ip = docAddress();
    for (let i = 0; i < throttlePolicy.accountAddress.freeFailures; i++) {
      expect(await status(signInService({ email: target.email, password: `guess ${i}` }, { ip, userAgent: 't' }))).toBe(401);
    }
    expect(await status(signInService({ email: target.email, password: TEST_PASSWORD }, { ip, userAgent: 't' }))).toBe(429);
    // Same office address, another person: in.
    expect(await status(signInService({ email: neighbour.email, password: TEST_PASSWORD }, { ip, userAgent: 't' }))).toBe(200);
    // The same person from another address: under the account's own allowance, in.
    expect(await status(signInService({ email: target.email, password: TEST_PASSWORD }, { ip: otherDocAddress(), userAgent: 't' }))).toBe(
      200,
    );
  });

  it('does not lock out a shared address after many failures on other accounts', async () => {
    const ip = docAddress();
    await db()
      .insert(signInAttempts)
      .values(Array.from({ length: 60 }, (_, i) => ({ email: `${unique(`spray${i}`)}@example.test`, ip, succeeded: false })));
    const colleague = await createUser({ role: 'technician' });
    expect(await status(signInService({ email: colleague.email, password: TEST_PASSWORD }, { ip, userAgent: 't' }))).toBe(200);
  });

  it('lets a known device in while others are throttled on its account, and throttles its own failures', async () => {
    const user = await createUser({ role: 'technician' });
    const known = request.agent(testApp());
    expect((await login(known, user.email, TEST_PASSWORD)).status).toBe(200);
    // Others fail on this account from this address and from many others.
    for (let i = 0; i < throttlePolicy.accountAddress.freeFailures; i++) {
      expect((await login(anonymous(), user.email, `guess ${i}`)).status).toBe(401);
    }
    await db()
      .insert(signInAttempts)
      .values(
        Array.from({ length: throttlePolicy.account.freeFailures }, () => ({ email: user.email, ip: otherDocAddress(), succeeded: false })),
      );
    expect((await login(anonymous(), user.email, TEST_PASSWORD)).status).toBe(429);
    expect(
      (await signInService({ email: user.email, password: TEST_PASSWORD }, { ip: docAddress(), userAgent: 't' }).catch((e) => e)).status,
    ).toBe(429);
    // A device cookie made for someone else counts for nothing here.
    const someoneElse = signDeviceToken('another-device', (await createUser({ role: 'technician' })).id);
    expect((await login(anonymous(), user.email, TEST_PASSWORD).set('Cookie', `gridkeep_device=${someoneElse}`)).status).toBe(429);
    // The browser this person signed in from before: in.
    expect((await login(known, user.email, TEST_PASSWORD)).status).toBe(200);
    // Its own failures are counted on their own.
    for (let i = 0; i < throttlePolicy.device.freeFailures; i++) {
      expect((await login(known, user.email, `typo ${i}`)).status).toBe(401);
    }
    expect((await login(known, user.email, TEST_PASSWORD)).status).toBe(429);
  });

  it('sets the known-device cookie HttpOnly and SameSite=Strict after a successful sign-in only', async () => {
    const user = await createUser({ role: 'coordinator' });
    const failed = await login(anonymous(), user.email, 'not the password');
    expect(String(failed.headers['set-cookie'] ?? '')).not.toMatch(/gridkeep_device=/);
    const res = await login(anonymous(), user.email, TEST_PASSWORD);
    const cookie = [res.headers['set-cookie']].flat().find((c) => String(c).startsWith('gridkeep_device='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Max-Age=7776000/); // 90 days
  });

  it('throttles the current-password check of a password change', async () => {
    const user = await createUser({ role: 'coordinator' });
    const session = await signIn(user);
    for (let i = 0; i < throttlePolicy.device.freeFailures; i++) {
      const res = await session.post('/api/auth/password', { currentPassword: `not it ${i}`, newPassword: 'lantern orchard copper 7' });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toHaveProperty('currentPassword');
    }
    const res = await session.post('/api/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'lantern orchard copper 7' });
    expect(res.status).toBe(429);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    const checks = await db()
      .select()
      .from(signInAttempts)
      .where(and(eq(signInAttempts.email, user.email), eq(signInAttempts.purpose, 'password_check')));
    expect(checks).toHaveLength(throttlePolicy.device.freeFailures);
  });
});

describe('password reset (ASVS 6.3.1, 6.4; OWASP Forgot Password Cheat Sheet)', () => {
  // Each test asks from an address of its own in 127.0.0.0/8 (all loopback on Linux), so no
  // other test's requests count against it.
  let server: Server;
  let port: number;
  // How long the server took to answer, from the request's arrival to `res.end` (the client
  // runs in this process too, so its own clock would also count the work done after answering).
  const answeredIn = new Map<string, number>();
  beforeAll(async () => {
    const timed = express();
    timed.use((req, res, next) => {
      const start = performance.now();
      const end = res.end as (...args: unknown[]) => typeof res;
      res.end = function (this: typeof res, ...args: unknown[]) {
        answeredIn.set(req.ip ?? '', performance.now() - start);
        return end.apply(this, args);
      } as typeof res.end;
      next();
    });
    timed.use(testApp());
    server = timed.listen(0, '127.0.0.1');
    await once(server, 'listening');
    port = (server.address() as AddressInfo).port;
  });
  afterAll(() => new Promise<void>((r) => server.close(() => r())));

  const ownAddress = () =>
    `127.${Math.floor(Math.random() * 250) + 1}.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250) + 1}`;
  /** POST /api/auth/forgot from `from`: the answer's status once it has arrived. */
  const forgot = (email: string, from: string) =>
    new Promise<number>((resolve, reject) => {
      const body = JSON.stringify({ email });
      const req = http.request(
        {
          host: '127.0.0.1',
          port,
          localAddress: from,
          method: 'POST',
          path: '/api/auth/forgot',
          headers: { ...csrf, 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(body) },
        },
        (res) => {
          res.resume();
          res.on('end', () => resolve(res.statusCode ?? 0));
        },
      );
      req.on('error', reject);
      req.end(body);
    });

  it('queues at most a few mails when 40 requests for one address arrive at once', async () => {
    const user = await createUser({ role: 'technician' });
    const from = ownAddress();
    const answers = await Promise.all(Array.from({ length: 40 }, () => forgot(user.email, from)));
    await workAfterAnswers();
    expect(tally(answers)).toEqual({ 202: resetPolicy.perAddressPerHour, 429: 40 - resetPolicy.perAddressPerHour });
    expect(await mailsTo(user.email)).toBe(resetPolicy.perAccountPerHour);
  });

  it('limits reset mails per account even when the requests come from many addresses', async () => {
    const user = await createUser({ role: 'technician' });
    await Promise.all(
      Array.from({ length: 10 }, async () => {
        await admitResetRequest(user.email, docAddress());
        await requestPasswordReset(user.email);
      }),
    );
    expect(await mailsTo(user.email)).toBe(resetPolicy.perAccountPerHour);
  });

  it('answers before the work for the address is done', async () => {
    const user = await createUser({ role: 'technician' });
    // Hold the account's reset lock: the work cannot finish until it is released.
    let release!: () => void;
    let held!: () => void;
    const isHeld = new Promise<void>((r) => (held = r));
    const holder = db().transaction(async (tx) => {
      await lockKey(tx, resetAccountLockKey(user.id));
      held();
      await new Promise<void>((r) => (release = r));
    });
    await isHeld;
    try {
      const answer = await Promise.race([
        forgot(user.email, ownAddress()),
        new Promise<'waited for the work'>((r) => setTimeout(() => r('waited for the work'), 3000)),
      ]);
      expect(answer).toBe(202);
      expect(await mailsTo(user.email)).toBe(0);
    } finally {
      release();
      await holder;
    }
    await workAfterAnswers();
    expect(await mailsTo(user.email)).toBe(1);
  });

  it('takes no less time to answer for an unknown address than for a known one', async () => {
    const timed = async (email: string) => {
      const from = ownAddress();
      expect(await forgot(email, from)).toBe(202);
      await workAfterAnswers();
      return answeredIn.get(from) ?? answeredIn.get(`::ffff:${from}`) ?? Number.NaN;
    };
    const users = await Promise.all(Array.from({ length: 25 }, () => createUser({ role: 'technician' })));
    await timed(`${unique('warm')}@example.test`);
    // Pairs asked back to back, so a machine busy with other work slows both of a pair alike.
    const pairs: { known: number; unknown: number }[] = [];
    for (const user of users) {
      pairs.push({ known: await timed(user.email), unknown: await timed(`${unique('ghost')}@example.test`) });
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    expect(pairs.every((p) => Number.isFinite(p.known) && Number.isFinite(p.unknown))).toBe(true);
    const knownMedian = median(pairs.map((p) => p.known));
    const shorterBy = median(pairs.map((p) => p.known - p.unknown));
    // Issue 16 measured 14.7 ms for a known address and 6.4 ms for an unknown one: more than half
    // the known time. Allowed here: noise of a quarter of it (at least 3 ms).
    expect(shorterBy).toBeLessThan(Math.max(3, knownMedian / 4));
  });
});

describe('password strength (ASVS 6.2.4 common passwords, 6.2.11 context words)', () => {
  async function setPassword(password: string, who: { role: 'client' | 'technician'; name?: string } = { role: 'technician' }) {
    const clientId = who.role === 'client' ? (await createOrganisation()).client.id : undefined;
    const user = await createUser({ ...who, clientId });
    const token = await createLinkToken(db(), user.id, 'reset');
    return { user, res: await anonymous().post('/api/auth/redeem').set(csrf).send({ token, password }) };
  }

  it.each(['Password1!', 'Summer2024', 'gridkeep', 'gridkeep-demo', 'Gridkeep2025!'])(
    'refuses %s when setting a password',
    async (password) => {
      const { res } = await setPassword(password);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('weak_password');
      expect(res.body.error.fields.password).toMatch(/Too easy to guess/);
    },
  );

  it('refuses the e-mail address, its local part, and the name', async () => {
    for (const pick of [
      (u: { email: string }) => u.email,
      (u: { email: string }) => `${u.email.split('@')[0]}!`,
      () => 'Marisol Quenby 1',
    ]) {
      const user = await createUser({ role: 'technician', name: 'Marisol Quenby' });
      const token = await createLinkToken(db(), user.id, 'reset');
      const res = await anonymous()
        .post('/api/auth/redeem')
        .set(csrf)
        .send({ token, password: pick(user) });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.password).toMatch(/your name, e-mail address, organisation/);
    }
  });

  it("refuses the client organisation's name", async () => {
    const { client } = await createOrganisation();
    const user = await createUser({ role: 'client', clientId: client.id });
    const token = await createLinkToken(db(), user.id, 'reset');
    const res = await anonymous()
      .post('/api/auth/redeem')
      .set(csrf)
      .send({ token, password: `${client.name}!` });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/organisation/);
  });

  it('names newPassword when a password change picks a weak one, and accepts a strong one', async () => {
    const session = await signIn(await createUser({ role: 'coordinator' }));
    const weak = await session.post('/api/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'Summer2024' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.code).toBe('weak_password');
    expect(Object.keys(weak.body.error.fields)).toEqual(['newPassword']);
    const strong = await session.post('/api/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'lantern orchard copper 7' });
    expect(strong.status).toBe(204);
  });

  it('accepts a passphrase of unrelated words', async () => {
    const { res } = await setPassword('tugboat velvet cinder');
    expect(res.status).toBe(200);
  });
});
