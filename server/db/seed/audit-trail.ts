// The audit trail the demo's history would have left behind had it been entered through the app:
// who opened, acknowledged, moved on, resolved and closed each ticket, who wrote each comment,
// and every cabinet placed, moved, swapped or changed in state. Derived from the demo's rows, so
// the audit log tells the same story as the tickets and the cabinet histories. Pure.
import type * as schema from '../schema/index.js';

type Insert<T extends { $inferInsert: unknown }> = T['$inferInsert'];
type AuditRow = Insert<typeof schema.auditEvents>;

interface Source {
  tickets: Insert<typeof schema.tickets>[];
  ticketComments: Insert<typeof schema.ticketComments>[];
  cabinetEvents: Insert<typeof schema.cabinetEvents>[];
}

const place = (wallId: string | null | undefined, column: number | null | undefined, row: number | null | undefined) =>
  wallId ? { wallId, column: column ?? null, row: row ?? null } : { wallId: null };

/** `officeId` acknowledges the tickets, as the coordinator does in the demo's story. */
export function demoAuditTrail(rows: Source, officeId: string): AuditRow[] {
  const trail: AuditRow[] = [];
  const add = (e: Omit<AuditRow, 'createdAt'> & { createdAt: Date }) => trail.push(e);

  for (const t of rows.tickets) {
    const ticketId = t.id!;
    const createdAt = t.createdAt as Date;
    add({
      actorId: t.reporterId ?? null,
      entity: 'ticket',
      entityId: ticketId,
      action: 'created',
      createdAt,
      after: { number: t.number, title: t.title, priority: t.priority, status: 'new', cells: t.cells },
    });
    let status = 'new';
    const step = (actorId: string | null | undefined, at: Date | null | undefined, next: string, extra: Record<string, unknown> = {}) => {
      if (!at || next === status) return;
      add({
        actorId: actorId ?? null,
        entity: 'ticket',
        entityId: ticketId,
        action: 'updated',
        createdAt: at,
        before: { status },
        after: { status: next, ...extra },
      });
      status = next;
    };
    step(officeId, t.acknowledgedAt as Date | null, 'acknowledged', { assigneeId: t.assigneeId ?? null });
    // A ticket still open in a later state (scheduled, in progress, waiting) got there last.
    if (!t.resolvedAt && t.status && !['new', 'acknowledged'].includes(t.status))
      step(t.assigneeId ?? officeId, t.updatedAt as Date, t.status);
    step(t.assigneeId ?? officeId, t.resolvedAt as Date | null, 'resolved');
    step(t.reporterId ?? officeId, t.closedAt as Date | null, 'closed');
  }

  for (const c of rows.ticketComments) {
    add({
      actorId: c.authorId ?? null,
      entity: 'ticket',
      entityId: c.ticketId,
      action: `comment_${c.visibility ?? 'public'}`,
      createdAt: c.createdAt as Date,
      after: { commentId: c.id },
    });
  }

  for (const e of rows.cabinetEvents) {
    const base = { actorId: e.actorId ?? null, entity: 'cabinet', entityId: e.cabinetId, createdAt: e.createdAt as Date };
    const from = place(e.fromWallId, e.fromColumn, e.fromRow);
    const to = place(e.toWallId, e.toColumn, e.toRow);
    if (e.kind === 'placed' || e.kind === 'imported') add({ ...base, action: 'placed', after: to });
    else if (e.kind === 'moved' || e.kind === 'removed') add({ ...base, action: 'moved', before: from, after: to });
    else if (e.kind === 'swapped') add({ ...base, action: 'swapped', before: from, after: to });
    else if (e.kind === 'status_changed')
      add({ ...base, action: 'updated', before: { status: e.fromStatus ?? null }, after: { status: e.toStatus ?? null } });
  }

  return trail.sort((a, b) => (a.createdAt as Date).getTime() - (b.createdAt as Date).getTime());
}
