// The sites resource: request schemas, the list query and the responses.
import type { Mounting } from './enums.js';
import { z } from 'zod';
import { optionalId, pageQuery, requiredText, sortDir, text, timeZone } from './common.js';

// ---- requests ----
export const siteInput = z.object({
  clientId: z.uuid(),
  name: requiredText(120),
  address: text(300).optional(),
  city: text(120).optional(),
  region: text(120).optional(),
  postalCode: text(20).optional(),
  country: text(80).optional(),
  timeZone,
  accessNotes: text(5000).optional(),
  internalNotes: text(5000).optional(),
});
export type SiteInput = z.infer<typeof siteInput>;
export const sitePatch = siteInput.omit({ clientId: true }).partial().extend({ archived: z.boolean().optional() });
export type SitePatch = z.infer<typeof sitePatch>;
export const listSitesQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  clientId: optionalId,
  sort: z.enum(['name', 'city', 'createdAt']).default('name'),
  dir: sortDir,
});
export type ListSitesQuery = z.infer<typeof listSitesQuery>;

// ---- responses ----

export interface SiteSummary {
  id: string;
  clientId: string;
  clientName: string;
  name: string;
  city: string;
  region: string;
  country: string;
  timeZone: string;
  wallCount: number;
  createdAt: string;
}

export interface SiteContact {
  id: string;
  name: string;
  title: string;
  email: string | null;
  phone: string;
  /** null: a contact of the whole organisation, shown on every site. */
  siteId: string | null;
  receivesUpdates: boolean;
}

export interface SiteDetail {
  id: string;
  clientId: string;
  clientName: string;
  name: string;
  address: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  timeZone: string;
  accessNotes: string;
  /** Staff only. */
  internalNotes?: string;
  archived: boolean;
  contacts: SiteContact[];
  walls: { id: string; name: string; columns: number; rows: number; mounting: Mounting }[];
}
