import type { TicketPriority, TicketStatus } from '@shared/schemas/enums';
import type { TicketClockState } from '@shared/schemas/tickets';

/** The fields of a ticket list row (`GET /api/tickets`) the board shows. */
export interface BoardTicket {
  id: string;
  ref: string;
  title: string;
  status: TicketStatus;
  priority: TicketPriority;
  client: { id: string; name: string };
  site: { id: string; name: string };
  wall: { id: string; name: string } | null;
  assignee: { id: string; name: string } | null;
  responseDueAt: string | null;
  resolutionDueAt: string | null;
  clockState: TicketClockState | null;
  createdAt: string;
}
