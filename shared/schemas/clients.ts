// The clients resource, with its contacts and the service plans a client can be on: the
// request schemas (forms and server alike), the list query and the responses.
import type { ClockMode, TicketPriority } from './enums.js';
import { z } from 'zod';
import { email, pageQuery, requiredText, sortDir, text } from './common.js';

// ---- requests ----
export const clientInput = z.object({
  name: requiredText(120),
  servicePlanId: z.uuid().nullable().optional(),
  notes: text(5000).optional(),
});
export type ClientInput = z.infer<typeof clientInput>;
export const clientPatch = clientInput.partial().extend({ archived: z.boolean().optional() });
export type ClientPatch = z.infer<typeof clientPatch>;
export const listClientsQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  sort: z.enum(['name', 'createdAt']).default('name'),
  dir: sortDir,
  archived: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
});
export type ListClientsQuery = z.infer<typeof listClientsQuery>;

export const contactInput = z.object({
  clientId: z.uuid(),
  siteId: z.uuid().nullable().optional(),
  name: requiredText(120),
  title: text(120).optional(),
  email: email
    .nullable()
    .optional()
    .or(z.literal('').transform(() => null)),
  phone: text(40).optional(),
  receivesUpdates: z.boolean().optional(),
  /** The client user this contact signs in as (a user of the same organisation), or null. */
  userId: z.uuid().nullable().optional(),
});
export type ContactInput = z.infer<typeof contactInput>;
export const contactPatch = contactInput.omit({ clientId: true }).partial();
export type ContactPatch = z.infer<typeof contactPatch>;

// ---- responses ----

export interface ServicePlan {
  id: string;
  name: string;
  clockMode: ClockMode;
  /** ISO weekdays (1 = Monday … 7 = Sunday). */
  businessDays: number[];
  dayStart: string;
  dayEnd: string;
  targets: Record<TicketPriority, { responseHours: number; resolutionHours: number }>;
}

export interface ClientSummary {
  id: string;
  name: string;
  servicePlan: { id: string; name: string } | null;
  siteCount: number;
  wallCount: number;
  openTicketCount: number;
  archived: boolean;
  createdAt: string;
}

export interface Contact {
  id: string;
  clientId?: string;
  siteId: string | null;
  name: string;
  title: string;
  email: string | null;
  phone: string;
  receivesUpdates: boolean;
  /** The client user this contact signs in as; their sign-in address may differ from `email`. */
  userId: string | null;
}

/** A client user a contact can be linked to (staff only). */
export interface ClientUserOption {
  id: string;
  name: string;
  email: string;
}

export interface ClientSite {
  id: string;
  name: string;
  city: string;
  region: string;
  timeZone: string;
  wallCount: number;
}

export interface ClientDetail {
  id: string;
  name: string;
  servicePlan: ServicePlan | null;
  /** Staff only: client users never receive it. */
  notes?: string;
  archived: boolean;
  contacts: Contact[];
  /** Staff only: the organisation's user accounts, for a contact's "Signs in as". */
  users?: ClientUserOption[];
  sites: ClientSite[];
  createdAt: string;
}

/** A client as a filter's or a form's choice. */
export interface ClientOption {
  id: string;
  name: string;
}
