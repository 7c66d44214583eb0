// The clients resource (with its contacts and the service plans it can be on): what the API
// answers with. Request schemas: register.ts, until the register's contracts are split.
import type { ClockMode, TicketPriority } from './enums.js';

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
  sites: ClientSite[];
  createdAt: string;
}

/** A client as a filter's or a form's choice. */
export interface ClientOption {
  id: string;
  name: string;
}
