import { z } from 'zod';
import { pageQuery } from './common.js';
import { roles } from './enums.js';

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
