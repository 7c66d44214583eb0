// The sites resource: what the API answers with.
import type { Mounting } from './enums.js';

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
