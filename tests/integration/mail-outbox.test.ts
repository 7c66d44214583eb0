// The outbound mail queue (server/integrations/mail.ts) against the local SMTP fake, on a
// database of its own so no other test's queued mail is sent from here.
import { randomUUID } from 'node:crypto';
import { eq, inArray, sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.js';
import { closeDb, db } from '../../server/db/client.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { closeMail, processMailOnce, queueMail, retryDelayMs, startMailWorker } from '../../server/integrations/mail.js';
import { closeStorage, ensureBucket, newStorageKey, putObject } from '../../server/integrations/s3.js';
import { signedIn } from '../factories/index.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { setEnv, startTestS3, startTestSmtp, type TestS3, type TestSmtp } from '../setup/fakes.js';

let smtp: TestSmtp;
let s3: TestS3;
let restoreEnv: () => void;
let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;

/** Quick retries so an outage test takes seconds, not the production minutes. */
const fast = { backoffBaseMs: 20, backoffMaxMs: 80 };

beforeAll(async () => {
  [smtp, s3, database] = await Promise.all([
    startTestSmtp(),
    startTestS3(`gridkeep-mail-${Date.now()}`),
    createIsolatedDatabase('gridkeep_mail'),
  ]);
  // The server reads its settings once, on first use: everything points at the fakes before that.
  restoreEnv = setEnv({ DATABASE_URL: database.url, ...smtp.env, ...s3.env, MAIL_FROM: 'Gridkeep <service@gridkeep.test>' });
  await ensureBucket();
});

afterAll(async () => {
  closeMail();
  closeStorage();
  await closeDb();
  await Promise.all([smtp?.dispose(), s3?.dispose()]);
  restoreEnv?.();
  await database?.drop();
});

async function queue(input: Parameters<typeof queueMail>[1]) {
  return db().transaction((tx) => queueMail(tx, input));
}

async function rows(ids: number[]) {
  return db().select().from(outboundMail).where(inArray(outboundMail.id, ids)).orderBy(outboundMail.id);
}

/** Received messages carrying a Message-ID, by that id. */
async function receivedByMessageId() {
  const out = new Map<string, Awaited<ReturnType<TestSmtp['parsed']>>>();
  for (const m of await smtp.parsed()) {
    const id = m.mail.messageId ?? '';
    out.set(id, [...(out.get(id) ?? []), m]);
  }
  return out;
}

async function until(check: () => Promise<boolean>, timeoutMs = 10_000) {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('timed out');
}

describe('queueing and sending', () => {
  it('delivers a queued message to every recipient with its fixed Message-ID and attachments', async () => {
    const pdf = Buffer.from('%PDF-1.4\n% visit report\n');
    const key = newStorageKey('visits/reports');
    await putObject(key, pdf, 'application/pdf');
    const calendar = 'BEGIN:VCALENDAR\r\nVERSION:2.0\r\nEND:VCALENDAR\r\n';
    const id = await queue({
      to: ['ops@client-one.example.test', 'facilities@client-one.example.test'],
      subject: 'Visit report: Main hall centre wall',
      text: 'The visit report is attached.',
      html: '<p>The visit report is attached.</p>',
      attachments: [
        { fileName: 'visit-report.pdf', contentType: 'application/pdf', storageKey: key },
        { fileName: 'visit.ics', contentType: 'text/calendar', content: calendar },
      ],
    });
    expect(id).toEqual(expect.any(Number));

    const round = await processMailOnce(fast);
    expect(round.sent).toBeGreaterThanOrEqual(1);
    const [row] = await rows([id!]);
    expect(row.status).toBe('sent');
    expect(row.sentAt).toBeInstanceOf(Date);
    expect(row.attempts).toBe(1);

    const received = (await receivedByMessageId()).get(row.messageId) ?? [];
    expect(received).toHaveLength(1);
    const [{ mail, received: raw }] = received;
    expect(raw.envelope.to.sort()).toEqual(['facilities@client-one.example.test', 'ops@client-one.example.test']);
    const toHeader = Array.isArray(mail.to) ? mail.to.flatMap((a) => a.value) : (mail.to?.value ?? []);
    expect(toHeader.map((a) => a.address).sort()).toEqual(raw.envelope.to.sort());
    expect(mail.from?.value[0].address).toBe('service@gridkeep.test');
    expect(mail.subject).toBe('Visit report: Main hall centre wall');
    expect(mail.text?.trim()).toBe('The visit report is attached.');
    expect(mail.html).toContain('<p>The visit report is attached.</p>');
    const byName = Object.fromEntries(mail.attachments.map((a) => [a.filename, a]));
    expect(byName['visit-report.pdf'].contentType).toBe('application/pdf');
    expect(byName['visit-report.pdf'].content.equals(pdf)).toBe(true);
    expect(byName['visit.ics'].contentType).toBe('text/calendar');
    expect(byName['visit.ics'].content.toString()).toBe(calendar);
  });

  it("queues nothing when the caller's transaction rolls back", async () => {
    const subject = `Rolled back ${randomUUID()}`;
    await expect(
      db().transaction(async (tx) => {
        await queueMail(tx, { to: ['someone@example.test'], subject, text: 'x' });
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await db().select().from(outboundMail).where(eq(outboundMail.subject, subject))).toHaveLength(0);
  });

  it('queues a message once per dedupe key', async () => {
    const dedupeKey = `ticket-created:${randomUUID()}`;
    const first = await queue({ to: ['office@example.test'], subject: 'New ticket', text: 'a', dedupeKey });
    const second = await queue({ to: ['office@example.test'], subject: 'New ticket', text: 'b', dedupeKey });
    expect(first).toEqual(expect.any(Number));
    expect(second).toBeNull();
    const found = await db().select().from(outboundMail).where(eq(outboundMail.dedupeKey, dedupeKey));
    expect(found).toHaveLength(1);
    expect(found[0].text).toBe('a');
    await processMailOnce(fast);
    expect((await receivedByMessageId()).get(found[0].messageId)).toHaveLength(1);
  });
});

describe('header injection (OWASP ASVS 5.0 1.3.11; RFC 5322 2.2: a header field ends at CRLF)', () => {
  it('keeps a line break in the subject from adding a header or a recipient', async () => {
    const id = await queue({
      to: ['client@example.test'],
      subject: 'Ticket update\r\nBcc: intruder@example.test\r\nX-Injected: yes',
      text: 'Body',
      attachments: [{ fileName: 'notes.txt\r\nX-Part-Injected: yes', contentType: 'text/plain\r\nX-Type: 1', content: 'n' }],
    });
    const [row] = await rows([id!]);
    expect(row.subject).toBe('Ticket update Bcc: intruder@example.test X-Injected: yes');
    await processMailOnce(fast);
    const [{ mail, received }] = (await receivedByMessageId()).get(row.messageId)!;
    expect(received.envelope.to).toEqual(['client@example.test']);
    expect(mail.bcc).toBeUndefined();
    expect(mail.headers.has('x-injected')).toBe(false);
    expect(mail.subject).toBe('Ticket update Bcc: intruder@example.test X-Injected: yes');
    expect(received.raw.toString()).not.toMatch(/^X-(Part-)?Injected:/im);
    expect(mail.attachments[0].filename).toBe('notes.txt X-Part-Injected: yes');
    expect(mail.attachments[0].headers.has('x-part-injected')).toBe(false);
  });

  it('refuses a recipient that is not one plain address, queueing nothing', async () => {
    const subject = `Refused ${randomUUID()}`;
    for (const to of ['client@example.test\r\nBcc: intruder@example.test', 'a@example.test, b@example.test', 'Name <a@example.test>']) {
      await expect(queue({ to: [to], subject, text: 'x' })).rejects.toThrow(/not a single e-mail address/);
    }
    expect(await db().select().from(outboundMail).where(eq(outboundMail.subject, subject))).toHaveLength(0);
  });
});

describe('retries', () => {
  it('backs off exponentially with jitter, capped (equal-jitter back-off)', () => {
    // Attempt n waits between half and all of min(cap, base · 2^(n-1)).
    expect(retryDelayMs(1, 1000, 60_000, () => 0)).toBe(500);
    expect(retryDelayMs(1, 1000, 60_000, () => 1)).toBe(1000);
    expect(retryDelayMs(4, 1000, 60_000, () => 1)).toBe(8000);
    expect(retryDelayMs(20, 1000, 60_000, () => 1)).toBe(60_000);
    expect(retryDelayMs(20, 1000, 60_000, () => 0)).toBe(30_000);
  });

  it('delivers every message exactly once after the mail server was down for a while', async () => {
    await smtp.stop();
    const ids: number[] = [];
    for (let i = 0; i < 6; i++) {
      ids.push((await queue({ to: [`tech${i}@example.test`], subject: `Outage message ${i}`, text: `n${i}` }))!);
    }
    // Several rounds while the server is down: every send fails and is put back with a delay.
    for (let i = 0; i < 3; i++) {
      await processMailOnce(fast);
      await new Promise((r) => setTimeout(r, 100));
    }
    const during = await rows(ids);
    for (const row of during) {
      expect(row.status).toBe('queued');
      expect(row.attempts).toBeGreaterThanOrEqual(2);
      expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
      expect(row.lockedUntil).toBeNull();
    }

    await smtp.start();
    // Two workers at once: SKIP LOCKED must hand each message to one of them only.
    await until(async () => {
      await Promise.all([processMailOnce(fast), processMailOnce(fast)]);
      return (await rows(ids)).every((r) => r.status === 'sent');
    });
    const received = await receivedByMessageId();
    for (const row of await rows(ids)) {
      expect(received.get(row.messageId), row.subject).toHaveLength(1);
      expect(row.lastError).toBeNull();
    }
  });

  it('marks a message failed after the last attempt, and keeps the error', async () => {
    await smtp.stop();
    try {
      const id = (await queue({ to: ['nobody@example.test'], subject: 'Will fail', text: 'x' }))!;
      await until(async () => {
        await processMailOnce({ ...fast, maxAttempts: 3 });
        return (await rows([id]))[0].status === 'failed';
      });
      const [row] = await rows([id]);
      expect(row.attempts).toBe(3);
      expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
      // A failed message is not claimed again.
      await new Promise((r) => setTimeout(r, 200));
      expect((await processMailOnce({ ...fast, maxAttempts: 3 })).claimed).toBe(0);
    } finally {
      await smtp.start();
    }
  });

  it('takes over a message whose worker died mid-send once the lease has run out, not before', async () => {
    const expired = (await queue({ to: ['a@example.test'], subject: 'Lease ran out', text: 'x' }))!;
    const held = (await queue({ to: ['b@example.test'], subject: 'Lease still held', text: 'x' }))!;
    // What a crashed worker leaves behind: claimed, attempt counted, lease set.
    await db().execute(sql`update outbound_mail set status = 'sending', attempts = 1,
      locked_until = now() - interval '1 second' where id = ${expired}`);
    await db().execute(sql`update outbound_mail set status = 'sending', attempts = 1,
      locked_until = now() + interval '1 hour' where id = ${held}`);
    await processMailOnce(fast);
    const [a, b] = await rows([expired, held]);
    expect(a.status).toBe('sent');
    expect(a.attempts).toBe(2);
    expect(b.status).toBe('sending');
    expect((await receivedByMessageId()).get(b.messageId)).toBeUndefined();
    await db().update(outboundMail).set({ status: 'sent' }).where(eq(outboundMail.id, held));
  });
});

describe('the worker', () => {
  it('is woken by NOTIFY when a message is queued, long before its next poll', async () => {
    const worker = startMailWorker({ ...fast, pollMs: 60_000 });
    try {
      await new Promise((r) => setTimeout(r, 300)); // its LISTEN connection is up
      const id = (await queue({ to: ['office@example.test'], subject: 'Woken by notify', text: 'x' }))!;
      const started = Date.now();
      await until(async () => (await rows([id]))[0].status === 'sent', 5000);
      expect(Date.now() - started).toBeLessThan(5000);
    } finally {
      await worker.stop();
    }
  });
});

describe('GET /api/dev/mailbox', () => {
  it('lists what the SMTP fake received, newest first, for admins only', async () => {
    const subject = `Mailbox check ${randomUUID()}`;
    const id = (await queue({
      to: ['viewer@example.test'],
      subject,
      text: 'Shown in the development mailbox',
      attachments: [{ fileName: 'invite.ics', contentType: 'text/calendar', content: 'BEGIN:VCALENDAR\r\nEND:VCALENDAR\r\n' }],
    }))!;
    await processMailOnce(fast);
    expect((await rows([id]))[0].status).toBe('sent');

    const admin = await signedIn('admin');
    const res = await admin.get('/api/dev/mailbox');
    expect(res.status).toBe(200);
    const items = res.body.items as { id: string; to: string; subject: string; text: string; date: string; attachments: unknown[] }[];
    expect(items.length).toBe(smtp.received().length);
    expect(items[0]).toMatchObject({
      to: 'viewer@example.test',
      subject,
      text: expect.stringContaining('Shown in the development mailbox'),
      attachments: [{ filename: 'invite.ics', contentType: 'text/calendar' }],
    });
    const dates = items.map((i) => Date.parse(i.date));
    expect(dates).toEqual([...dates].sort((x, y) => y - x));

    const file = await admin.get(`/api/dev/mailbox/${items[0].id}/attachments/0`);
    expect(file.status).toBe(200);
    // RFC 6266 4.1: the file name as a token or a quoted string; "attachment" means download.
    expect(file.headers['content-disposition']).toMatch(/^attachment; filename="?invite\.ics"?$/);
    expect(file.headers['content-type']).toMatch(/^text\/calendar/);
    expect(String(file.text ?? file.body)).toContain('BEGIN:VCALENDAR');
    expect((await admin.get(`/api/dev/mailbox/${items[0].id}/attachments/5`)).status).toBe(404);
    expect((await admin.get('/api/dev/mailbox/..%2F..%2Fetc%2Fpasswd/attachments/0')).status).toBe(404);

    const coordinator = await signedIn('coordinator');
    expect((await coordinator.get('/api/dev/mailbox')).status).toBe(403);
    expect((await request(createApp()).get('/api/dev/mailbox')).status).toBe(401);
  });
});

describe('across the whole file', () => {
  it('lost none and sent none twice: every sent row was received exactly once', async () => {
    const sent = await db().select().from(outboundMail).where(eq(outboundMail.status, 'sent'));
    const received = await receivedByMessageId();
    const held = sent.filter((r) => r.subject === 'Lease still held'); // marked by hand, never sent
    for (const row of sent) {
      if (held.includes(row)) continue;
      expect(received.get(row.messageId), row.subject).toHaveLength(1);
    }
    expect([...received.values()].every((list) => list.length === 1)).toBe(true);
  });
});
