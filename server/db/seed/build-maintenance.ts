// The demo's maintenance plans: each with its last completed visit (and the repairs done on it),
// and a planned visit when the next one is due within two weeks.
import { addMonths, differenceInCalendarDays, parseISO } from 'date-fns';
import type { ChecklistItem } from '../schema/visits.js';
import type { Demo } from './build-context.js';
import type { WorkLog } from './build-repairs.js';
import { maintenanceChecklist, siteSpecs, wallSpecs } from './register.js';
import { maintenanceSpecs, type MaintenanceSpec } from './work.js';

export function addMaintenance(demo: Demo, work: WorkLog) {
  const today = demo.clock.isoDate(0);
  for (const m of maintenanceSpecs) addMaintenancePlan(demo, work, m, today);
}

function addMaintenancePlan({ rows, clock, id, ids }: Demo, work: WorkLog, m: MaintenanceSpec, today: string) {
  const w = wallSpecs[m.wall];
  const site = siteSpecs[w.site];
  const tz = site.timeZone;
  const doneOffset = clock.weekdayOffset(tz, -m.lastDoneDaysAgo);
  const lastDoneOn = clock.isoDate(doneOffset, tz);
  const nextDueOn = addMonths(parseISO(lastDoneOn), m.intervalMonths).toISOString().slice(0, 10);
  const planId = id();
  const installedAt = clock.at(tz, -w.installedDaysAgo, 10);
  rows.maintenancePlans.push({
    id: planId,
    wallId: ids.wall[m.wall],
    intervalMonths: m.intervalMonths,
    checklist: maintenanceChecklist,
    lastDoneOn,
    nextDueOn,
    active: true,
    createdAt: installedAt,
    updatedAt: clock.at(tz, doneOffset, 15),
  });
  const start = clock.at(tz, doneOffset, m.wall === 'w12' ? 6 : 8);
  const completedAt = clock.hoursFrom(start, 3.5);
  const visitId = work.addVisit(
    {
      clientId: ids.client[site.client],
      siteId: ids.site[w.site],
      wallId: ids.wall[m.wall],
      ticketId: null,
      maintenancePlanId: planId,
      kind: 'maintenance',
      status: 'completed',
      windowStart: start,
      windowEnd: clock.hoursFrom(start, 4),
      checklist: maintenanceChecklist.map((label): ChecklistItem => ({ label, done: true })),
      summary: m.summary,
      signedByName: site.contact.name,
      signedAt: completedAt,
      reportSentAt: clock.hoursFrom(completedAt, 0.1),
      startedAt: clock.hoursFrom(start, 0.1),
      completedAt,
      createdAt: clock.hoursFrom(start, -14 * 24),
      updatedAt: completedAt,
    },
    [ids.user[m.tech]],
  );
  (m.repairs ?? []).forEach((r, i) =>
    work.logRepair(r, { wall: m.wall, visitId, ticketId: null, tech: m.tech, performedAt: clock.hoursFrom(start, 1 + 0.5 * i) }),
  );

  const dueIn = differenceInCalendarDays(parseISO(nextDueOn), parseISO(today));
  if (dueIn >= 0 && dueIn <= 14) {
    const offset = Math.max(1, clock.weekdayOffset(tz, dueIn));
    const planned = clock.at(tz, offset, m.wall === 'w12' ? 6 : 8);
    // The big centre wall takes both technicians.
    const techs = m.wall === 'w01' ? [ids.user.tech1, ids.user.tech2] : [ids.user[m.tech === 'tech1' ? 'tech1' : 'tech2']];
    work.addVisit(
      {
        clientId: ids.client[site.client],
        siteId: ids.site[w.site],
        wallId: ids.wall[m.wall],
        ticketId: null,
        maintenancePlanId: planId,
        kind: 'maintenance',
        status: 'planned',
        windowStart: planned,
        windowEnd: clock.hoursFrom(planned, m.wall === 'w01' ? 6 : 4),
        checklist: maintenanceChecklist.map((label): ChecklistItem => ({ label, done: false })),
        createdAt: clock.hoursAgo(24 * 7),
        updatedAt: clock.hoursAgo(24 * 7),
      },
      techs,
    );
  }
}
