// Drill: the mail server is down while tickets change. Every change still queues its e-mails in
// the same transaction as the change; the worker's attempts fail and are retried; when the mail
// server is back, every queued message is delivered exactly once (no loss, no duplicate) — the
// transactional outbox pattern (from memory: C. Richardson, "Microservices Patterns", ch. 3).
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../server/db/client.js';
import { closeMail, processMailOnce } from '../../server/integrations/mail.js';
import { createOrganisation, signedIn, type Session } from '../factories/index.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { setEnv, startTestSmtp, type TestSmtp } from '../setup/fakes.js';

let smtp: TestSmtp;
let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let restoreEnv: () => void;
let office: Session;
let client: Session;
let org: Awaited<ReturnType<typeof createOrganisation>>;

beforeAll(async () => {
  [smtp, database] = await Promise.all([startTestSmtp(), createIsolatedDatabase('gridkeep_mail_drill')]);
  restoreEnv = setEnv({ DATABASE_URL: database.url, ...smtp.env, OFFICE_EMAIL: 'desk@integrator.test' });
  org = await createOrganisation({ withWall: true });
  office = await signedIn('coordinator');
  client = await signedIn('client', org.client.id);
});

afterAll(async () => {
  closeMail();
  await closeDb();
  await smtp.dispose();
  restoreEnv();
  await database.drop();
});

const queueState = () =>
  db().execute<{ status: string; n: number }>(
    sql`select status::text as status, count(*)::int as n from outbound_mail group by 1 order by 1`,
  );

describe('the mail server down while tickets change', () => {
  it('delivers every queued message exactly once when it is back, and none while it is down', async () => {
    await smtp.stop();
    for (let i = 1; i <= 6; i++) {
      const opened = await client.post('/api/tickets', {
        siteId: org.site.id,
        wallId: org.wall!.id,
        cells: [{ column: 1, row: 1 }],
        title: `Drill fault ${i}`,
        priority: 'normal',
      });
      expect(opened.status, JSON.stringify(opened.body)).toBe(201);
      const id = (opened.body as { id: string }).id;
      const reply = await office.post(`/api/tickets/${id}/comments`, { body: `On our way (${i})`, visibility: 'public' });
      expect(reply.status, JSON.stringify(reply.body)).toBe(201);
    }
    // The worker tries while the server is down: every attempt fails, nothing is lost.
    for (let round = 0; round < 3; round++) {
      await processMailOnce({ backoffBaseMs: 1, backoffMaxMs: 2 });
      await new Promise((r) => setTimeout(r, 5));
    }
    const down = await queueState();
    expect(down.rows.find((r) => r.status === 'sent')).toBeUndefined();
    expect(down.rows.find((r) => r.status === 'failed')).toBeUndefined();
    const queued = down.rows.reduce((a, r) => a + r.n, 0);
    expect(queued).toBeGreaterThanOrEqual(12); // a new-ticket notice and a reply per ticket at least
    const attempts = await db().execute<{ min: number }>(sql`select min(attempts)::int as min from outbound_mail`);
    expect(attempts.rows[0].min).toBeGreaterThanOrEqual(1);

    await smtp.start();
    for (let round = 0; round < 10; round++) {
      const r = await processMailOnce({ backoffBaseMs: 1, backoffMaxMs: 2 });
      if (r.claimed === 0) {
        const left = await db().execute<{ n: number }>(sql`select count(*)::int as n from outbound_mail where status <> 'sent'`);
        if (left.rows[0].n === 0) break;
        await new Promise((res) => setTimeout(res, 10));
      }
    }
    const after = await queueState();
    expect(after.rows).toEqual([{ status: 'sent', n: queued }]);
    // Each message reached the server exactly once, by its fixed Message-ID.
    const ids = (await db().execute<{ message_id: string }>(sql`select message_id from outbound_mail`)).rows.map((r) => r.message_id);
    const seen = smtp.received().map((m) => /^Message-ID:\s*(<[^>]+>)/im.exec(m.raw.toString())?.[1]);
    for (const id of ids)
      expect(
        seen.filter((s) => s === id),
        id,
      ).toHaveLength(1);
    expect(seen).toHaveLength(ids.length);
  });
});
