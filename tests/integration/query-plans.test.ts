import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getPool, db } from '../../server/db/client.js';
import { tickets } from '../../server/db/schema/tickets.js';
import type { Actor } from '../../server/middleware/auth.js';
import { cabinetListQuery } from '../../server/services/cabinets.js';
import { serialMatchesQuery, serialTailQuery } from '../../server/services/search.js';
import { ticketListQuery } from '../../server/services/tickets.js';
import { listCabinetsQuery } from '../../shared/schemas/cabinets.js';
import { listTicketsQuery, type TicketClockState } from '../../shared/schemas/tickets.js';
import { createOrganisation, signedIn, type Session } from '../factories/index.js';

// The list and search queries at scale read an index, never the whole table. The planner's
// choice depends on the table's size, so these run the services' own SQL against copies of
// `cabinets` and `tickets` (same columns, same indexes, made by the migrations) in a schema of
// their own, filled with enough rows and analysed; the copies shadow the real tables through
// search_path inside one transaction. Times are the bench's business (`npm run bench -- scale`).

const probe = `plan_probe_${randomUUID().slice(0, 8)}`;
const office: Actor = {
  userId: randomUUID(),
  sessionId: randomUUID(),
  role: 'coordinator',
  clientId: null,
  email: 'office@example.test',
  name: 'Office',
} as Actor;

interface PlanNode {
  'Node Type': string;
  'Relation Name'?: string;
  'Index Name'?: string;
  'Index Cond'?: string;
  Plans?: PlanNode[];
}

const nodesOf = (node: PlanNode): PlanNode[] => [node, ...(node.Plans ?? []).flatMap(nodesOf)];

/** Each index of the probe table by name, with its definition. */
async function indexesOf(table: string): Promise<Map<string, string>> {
  const { rows } = await getPool().query<{ indexname: string; indexdef: string }>(
    'select indexname, indexdef from pg_indexes where schemaname = $1 and tablename = $2',
    [probe, table],
  );
  return new Map(rows.map((r) => [r.indexname, r.indexdef]));
}

/** The plan's scans of `table`: each as its node type and the definition of the index it reads. */
async function scansOf(query: { toSQL(): { sql: string; params: unknown[] } }, table: string) {
  const { sql, params } = query.toSQL();
  const client = await getPool().connect();
  try {
    await client.query('begin');
    await client.query(`set local search_path = ${probe}, public`);
    const { rows } = await client.query<{ 'QUERY PLAN': { Plan: PlanNode }[] }>(`explain (format json) ${sql}`, params);
    const indexes = await indexesOf(table);
    return nodesOf(rows[0]['QUERY PLAN'][0].Plan)
      .filter((n) => n['Relation Name'] === table || (n['Index Name'] && indexes.has(n['Index Name'])))
      .map((n) => ({
        type: n['Node Type'],
        index: n['Index Name'] ? (indexes.get(n['Index Name']) ?? '') : '',
        cond: n['Index Cond'] ?? '',
      }));
  } finally {
    await client.query('rollback');
    client.release();
  }
}

beforeAll(async () => {
  const pool = getPool();
  await pool.query(`create schema ${probe}`);
  // Constraints and foreign keys stay behind: the rows below need no client, wall or model.
  await pool.query(`create table ${probe}.cabinets (like public.cabinets including defaults including indexes)`);
  await pool.query(`create table ${probe}.tickets (like public.tickets including defaults including indexes)`);
  // 40,000 serials of the demo's form (maker, batch month, number): HX26-2403-000123.
  await pool.query(`insert into ${probe}.cabinets (serial, cabinet_model_id, batch, status)
    select (array['HX26','HX19','TW39','LM15'])[1 + i % 4] || '-' || (2301 + (i / 2000) % 12) || '-' || lpad(i::text, 6, '0'),
      gen_random_uuid(), 'B' || (i / 500), 'spare'
    from generate_series(1, 40000) i`);
  // Ten years of resolved tickets and a handful with a running clock.
  await pool.query(`insert into ${probe}.tickets (number, client_id, site_id, title, priority, status,
      resolution_due_at, resolution_at_risk_at, response_due_at, acknowledged_at, resolved_at, created_at, updated_at)
    select i, gen_random_uuid(), gen_random_uuid(), 'Dark cabinet ' || i, 'normal',
      case when i > 39970 then 'in_progress' else 'closed' end::ticket_status,
      t0 + interval '1 day', t0 + interval '18 hours', t0 + interval '4 hours', t0 + interval '1 hour',
      case when i > 39970 then null else t0 + interval '20 hours' end, t0, t0
    from generate_series(1, 40000) i cross join lateral (select now() - interval '3650 days' + i * interval '2 hours' as t0) t`);
  await pool.query(`analyze ${probe}.cabinets`);
  await pool.query(`analyze ${probe}.tickets`);
});

afterAll(async () => {
  await getPool().query(`drop schema if exists ${probe} cascade`);
});

describe('query plans at scale', () => {
  it('reads a serial prefix (the register filter) from the pattern index, not the whole table', async () => {
    const query = cabinetListQuery(office, listCabinetsQuery.parse({ serial: 'tw39-2310-0185', limit: '50' }));
    const scans = await scansOf(query, 'cabinets');
    expect(scans).not.toContainEqual(expect.objectContaining({ type: 'Seq Scan' }));
    // A btree index with text_pattern_ops serves LIKE 'x%' under any collation (PostgreSQL manual, 11.10 "Operator Classes").
    expect(scans.some((s) => /text_pattern_ops/.test(s.index))).toBe(true);
  });

  it('starts the sorted walk at a common prefix instead of at the first serial of the register', async () => {
    const query = cabinetListQuery(office, listCabinetsQuery.parse({ serial: 'tw39', limit: '50' }));
    const scans = await scansOf(query, 'cabinets');
    expect(scans.length).toBeGreaterThan(0);
    // Every read of cabinets is bounded by an index condition: no walk from the first serial, no Seq Scan.
    // (A Bitmap Heap Scan reads what its Bitmap Index Scan found.)
    expect(scans).not.toContainEqual(expect.objectContaining({ type: 'Seq Scan' }));
    for (const scan of scans.filter((s) => s.type !== 'Bitmap Heap Scan')) expect(scan.cond, JSON.stringify(scans)).toMatch(/serial/);
  });

  it('reads a serial tail (the Scan page) and any part (the search box) from the trigram index', async () => {
    for (const query of [serialTailQuery(office, '018512'), serialMatchesQuery(office, '2310-01851')]) {
      const scans = await scansOf(query, 'cabinets');
      expect(scans).not.toContainEqual(expect.objectContaining({ type: 'Seq Scan' }));
      // pg_trgm's GIN index answers LIKE '%x%' (PostgreSQL manual, F.35 pg_trgm, "Index Support").
      expect(scans.some((s) => /gin_trgm_ops/.test(s.index))).toBe(true);
    }
  });

  it('reads the tickets with a running clock from their partial index when filtering by clock', async () => {
    const query = ticketListQuery(office, listTicketsQuery.parse({ clock: 'at_risk,breached', limit: '50' }));
    const scans = await scansOf(query, 'tickets');
    expect(scans).not.toContainEqual(expect.objectContaining({ type: 'Seq Scan' }));
    expect(scans.some((s) => /resolved_at IS NULL/i.test(s.index))).toBe(true);
  });

  it('pages the default list from the (created_at, id) index, the cursor an index range', async () => {
    const first = ticketListQuery(office, listTicketsQuery.parse({ limit: '50' }));
    const cursor = Buffer.from(JSON.stringify([new Date(Date.now() - 2000 * 86_400_000).toISOString(), randomUUID()])).toString(
      'base64url',
    );
    const next = ticketListQuery(office, listTicketsQuery.parse({ limit: '50', cursor }));
    const createdIndex = expect.stringMatching(/\(created_at, id\)$/);
    expect(await scansOf(first, 'tickets')).toEqual([expect.objectContaining({ type: 'Index Scan', index: createdIndex })]);
    // The next page starts inside the index (a row comparison is an index condition), not after a walk past the first pages.
    expect(await scansOf(next, 'tickets')).toEqual([
      expect.objectContaining({ type: 'Index Scan', index: createdIndex, cond: expect.stringMatching(/ROW\(created_at, id\) </) }),
    ]);
  });
});

// The clock filter now also says "no resolution and a due time" so the planner can use the
// partial index: it must keep exactly the tickets whose computed state is the one asked for.
describe('the clock filter', () => {
  let session: Session;
  let org: Awaited<ReturnType<typeof createOrganisation>>;
  const ids: Record<string, string> = {};
  const hour = 3_600_000;
  let turnsAt = 0;

  async function open(name: string) {
    const res = await session.post('/api/tickets', {
      siteId: org.site.id,
      wallId: org.wall!.id,
      scope: 'whole_wall',
      priority: 'normal',
      title: `Clock ${name}`,
    });
    expect(res.status).toBe(201);
    ids[name] = (res.body as { id: string }).id;
    return ids[name];
  }

  /** The ticket names the filter keeps, and the names the unfiltered list shows in that state. */
  async function compare(states: TicketClockState[]) {
    const byId = new Map(Object.entries(ids).map(([name, id]) => [id, name]));
    const filtered = await session.get(`/api/tickets?clientId=${org.client.id}&limit=100&clock=${states.join(',')}`);
    const all = await session.get(`/api/tickets?clientId=${org.client.id}&limit=100`);
    expect(filtered.status).toBe(200);
    const names = (items: { id: string }[]) => items.map((i) => byId.get(i.id)).sort();
    const kept = names(filtered.body.items);
    const inState = names(
      (all.body.items as { id: string; clockState: TicketClockState | null }[]).filter(
        (i) => i.clockState && states.includes(i.clockState),
      ),
    );
    return { kept, inState };
  }

  beforeAll(async () => {
    org = await createOrganisation({ withWall: true });
    session = await signedIn('coordinator');
    const now = Date.now();
    const at = (ms: number) => new Date(now + ms);
    const set = async (name: string, values: Partial<typeof tickets.$inferInsert>) =>
      db()
        .update(tickets)
        .set(values)
        .where(eq(tickets.id, await open(name)));
    const acknowledged = { acknowledgedAt: at(-hour), responseDueAt: at(-2 * hour), responseAtRiskAt: at(-3 * hour) };
    await set('onTrack', { ...acknowledged, resolutionDueAt: at(10 * hour), resolutionAtRiskAt: at(8 * hour) });
    await set('atRisk', { ...acknowledged, resolutionDueAt: at(10 * hour), resolutionAtRiskAt: at(-hour) });
    await set('breached', { ...acknowledged, resolutionDueAt: at(-hour), resolutionAtRiskAt: at(-2 * hour) });
    await set('responseLate', {
      acknowledgedAt: null,
      responseDueAt: at(-hour),
      resolutionDueAt: at(10 * hour),
      resolutionAtRiskAt: at(8 * hour),
    });
    await set('paused', {
      ...acknowledged,
      status: 'waiting_client',
      pausedAt: at(-hour),
      resolutionDueAt: at(-hour),
      resolutionAtRiskAt: at(-2 * hour),
    });
    await set('met', { ...acknowledged, status: 'resolved', resolvedAt: at(-2 * hour), resolutionDueAt: at(-hour) });
    await set('missed', { ...acknowledged, status: 'resolved', resolvedAt: at(-hour), resolutionDueAt: at(-2 * hour) });
    await set('noClock', { ...acknowledged, resolutionDueAt: null, resolutionAtRiskAt: null });
    // Closed without a resolution time: its clock still reads as running (clockStateSql's rules).
    await set('closedUnresolved', {
      ...acknowledged,
      status: 'closed',
      resolvedAt: null,
      resolutionDueAt: at(-hour),
      resolutionAtRiskAt: at(-2 * hour),
    });
    // Becomes at risk three seconds from now.
    turnsAt = Date.now() + 3000;
    await set('turning', { ...acknowledged, resolutionDueAt: at(10 * hour), resolutionAtRiskAt: new Date(turnsAt) });
  });

  it('keeps exactly the tickets in each state asked for', async () => {
    const expected: Record<TicketClockState, string[]> = {
      on_track: ['onTrack', 'turning'],
      at_risk: ['atRisk'],
      breached: ['breached', 'closedUnresolved', 'responseLate'],
      paused: ['paused'],
      met: ['met'],
      missed: ['missed'],
    };
    for (const [state, names] of Object.entries(expected) as [TicketClockState, string[]][]) {
      const { kept, inState } = await compare([state]);
      expect(kept, state).toEqual([...names].sort());
      expect(kept, state).toEqual(inState);
    }
    // Running and finished states together: the running-clock shortcut must not drop met or missed.
    const mixed = await compare(['at_risk', 'met']);
    expect(mixed.kept).toEqual(['atRisk', 'met']);
  });

  it('follows a due time passing: the at-risk time goes by and the ticket moves from on track to at risk', async () => {
    await new Promise((r) => setTimeout(r, Math.max(0, turnsAt - Date.now()) + 300));
    const atRisk = await compare(['at_risk', 'breached']);
    expect(atRisk.kept).toEqual(['atRisk', 'breached', 'closedUnresolved', 'responseLate', 'turning']);
    expect(atRisk.kept).toEqual(atRisk.inState);
    expect((await compare(['on_track'])).kept).toEqual(['onTrack']);
  });
});
