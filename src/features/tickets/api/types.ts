import type {
  CommentVisibility,
  RemovedPartFate,
  RepairAction,
  RepairComponent,
  RepairFault,
  Role,
  TicketPriority,
  TicketScope,
  TicketStatus,
  VisitStatus,
} from '@shared/schemas/enums';
import type { Position } from '@shared/schemas/register';
import type { TicketClockState } from '@shared/schemas/tickets';

// The shapes the tickets API answers with (server/services/tickets.ts presenters).

export interface NamedRef {
  id: string;
  name: string;
}

export interface TicketListItem {
  id: string;
  number: number;
  ref: string;
  title: string;
  status: TicketStatus;
  priority: TicketPriority;
  scope: TicketScope;
  cellCount: number;
  client: NamedRef;
  site: NamedRef;
  wall: NamedRef | null;
  assignee: NamedRef | null;
  reporterName: string | null;
  responseDueAt: string | null;
  resolutionDueAt: string | null;
  clockState: TicketClockState | null;
  createdAt: string;
  updatedAt: string;
}

export interface TicketVisit {
  id: string;
  status: VisitStatus;
  kind: 'ticket' | 'maintenance';
  windowStart: string;
  windowEnd: string;
}

/** One line of work done for the ticket. `notes`, `part` and `removedPartFate` come to staff only. */
export interface TicketRepair {
  id: string;
  column: number;
  row: number;
  position: string;
  module: Position | null;
  component: RepairComponent;
  fault: RepairFault;
  action: RepairAction;
  cabinetSerial: string | null;
  technicianName: string | null;
  performedAt: string;
  notes?: string;
  part?: { name: string; batch: string | null } | null;
  removedPartFate?: RemovedPartFate;
}

export interface TicketDetail extends TicketListItem {
  description: string;
  /** The site's IANA time zone: due times and visit windows are shown in the site's local time. */
  siteTimeZone: string;
  cells: Position[];
  cellLabels: string[];
  wall: (NamedRef & { columns: number; rows: number }) | null;
  mergedInto: { id: string; ref: string } | null;
  acknowledgedAt: string | null;
  resolvedAt: string | null;
  closedAt: string | null;
  pausedAt: string | null;
  clocks: { response: TicketClockState | null; resolution: TicketClockState | null };
  visits: TicketVisit[];
  repairs: TicketRepair[];
  nextStatuses: TicketStatus[];
}

export interface TicketComment {
  id: string;
  body: string;
  visibility: CommentVisibility;
  author: { name: string; role: Role | null; staff: boolean };
  createdAt: string;
}

export interface TicketAttachment {
  id: string;
  kind: 'photo' | 'video' | 'document';
  fileName: string;
  contentType: string;
  sizeBytes: number;
  internal: boolean;
  uploadedByName: string | null;
  createdAt: string;
  url: string;
}

export interface SavedTicketView {
  id: string;
  name: string;
  filters: Record<string, string>;
}

export interface StaffMember {
  id: string;
  name: string;
  role: Role;
}

/** A site to open a ticket at (from `GET /api/sites`). */
export interface SiteOption {
  id: string;
  name: string;
  clientId: string;
  clientName: string;
  city: string;
  timeZone: string;
  wallCount: number;
}

/** A wall at a site (from `GET /api/walls?siteId=`). */
export interface WallOption {
  id: string;
  name: string;
  siteId: string;
  columns: number;
  rows: number;
  cabinetCount: number;
  openTicketCount: number;
}

/** A cabinet in a wall's grid (from `GET /api/walls/:id/cabinets`). */
export interface WallCabinet {
  id: string;
  serial: string;
  column: number;
  row: number;
  status: 'installed' | 'spare' | 'at_bench' | 'returned_to_vendor' | 'retired';
  openTickets: number;
}
