// A decade of service history on top of the demo data, for the speed measurements of
// `npm run bench -- scale` and for trying queries at scale by hand (scripts/seed-scale.ts).
//
// Needs a migrated database that already holds the demo data (its cabinet models, service plans
// and staff accounts are reused). Adds, with set-based SQL (insert … select … generate_series):
//  - clients (one per 10 walls), sites (one per 4 walls) and walls: the first wall 50 × 40
//    (2,000 cabinets), the others 25 × 20 (500 cabinets), installed over ten years;
//  - one cabinet per wall position, each with a unique serial in the demo's form
//    (`TW39-24C-123456`: model prefix, year made, run letter, six digits) and production batches
//    in the demo's form (`T39-2403-B`), a few walls sharing nothing;
//  - tickets over the ten years: all closed but the last few hundred, with due times, at-risk
//    times, acknowledged / resolved / closed times and comments;
//  - cabinet history events (imported at install, then repairs, swaps and status changes).
// Every row goes through the tables' constraints and triggers; VACUUM ANALYZE at the end.
import pg from 'pg';
import { modelSpecs } from '../../server/db/seed/register.js';

export interface ScaleSize {
  cabinets: number;
  tickets: number;
  events: number;
}

export const fullScale: ScaleSize = { cabinets: 1_000_000, tickets: 100_000, events: 1_000_000 };

/** What the seed wrote, for the bench to pick its routes from. */
export interface ScaleSeedResult {
  size: ScaleSize;
  walls: number;
  clients: number;
  sites: number;
  comments: number;
  /** The 2,000-cabinet wall. */
  bigWallId: string;
  /** A 500-cabinet wall. */
  wallId: string;
  clientId: string;
  /** A batch code held by some of the seeded cabinets. */
  batch: string;
  /** A seeded cabinet's serial. */
  serial: string;
  seconds: Record<string, number>;
}

const BIG_WALL = { columns: 50, rows: 40 };
const WALL = { columns: 25, rows: 20 };
const OPEN_TICKETS = 300;

/** The marker of the seeded clients: a second run refuses instead of doubling the data. */
const CLIENT_TAG = 'Decade';

export async function seedAtScale(
  databaseUrl: string,
  size: Partial<ScaleSize> = {},
  log: (line: string) => void = () => {},
): Promise<ScaleSeedResult> {
  const want: ScaleSize = { ...fullScale, ...size };
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  const seconds: Record<string, number> = {};
  // A big insert into a table with trigram (GIN) and other secondary indexes is several times
  // faster when those indexes are built once afterwards: the non-unique indexes of the table
  // (whatever they are at the time: read from pg_indexes) are dropped and made again, inside the
  // same transaction. Unique indexes, keys, checks and triggers stay on and check every row.
  const withIndexesLater = async <T>(table: string, run: () => Promise<T>): Promise<T> => {
    const found = await client.query<{ name: string; def: string }>(
      `select i.indexrelid::regclass::text as name, pg_get_indexdef(i.indexrelid) as def
         from pg_index i where i.indrelid = $1::regclass and not i.indisunique and not i.indisprimary`,
      [table],
    );
    for (const ix of found.rows) await client.query(`drop index ${ix.name}`);
    const result = await run();
    const started = performance.now();
    for (const ix of found.rows) await client.query(ix.def);
    const name = `${table} indexes (${found.rowCount})`;
    seconds[name] = Math.round((performance.now() - started) / 100) / 10;
    log(`  ${name}: ${seconds[name]} s`);
    return result;
  };
  const step = async (name: string, text: string, values: unknown[] = []) => {
    const started = performance.now();
    const out = await client.query(text, values);
    seconds[name] = Math.round((performance.now() - started) / 100) / 10;
    log(`  ${name}: ${out.rowCount ?? 0} rows, ${seconds[name]} s`);
    return out;
  };
  try {
    await client.query(`set maintenance_work_mem = '256MB'`);
    await client.query(`set work_mem = '64MB'`);
    const already = await client.query(`select 1 from clients where name like $1 limit 1`, [`${CLIENT_TAG} %`]);
    if (already.rowCount) throw new Error('this database already holds the scale data');
    const models = await client.query<{ id: string; name: string }>(`select id, name from cabinet_models order by name`);
    const staff = await client.query<{ id: string; role: string }>(
      `select id, role::text as role from users where role in ('admin', 'coordinator', 'technician') and disabled_at is null order by email`,
    );
    const plans = await client.query<{ id: string }>(`select id from service_plans order by name`);
    const byName = new Map(Object.values(modelSpecs).map((m) => [m.name, m]));
    const usable = models.rows.filter((m) => byName.has(m.name));
    if (usable.length === 0 || plans.rowCount === 0 || !staff.rows.some((u) => u.role === 'technician')) {
      throw new Error('the scale seed goes on top of the demo data: run it on a database `npm start` has filled');
    }
    const techs = staff.rows.filter((u) => u.role === 'technician').map((u) => u.id);
    const office = staff.rows.filter((u) => u.role !== 'technician').map((u) => u.id);

    // Sizes: walls of 500 cabinets after the one 2,000-cabinet wall.
    const big = BIG_WALL.columns * BIG_WALL.rows;
    const wallCount = 1 + Math.max(0, Math.ceil((want.cabinets - big) / (WALL.columns * WALL.rows)));
    const siteCount = Math.max(1, Math.ceil(wallCount / 4));
    const clientCount = Math.max(1, Math.ceil(wallCount / 10));

    await client.query('begin');
    // Reference lists as temporary tables, so that the generators can index into them.
    await client.query(
      `create temporary table scale_models on commit drop as
      select (ordinality - 1)::int as k, id, serial_prefix, batch_prefix
        from unnest($1::uuid[], $2::text[], $3::text[]) with ordinality as m(id, serial_prefix, batch_prefix)`,
      [usable.map((m) => m.id), usable.map((m) => byName.get(m.name)!.serialPrefix), usable.map((m) => byName.get(m.name)!.batchPrefix)],
    );
    const nModels = usable.length;

    await step(
      'clients',
      `insert into clients (name, service_plan_id, notes, created_at, updated_at)
       select format('%s %s %s %s', $1::text,
                (array['Harbour','Summit','Lakeside','Northgate','Riverside','Granite','Meridian','Cedar','Beacon','Prairie'])[1 + g % 10],
                (array['Arena','Church','Schools','Stadium','Mall','Studios','Transit','Campus','Theatre','Hotels'])[1 + (g / 10) % 10],
                lpad(g::text, 4, '0')),
              ($3::uuid[])[1 + g % cardinality($3::uuid[])],
              '', now() - interval '10 years' + g * interval '15 days', now() - interval '10 years' + g * interval '15 days'
         from generate_series(0, $2::int - 1) g`,
      [CLIENT_TAG, clientCount, plans.rows.map((p) => p.id)],
    );
    await client.query(
      `create temporary table scale_clients on commit drop as
      select (row_number() over (order by name) - 1)::int as k, id from clients where name like $1`,
      [`${CLIENT_TAG} %`],
    );

    await step(
      'sites',
      `insert into sites (client_id, name, address, city, country, time_zone, created_at, updated_at)
       select c.id, format('Site %s', lpad(g::text, 4, '0')), format('%s Market Street', 10 + g % 890),
              (array['Chicago','Denver','Atlanta','Seattle','Phoenix','Boston','Dallas','Portland'])[1 + g % 8], 'US',
              (array['America/Chicago','America/Denver','America/New_York','America/Los_Angeles','America/Phoenix','America/New_York','America/Chicago','America/Los_Angeles'])[1 + g % 8],
              c_created, c_created
         from generate_series(0, $1::int - 1) g
         join scale_clients sc on sc.k = g % $2::int
         join lateral (select id, created_at as c_created from clients where id = sc.id) c on true`,
      [siteCount, clientCount],
    );
    await client.query(
      `create temporary table scale_sites on commit drop as
      select (row_number() over (order by s.name) - 1)::int as k, s.id, s.client_id
        from sites s join clients c on c.id = s.client_id where c.name like $1`,
      [`${CLIENT_TAG} %`],
    );

    // Wall w: installed on day w × (ten years / walls), model w mod models, site w mod sites.
    await step(
      'walls',
      `insert into walls (client_id, site_id, name, cabinet_model_id, columns, rows, mounting, install_date, warranty_end, created_at, updated_at)
       select s.client_id, s.id, format('Wall %s', lpad(w::text, 5, '0')), m.id,
              case when w = 0 then ${BIG_WALL.columns} else ${WALL.columns} end,
              case when w = 0 then ${BIG_WALL.rows} else ${WALL.rows} end,
              (array['wall_fixed','flown','ground_stacked','curved'])[1 + w % 4]::mounting,
              installed::date, (installed + interval '3 years')::date, installed, installed
         from generate_series(0, $1::int - 1) w
         cross join lateral (select now() - interval '10 years' + (w::float / $1::int) * interval '3640 days' as installed) i
         join scale_sites s on s.k = w % $2::int
         join scale_models m on m.k = w % ${nModels}`,
      [wallCount, siteCount],
    );
    await client.query(`create temporary table scale_walls on commit drop as
      select (row_number() over (order by w.name) - 1)::int as k, w.id, w.client_id, w.site_id, w.columns, w.rows,
             w.cabinet_model_id, w.created_at
        from walls w join scale_sites s on s.id = w.site_id`);
    await client.query(`alter table scale_walls add primary key (k)`);

    // Cabinet g sits on wall (g < 2000 ? 0 : 1 + (g - 2000) / 500) at position p; ids are made
    // first, so that the events can find cabinet g by number.
    await step(
      'cabinet numbering',
      `create temporary table scale_cabinets on commit drop as
       select g, gen_random_uuid() as id, w.k as wall_k, w.id as wall_id, w.columns,
              (p % w.columns) + 1 as col, (p / w.columns) + 1 as row
         from generate_series(0, $1::int - 1) g
         cross join lateral (select case when g < ${big} then 0 else 1 + (g - ${big}) / ${WALL.columns * WALL.rows} end as wk,
                                    case when g < ${big} then g else (g - ${big}) % ${WALL.columns * WALL.rows} end as p) x
         join scale_walls w on w.k = x.wk`,
      [want.cabinets],
    );
    await client.query(`alter table scale_cabinets add primary key (g)`);
    // Serials: the run letter and six digits together number the cabinet (100000 + g mod 900000),
    // above every demo serial's digits: unique by construction.
    await withIndexesLater('cabinets', async () => {
      await step(
        'cabinets',
        `insert into cabinets (id, serial, cabinet_model_id, wall_id, "column", "row", batch, status, installed_on, created_at, updated_at)
         select c.id,
                format('%s-%s%s-%s', m.serial_prefix, to_char(w.created_at - interval '60 days', 'YY'),
                       chr(65 + c.g / 900000), 100000 + c.g % 900000),
                w.cabinet_model_id, c.wall_id, c.col, c.row,
                format('%s-%s-%s', m.batch_prefix, to_char(w.created_at - interval '60 days', 'YYMM'),
                       chr(65 + (c.row - 1) / 7 + (w.k % 3))),
                'installed', w.created_at::date, w.created_at, w.created_at
           from scale_cabinets c
           join scale_walls w on w.k = c.wall_k
           join scale_models m on m.id = w.cabinet_model_id
          order by c.g`,
      );
    });

    // Tickets: number order is time order; the last OPEN_TICKETS are still open (the newest few
    // hundred, opened over the last fortnight), the rest closed.
    const open = Math.min(OPEN_TICKETS, want.tickets);
    await withIndexesLater('tickets', async () => {
      await step(
        'tickets',
        `insert into tickets (client_id, site_id, wall_id, scope, cells, title, description, priority, status,
                              reporter_id, assignee_id, response_due_at, resolution_due_at, response_at_risk_at,
                              resolution_at_risk_at, paused_at, paused_seconds, acknowledged_at, resolved_at, closed_at,
                              created_at, updated_at)
         select w.client_id, w.site_id, w.id, case when t % 9 = 0 then 'whole_wall' else 'cells' end::ticket_scope,
                case when t % 9 = 0 then '[]'::jsonb
                     else jsonb_build_array(jsonb_build_object('column', 1 + t % w.columns, 'row', 1 + (t / 7) % w.rows)) end,
                format('%s %s', (array['Dead module','Dark cabinet','Colour shift','Flicker on','Seam visible on','No signal on',
                                       'Stripe across','Hot pixel cluster on','Receiving card fault on','Power supply fault on'])[1 + t % 10],
                       format('C%s·R%s', 1 + t % w.columns, 1 + (t / 7) % w.rows)),
                format('Reported by the venue: %s. Seen during %s.',
                       (array['half the cabinet dark','a magenta cast','intermittent flashing','a blank strip','a stuck row'])[1 + t % 5],
                       (array['the morning check','a live event','rehearsal','the weekly test pattern'])[1 + t % 4]),
                pr.priority::ticket_priority, st.status::ticket_status,
                ($3::uuid[])[1 + t % cardinality($3::uuid[])],
                case when st.status = 'new' then null else ($4::uuid[])[1 + t % cardinality($4::uuid[])] end,
                created + pr.resp, created + pr.resol, created + pr.resp * 0.75, created + pr.resol * 0.75,
                case when st.status = 'waiting_client' then created + interval '2 hours' end,
                case when st.status = 'closed' and t % 17 = 0 then 86400 else 0 end,
                case when st.status = 'new' then null else created + pr.resp * 0.4 end,
                case when st.status in ('resolved', 'closed') then created + pr.resol * (0.3 + (t % 10) * 0.08) end,
                case when st.status = 'closed' then created + pr.resol * (0.3 + (t % 10) * 0.08) + interval '3 days' end,
                created,
                case when st.status = 'closed' then created + pr.resol * (0.3 + (t % 10) * 0.08) + interval '3 days' else created + interval '2 hours' end
           from generate_series(0, $1::int - 1) t
           cross join lateral (
             select case when t >= $1::int - $2::int
                         then now() - ($1::int - t) * interval '70 minutes'
                         else now() - interval '10 years' + (t::float / $1::int) * interval '3630 days' end as created) c
           join scale_walls w on w.k = (t * 7919) % ${wallCount}
           cross join lateral (
             select p.priority,
                    case p.priority when 'critical' then interval '2 hours' when 'high' then interval '4 hours'
                                    when 'normal' then interval '8 hours' else interval '24 hours' end as resp,
                    case p.priority when 'critical' then interval '12 hours' when 'high' then interval '24 hours'
                                    when 'normal' then interval '72 hours' else interval '120 hours' end as resol
               from (select (array['critical','high','high','normal','normal','normal','normal','low'])[1 + t % 8] as priority) p) pr
           cross join lateral (
             select case when t < $1::int - $2::int then 'closed'
                         else (array['new','acknowledged','scheduled','in_progress','waiting_parts','waiting_client','resolved'])[1 + t % 7]
                    end as status) st
          order by t`,
        [want.tickets, open, office, techs],
      );
    });
    await client.query(`create temporary table scale_tickets on commit drop as
      select t.id, t.status, t.created_at, t.reporter_id, t.assignee_id, t.resolved_at, t.closed_at,
             (row_number() over (order by t.number))::int as k
        from tickets t join scale_walls w on w.id = t.wall_id`);

    // Comments: a public acknowledgement on every acknowledged ticket, an internal note on every
    // third, and on resolved / closed tickets the repair done.
    const comments = await withIndexesLater('ticket_comments', () =>
      step(
        'ticket comments',
        `insert into ticket_comments (ticket_id, author_id, body, visibility, created_at)
       select id, coalesce(assignee_id, reporter_id), 'On it: a technician will be in touch about a visit.', 'public'::comment_visibility, created_at + interval '30 minutes'
         from scale_tickets where status <> 'new'
       union all
       select id, assignee_id, (array['Spare cabinet taken from the van stock.','Receiving card reseated; watch it.',
                                      'Module batch matches the last recall.','Client asked for an evening visit.'])[1 + k % 4],
              'internal'::comment_visibility, created_at + interval '90 minutes'
         from scale_tickets where k % 3 = 0 and assignee_id is not null
       union all
       select id, assignee_id, (array['Module replaced and calibrated; wall checked on a full white field.',
                                      'Receiving card replaced; the cabinet shows the test pattern again.',
                                      'Power supply replaced; the cabinet runs cool.'])[1 + k % 3],
              'public'::comment_visibility, resolved_at
         from scale_tickets where resolved_at is not null and assignee_id is not null`,
      ),
    );

    // Events: `imported` at install for most cabinets (70 % of the events), then
    // repairs, swaps and status changes spread over the cabinets and the decade.
    const imported = Math.min(want.cabinets, Math.floor(want.events * 0.7));
    await withIndexesLater('cabinet_events', async () => {
      await step(
        'cabinet events (imported)',
        `insert into cabinet_events (cabinet_id, kind, to_wall_id, to_column, to_row, to_status, note, actor_id, created_at)
         select c.id, 'imported', c.wall_id, c.col, c.row, 'installed', '', $2::uuid, w.created_at
           from scale_cabinets c join scale_walls w on w.k = c.wall_k
          where c.g < $1::int
          order by c.g`,
        [imported, office[0]],
      );
      await step(
        'cabinet events (service)',
        `insert into cabinet_events (cabinet_id, kind, from_wall_id, from_column, from_row, to_wall_id, to_column, to_row,
                                     other_cabinet_id, from_status, to_status, note, note_for_client, actor_id, created_at)
         select c.id, k.kind::cabinet_event_kind,
                case when k.kind = 'swapped' then c.wall_id end, case when k.kind = 'swapped' then c.col end,
                case when k.kind = 'swapped' then c.row end,
                case when k.kind = 'swapped' then c.wall_id end, case when k.kind = 'swapped' then c.col end,
                case when k.kind = 'swapped' then c.row end,
                case when k.kind = 'swapped' then o.id end,
                case when k.kind = 'status_changed' then 'installed'::cabinet_status end,
                case when k.kind = 'status_changed' then 'installed'::cabinet_status end,
                (array['Module replaced.','Receiving card replaced.','Power supply replaced.','Cabinet swapped with a spare position.',
                       'Checked after a storm; no fault found.'])[1 + e % 5],
                e % 4 = 0, ($3::uuid[])[1 + e % cardinality($3::uuid[])],
                w.created_at + ((now() - w.created_at) * ((e % 97 + 1) / 98.0))
           from generate_series(0, $1::int - 1) e
           join scale_cabinets c on c.g = (e::bigint * 104729) % $2::int
           join scale_cabinets o on o.g = (e::bigint * 104729 + 1) % $2::int
           join scale_walls w on w.k = c.wall_k
           cross join lateral (select (array['repaired','repaired','repaired','swapped','status_changed'])[1 + e % 5] as kind) k`,
        [want.events - imported, want.cabinets, techs],
      );
    });
    await client.query('commit');

    const started = performance.now();
    for (const table of ['clients', 'sites', 'walls', 'cabinets', 'tickets', 'ticket_comments', 'cabinet_events']) {
      await client.query(`vacuum analyze ${table}`);
    }
    seconds['vacuum analyze'] = Math.round((performance.now() - started) / 100) / 10;
    log(`  vacuum analyze: ${seconds['vacuum analyze']} s`);

    const pick = await client.query<{ big: string; wall: string; client: string; batch: string; serial: string }>(
      `select (select id from walls where name = 'Wall 00000' and columns = ${BIG_WALL.columns}
                and client_id in (select id from clients where name like $1) limit 1) as big,
              (select id from walls where name = $2
                and client_id in (select id from clients where name like $1) limit 1) as wall,
              (select client_id from walls where name = $2
                and client_id in (select id from clients where name like $1) limit 1) as client,
              (select batch from cabinets where wall_id = (select id from walls where name = $2
                and client_id in (select id from clients where name like $1) limit 1) limit 1) as batch,
              (select serial from cabinets where wall_id = (select id from walls where name = $2
                and client_id in (select id from clients where name like $1) limit 1) order by serial limit 1) as serial`,
      // The first 500-cabinet wall; the big one when the size holds no other.
      [`${CLIENT_TAG} %`, wallCount > 1 ? 'Wall 00001' : 'Wall 00000'],
    );
    const p = pick.rows[0];
    return {
      size: want,
      walls: wallCount,
      clients: clientCount,
      sites: siteCount,
      comments: comments.rowCount ?? 0,
      bigWallId: p.big,
      wallId: p.wall,
      clientId: p.client,
      batch: p.batch,
      serial: p.serial,
      seconds,
    };
  } catch (err) {
    await client.query('rollback').catch(() => {});
    throw err;
  } finally {
    await client.end();
  }
}
