import { and, asc, desc, eq, ilike, inArray, isNull, or, sql } from 'drizzle-orm';
import { staffRoles } from '../../shared/schemas/enums.js';
import type { InviteUserInput, UpdateUserInput } from '../../shared/schemas/auth.js';
import type { CappedList, Page } from '../../shared/schemas/common.js';
import type { AuditEventView, ListAuditQuery, ListUsersQuery, StaffMember, UserSummary } from '../../shared/schemas/users.js';
import { db, type DbOrTx } from '../db/client.js';
import { auditEvents, authTokens, users } from '../db/schema/accounts.js';
import { clients } from '../db/schema/clients.js';
import { badRequest, conflict } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { nameAuditEvents, recordAudit, type NamedAuditEvent } from './audit.js';
import { queueInviteMail, revokeSessions } from './auth.js';
import { afterCursor, capped, decodeCursor, pageOf } from './pagination.js';
import { found } from './scope.js';

const summaryColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  clientId: users.clientId,
  clientName: clients.name,
  phone: users.phone,
  disabledAt: users.disabledAt,
  hasPassword: sql<boolean>`${users.passwordHash} is not null`,
  lastSignInAt: users.lastSignInAt,
  createdAt: users.createdAt,
};

type SummaryRow = { [K in keyof typeof summaryColumns]: unknown } & {
  id: string;
  email: string;
  name: string;
  role: UserSummary['role'];
  clientId: string | null;
  clientName: string | null;
  phone: string;
  disabledAt: Date | null;
  hasPassword: boolean;
  lastSignInAt: Date | null;
  createdAt: Date;
};

function presentUser(row: SummaryRow): UserSummary {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    clientId: row.clientId,
    clientName: row.clientName,
    phone: row.phone,
    disabled: row.disabledAt !== null,
    invitePending: !row.hasPassword,
    lastSignInAt: row.lastSignInAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
  };
}

function selectSummaries(tx: DbOrTx) {
  return tx.select(summaryColumns).from(users).leftJoin(clients, eq(clients.id, users.clientId));
}

export async function listUsers(query: ListUsersQuery): Promise<Page<UserSummary>> {
  const cursor = decodeCursor(query.cursor, 2);
  const pattern = query.q ? `%${query.q.replace(/[%_\\]/g, '\\$&')}%` : undefined;
  const rows = await selectSummaries(db())
    .where(
      and(
        query.role ? eq(users.role, query.role) : undefined,
        query.clientId ? eq(users.clientId, query.clientId) : undefined,
        pattern ? or(ilike(users.name, pattern), ilike(users.email, pattern)) : undefined,
        afterCursor(users.email, users.id, cursor),
      ),
    )
    .orderBy(asc(users.email), asc(users.id))
    .limit(query.limit + 1);
  const page = pageOf(rows as SummaryRow[], query.limit, (r) => [r.email, r.id]);
  return { items: page.items.map(presentUser), nextCursor: page.nextCursor };
}

async function getSummary(tx: DbOrTx, id: string): Promise<UserSummary> {
  const [row] = await selectSummaries(tx).where(eq(users.id, id));
  return presentUser(found(row as SummaryRow | undefined, 'User'));
}

async function assertClientExists(tx: DbOrTx, clientId: string | null | undefined) {
  if (!clientId) return;
  const [row] = await tx
    .select({ id: clients.id })
    .from(clients)
    .where(and(eq(clients.id, clientId), isNull(clients.archivedAt)));
  if (!row) throw badRequest('validation_failed', 'That organisation does not exist.', { clientId: 'Unknown organisation.' });
}

export async function inviteUser(actor: Actor, input: InviteUserInput): Promise<UserSummary> {
  return db().transaction(async (tx) => {
    await assertClientExists(tx, input.clientId);
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email));
    if (existing) throw conflict('email_taken', 'Someone already has an account with that e-mail address.', { email: 'Already in use.' });
    const [user] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, role: input.role, clientId: input.role === 'client' ? input.clientId! : null })
      .returning();
    await recordAudit(tx, { actor, entity: 'user', entityId: user.id, action: 'invited', after: user });
    await queueInviteMail(tx, user, actor.name);
    return getSummary(tx, user.id);
  });
}

export async function resendInvite(actor: Actor, id: string) {
  await db().transaction(async (tx) => {
    const [user] = await tx.select().from(users).where(eq(users.id, id));
    found(user, 'User');
    if (user.passwordHash) throw conflict('already_active', 'This person has already set a password.');
    await queueInviteMail(tx, user, actor.name);
    await recordAudit(tx, { actor, entity: 'user', entityId: id, action: 'invite_sent' });
  });
}

export async function updateUser(actor: Actor, id: string, input: UpdateUserInput): Promise<UserSummary> {
  return db().transaction(async (tx) => {
    const [before] = await tx.select().from(users).where(eq(users.id, id)).for('update');
    found(before, 'User');
    const role = input.role ?? before.role;
    const clientId = role === 'client' ? (input.clientId !== undefined ? input.clientId : before.clientId) : null;
    if (role === 'client' && !clientId) {
      throw badRequest('validation_failed', 'A client user needs an organisation.', { clientId: 'Choose the organisation.' });
    }
    await assertClientExists(tx, clientId);
    if (id === actor.userId && (input.disabled || (input.role && input.role !== 'admin'))) {
      throw conflict('cannot_change_self', 'You cannot disable yourself or take away your own admin role.');
    }
    const disabledAt = input.disabled === undefined ? before.disabledAt : input.disabled ? (before.disabledAt ?? new Date()) : null;
    const [after] = await tx
      .update(users)
      .set({ name: input.name ?? before.name, phone: input.phone ?? before.phone, role, clientId, disabledAt })
      .where(eq(users.id, id))
      .returning();
    // Disabling, or moving someone to another organisation or role, ends their sessions now.
    if (disabledAt || role !== before.role || clientId !== before.clientId) await revokeSessions(tx, id);
    if (disabledAt && !before.disabledAt) {
      await tx
        .update(authTokens)
        .set({ usedAt: new Date() })
        .where(and(eq(authTokens.userId, id), isNull(authTokens.usedAt)));
    }
    await recordAudit(tx, { actor, entity: 'user', entityId: id, action: 'updated', before, after });
    return getSummary(tx, id);
  });
}

const auditColumns = {
  id: auditEvents.id,
  actorId: auditEvents.actorId,
  actorName: users.name,
  entity: auditEvents.entity,
  entityId: auditEvents.entityId,
  action: auditEvents.action,
  before: auditEvents.before,
  after: auditEvents.after,
  createdAt: auditEvents.createdAt,
};

function presentAuditEvent(
  r: {
    id: number;
    actorId: string | null;
    actorName: string | null;
    entity: string;
    entityId: string;
    action: string;
    before: unknown;
    after: unknown;
    createdAt: Date;
  },
  named: NamedAuditEvent,
): AuditEventView {
  return {
    id: r.id,
    actor: r.actorId ? { id: r.actorId, name: r.actorName ?? '' } : null,
    entity: r.entity,
    entityId: r.entityId,
    record: named.record,
    action: r.action,
    before: named.before,
    after: named.after,
    references: named.references,
    createdAt: r.createdAt.toISOString(),
  };
}

export async function listAudit(query: ListAuditQuery): Promise<Page<AuditEventView>> {
  const cursor = decodeCursor(query.cursor, 2);
  const rows = await db()
    .select(auditColumns)
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(
      and(
        query.entity ? eq(auditEvents.entity, query.entity) : undefined,
        query.entityId ? eq(auditEvents.entityId, query.entityId) : undefined,
        query.actorId ? eq(auditEvents.actorId, query.actorId) : undefined,
        afterCursor(auditEvents.createdAt, auditEvents.id, cursor, 'desc'),
      ),
    )
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (r) => [r.createdAt.toISOString(), r.id]);
  const named = await nameAuditEvents(page.items);
  return { items: page.items.map((r, i) => presentAuditEvent(r, named[i])), nextCursor: page.nextCursor };
}

/** A member of the team as a picker shows them: no e-mail address, phone or password state. */
function presentStaffMember(u: Pick<typeof users.$inferSelect, 'id' | 'name' | 'role'>): StaffMember {
  return { id: u.id, name: u.name, role: u.role };
}

/**
 * The team, for pickers (assignee, technicians of a visit): active staff by name, with only
 * what a picker needs. The full user list stays the admin's.
 */
export const STAFF_CAP = 2000;

export async function listStaff(cap = STAFF_CAP): Promise<CappedList<StaffMember>> {
  const rows = await db()
    .select({ id: users.id, name: users.name, role: users.role })
    .from(users)
    .where(and(inArray(users.role, [...staffRoles]), isNull(users.disabledAt)))
    .orderBy(asc(users.name), asc(users.id))
    .limit(cap + 1);
  return capped(rows.map(presentStaffMember), cap);
}
