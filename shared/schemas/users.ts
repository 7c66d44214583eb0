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

/** One change in the audit log (`GET /api/audit`), newest first. */
export interface AuditEventView {
  id: number;
  /** null for the system (a link redeemed, a job). */
  actor: { id: string; name: string } | null;
  entity: string;
  entityId: string;
  action: string;
  /** The changed fields only, before and after (secrets left out). */
  before: unknown;
  after: unknown;
  createdAt: string;
}
