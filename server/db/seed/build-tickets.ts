// The demo's tickets, each told as it would have happened: acknowledged, visited and repaired,
// resolved and closed, or still somewhere on the way, with the comments each step leaves.
import type { ChecklistItem } from '../schema/visits.js';
import type * as schema from '../schema/index.js';
import { planClock, ticketDueTimes } from '../../services/ticket-clock.js';
import type { Demo, Insert } from './build-context.js';
import type { WorkLog } from './build-repairs.js';
import { HOUR } from './clock.js';
import { clientSpecs, plans, repairChecklist, siteSpecs, wallSpecs, type SiteKey } from './register.js';
import { ticketSpecs, type TicketSpec } from './work.js';

type TicketRow = Insert<typeof schema.tickets> & { createdAt: Date };

const ackDelayHours = { critical: 0.25, high: 0.75, normal: 2, low: 5 } as const;
const visitAfterDays = { critical: 0, high: 1, normal: 3, low: 6 } as const;

const dayLabel = (date: Date, timeZone: string) =>
  new Intl.DateTimeFormat('en-US', {
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hour12: false,
    timeZone,
  }).format(date);

/** Every ticket of the story, numbered from 1001 in the order they were opened. */
export function addTickets(demo: Demo, work: WorkLog) {
  const ticketRows = ticketSpecs.map((t) => addTicket(demo, work, t));
  ticketRows.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  ticketRows.forEach((t, i) => (t.number = 1001 + i));
  demo.rows.tickets = ticketRows;
}

/** One ticket of the story at the moment it was opened, where it is now, and what it says to the client. */
interface TicketMoment {
  t: TicketSpec;
  ticketId: string;
  siteKey: SiteKey;
  tz: string;
  createdAt: Date;
  ackAt: Date | null;
}

/** What the ticket's story leaves on the ticket itself. */
interface TicketOutcome {
  resolvedAt: Date | null;
  pausedAt: Date | null;
  lastActivity: Date;
}

function addTicket(demo: Demo, work: WorkLog, t: TicketSpec): TicketRow {
  const { clock, id, ids } = demo;
  const siteKey = ((t.wall ? wallSpecs[t.wall] : undefined)?.site ?? t.site)!;
  const site = siteSpecs[siteKey];
  const tz = site.timeZone;
  const createdAt = t.hoursAgo !== undefined ? clock.hoursAgo(t.hoursAgo) : clock.at(tz, -(t.ageDays ?? 0), t.hour ?? 10);
  const ticketId = id();
  const reporterId = t.reporter === 'office' ? ids.user.office : ids.user[t.reporter];
  const ackAt = t.status === 'new' ? null : clock.hoursFrom(createdAt, ackDelayHours[t.priority]);

  if (ackAt) {
    const techName = ids.userName[t.tech!];
    const when = t.noVisit
      ? `${techName} will call you shortly.`
      : t.priority === 'critical'
        ? `${techName} is on the way.`
        : `${techName} will look at it and we will confirm a time with you.`;
    work.comment(ticketId, ids.user.office, `Thanks, we have this. ${when}`, 'public', ackAt);
  }

  const { resolvedAt, pausedAt, lastActivity: progress } = ticketProgress(demo, work, { t, ticketId, siteKey, tz, createdAt, ackAt });
  let lastActivity = progress;
  let closedAt: Date | null = null;
  if (t.status === 'closed') {
    closedAt = clock.hoursFrom(resolvedAt!, 72);
    if (t.thanks && t.reporter !== 'office') work.comment(ticketId, reporterId, t.thanks, 'public', clock.hoursFrom(resolvedAt!, 5));
    lastActivity = closedAt;
  } else if (resolvedAt) {
    lastActivity = resolvedAt;
  }

  return {
    id: ticketId,
    clientId: ids.client[site.client],
    siteId: ids.site[siteKey],
    wallId: t.wall ? ids.wall[t.wall] : null,
    scope: t.scope ?? 'cells',
    cells: (t.cells ?? []).map(([column, row]) => ({ column, row })),
    title: t.title,
    description: t.description,
    priority: t.priority,
    status: t.status,
    reporterId,
    assigneeId: t.status === 'new' ? null : t.tech ? ids.user[t.tech] : null,
    // The same clock the app runs: business hours in the site's time zone, per the plan.
    ...ticketDueTimes(planClock(plans[clientSpecs[site.client].plan], tz), t.priority, createdAt),
    pausedAt,
    pausedSeconds: 0,
    acknowledgedAt: ackAt,
    resolvedAt,
    closedAt,
    createdAt,
    updatedAt: lastActivity,
  };
}

/** How far the ticket got after it was acknowledged: a visit done, under way or booked, a question to the client… */
function ticketProgress(demo: Demo, work: WorkLog, m: TicketMoment): TicketOutcome {
  const { clock, ids } = demo;
  const { t, ticketId, ackAt } = m;
  const techId = ids.user[t.tech!];
  const start: TicketOutcome = { resolvedAt: null, pausedAt: null, lastActivity: ackAt ?? m.createdAt };
  const done = ['closed', 'resolved', 'waiting_parts'].includes(t.status);
  if (done && !t.noVisit) return completedVisit(demo, work, m, start);
  if (done && t.noVisit) {
    const resolvedAt = clock.hoursFrom(ackAt!, 3);
    work.comment(ticketId, techId, t.resolution!, 'public', resolvedAt);
    (t.internal ?? []).forEach((text, i) => work.comment(ticketId, techId, text, 'internal', clock.hoursFrom(resolvedAt, 1 + i)));
    return { ...start, resolvedAt };
  }
  if (t.status === 'in_progress') return visitUnderWay(demo, work, m);
  if (t.status === 'scheduled') return visitBooked(demo, work, m);
  if (t.status === 'waiting_client') {
    const pausedAt = clock.hoursFrom(ackAt!, 20);
    work.comment(ticketId, ids.user.office, t.ask!, 'public', pausedAt);
    return { ...start, pausedAt, lastActivity: pausedAt };
  }
  if (ackAt) (t.internal ?? []).forEach((text, i) => work.comment(ticketId, techId, text, 'internal', clock.hoursFrom(ackAt, 2 + i)));
  return start;
}

/** The visit that repaired the wall (or found it needs parts), its repairs and the comments after it. */
function completedVisit({ clock, ids }: Demo, work: WorkLog, m: TicketMoment, start: TicketOutcome): TicketOutcome {
  const { t, ticketId, siteKey, tz, createdAt } = m;
  const ackAt = m.ackAt!;
  const site = siteSpecs[siteKey];
  const techId = ids.user[t.tech!];
  const after = t.visitAfterDays ?? visitAfterDays[t.priority];
  const planned =
    t.priority === 'critical'
      ? clock.hoursFrom(createdAt, 2.5)
      : clock.at(tz, clock.weekdayOffset(tz, -(t.ageDays ?? 0) + after), siteKey === 'fHq' ? 7 : 9);
  // A visit on the day of the call starts after the call was taken, not at the morning's start.
  const begin = planned.getTime() < ackAt.getTime() + HOUR ? clock.hoursFrom(ackAt, 2) : planned;
  const repairs = t.repairs ?? [];
  const completedAt = clock.hoursFrom(begin, 1 + 0.75 * Math.max(1, repairs.length));
  const visitId = work.addVisit(
    {
      clientId: ids.client[site.client],
      siteId: ids.site[siteKey],
      wallId: t.wall ? ids.wall[t.wall] : null,
      ticketId,
      maintenancePlanId: null,
      kind: 'ticket',
      status: 'completed',
      windowStart: begin,
      windowEnd: clock.hoursFrom(begin, 3),
      checklist: repairChecklist.map((label): ChecklistItem =>
        t.status === 'waiting_parts' && label.startsWith('Repair tested')
          ? { label, done: false, note: 'Waiting for parts.' }
          : { label, done: true },
      ),
      summary: t.resolution ?? '',
      internalNotes: (t.internal ?? []).join('\n'),
      signedByName: site.contact.name,
      signedAt: completedAt,
      reportSentAt: clock.hoursFrom(completedAt, 0.1),
      startedAt: clock.hoursFrom(begin, 0.2),
      completedAt,
      createdAt: ackAt,
      updatedAt: completedAt,
    },
    [techId],
  );
  repairs.forEach((r, i) =>
    work.logRepair(r, { wall: t.wall!, visitId, ticketId, tech: t.tech!, performedAt: clock.hoursFrom(begin, 0.5 + 0.75 * i) }),
  );
  let { resolvedAt, lastActivity } = start;
  if (t.status === 'waiting_parts') {
    work.comment(ticketId, ids.user.office, t.partsNote!, 'public', clock.hoursFrom(completedAt, 2));
    lastActivity = clock.hoursFrom(completedAt, 2);
  } else {
    resolvedAt = completedAt;
    work.comment(ticketId, techId, t.resolution!, 'public', completedAt);
  }
  (t.internal ?? []).forEach((text, i) => work.comment(ticketId, techId, text, 'internal', clock.hoursFrom(completedAt, 1 + i)));
  return { ...start, resolvedAt, lastActivity: new Date(Math.max(lastActivity.getTime(), completedAt.getTime())) };
}

/** A technician on site right now. */
function visitUnderWay({ clock, ids }: Demo, work: WorkLog, { t, ticketId, siteKey, tz, ackAt }: TicketMoment): TicketOutcome {
  const site = siteSpecs[siteKey];
  const techId = ids.user[t.tech!];
  const start = clock.hoursAgo(1.5);
  work.addVisit(
    {
      clientId: ids.client[site.client],
      siteId: ids.site[siteKey],
      wallId: ids.wall[t.wall!],
      ticketId,
      maintenancePlanId: null,
      kind: 'ticket',
      status: 'in_progress',
      windowStart: start,
      windowEnd: clock.hoursFrom(start, 4),
      checklist: repairChecklist.map((label, i): ChecklistItem => ({ label, done: i < 3 })),
      startedAt: clock.hoursAgo(1),
      createdAt: ackAt!,
      updatedAt: clock.hoursAgo(1),
    },
    [techId],
  );
  work.comment(ticketId, ids.user.office, `Visit booked for ${dayLabel(start, tz)}.`, 'public', clock.hoursFrom(ackAt!, 0.5));
  (t.internal ?? []).forEach((text, i) => work.comment(ticketId, techId, text, 'internal', clock.hoursAgo(0.5 - 0.1 * i)));
  return { resolvedAt: null, pausedAt: null, lastActivity: clock.hoursAgo(0.5) };
}

/** A visit booked for the coming business days, sooner for higher priorities. */
function visitBooked({ clock, ids }: Demo, work: WorkLog, { t, ticketId, siteKey, tz, ackAt }: TicketMoment): TicketOutcome {
  const site = siteSpecs[siteKey];
  const nth = t.priority === 'high' ? 1 : t.priority === 'normal' ? 2 : 4;
  const start = clock.at(tz, clock.businessDayOffset(tz, nth), siteKey === 'fHq' ? 7 : 9);
  work.addVisit(
    {
      clientId: ids.client[site.client],
      siteId: ids.site[siteKey],
      wallId: t.wall ? ids.wall[t.wall] : null,
      ticketId,
      maintenancePlanId: null,
      kind: 'ticket',
      status: 'planned',
      windowStart: start,
      windowEnd: clock.hoursFrom(start, 3),
      checklist: repairChecklist.map((label): ChecklistItem => ({ label, done: false })),
      createdAt: ackAt!,
      updatedAt: ackAt!,
    },
    [ids.user[t.tech!]],
  );
  const booked = clock.hoursFrom(ackAt!, 1);
  work.comment(
    ticketId,
    ids.user.office,
    `Visit booked for ${dayLabel(start, tz)} (about three hours). ${ids.userName[t.tech!]} will sign in at reception.`,
    'public',
    booked,
  );
  return { resolvedAt: null, pausedAt: null, lastActivity: booked };
}
