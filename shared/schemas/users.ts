// The users resource (accounts, the staff list for pickers) and the audit log: list queries and
// what the API answers with. Invite and update requests are in auth.ts.
import { z } from 'zod';
import { pageQuery } from './common.js';
import { roles, type Role } from './enums.js';

export const listUsersQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  role: z.enum(roles).optional(),
  clientId: z.uuid().optional(),
});
export type ListUsersQuery = z.infer<typeof listUsersQuery>;

export const listAuditQuery = pageQuery.extend({
  entity: z.string().trim().max(40).optional(),
  entityId: z.string().trim().max(80).optional(),
  actorId: z.uuid().optional(),
});
export type ListAuditQuery = z.infer<typeof listAuditQuery>;

/** A person with an account, as the admin's users list shows them (`GET /api/users`). */
export interface UserSummary {
  id: string;
  email: string;
  name: string;
  role: Role;
  clientId: string | null;
  clientName: string | null;
  phone: string;
  disabled: boolean;
  /** Invited, no password set yet. */
  invitePending: boolean;
  lastSignInAt: string | null;
  createdAt: string;
}

/** Active staff for the assignee and visit pickers (`GET /api/staff`): only what a picker needs. */
export interface StaffMember {
  id: string;
  name: string;
  role: Role;
}

/** Where a record of the log is seen in the app; the client turns it into an address. */
export type AuditRecordPage =
  | { kind: 'client' | 'site' | 'wall' | 'ticket' | 'visit' | 'part' | 'stock_location'; id: string }
  | { kind: 'cabinet'; serial: string }
  | { kind: 'user'; email: string }
  | { kind: 'catalogue'; tab: 'models' | 'controllers' }
  | { kind: 'vendor_returns' };

/** A record as people know it, for the audit log. */
export interface AuditRecordRef {
  /** A client's or site's name, a cabinet's serial, a ticket's reference, a part's SKU and name… */
  name: string;
  /** What places it when the name alone may not (a wall's site, a cabinet's wall and cell), or null. */
  context: string | null;
  /** Its page, or null when it has none or no longer exists. */
  page: AuditRecordPage | null;
}

/** One change in the audit log (`GET /api/audit`), newest first. */
export interface AuditEventView {
  id: number;
  /** null for the system (a link redeemed, a job). */
  actor: { id: string; name: string } | null;
  entity: string;
  entityId: string;
  /** The record by name, with its page; null when nothing names it any more. */
  record: AuditRecordRef | null;
  action: string;
  /** The changed fields only, before and after (secrets and the record's own id and times left out). */
  before: unknown;
  after: unknown;
  /** The records the changed fields point at (a wall id, a technician's id), by id. */
  references: Record<string, AuditRecordRef>;
  createdAt: string;
}
