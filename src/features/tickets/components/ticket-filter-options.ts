import { ticketPriorities, ticketStatuses } from '@shared/schemas/enums';
import { priorityGuidance, statusLabels } from '@shared/schemas/tickets';
import type { SelectOption } from '@/components/ui/select-field';

export const statusFilterOptions: SelectOption[] = [
  { value: 'open', label: 'All open' },
  { value: 'done', label: 'Resolved or closed' },
  ...ticketStatuses.map((s) => ({ value: s, label: s === 'waiting_client' ? 'Waiting for client' : statusLabels[s] })),
];

export const priorityFilterOptions: SelectOption[] = ticketPriorities.map((p) => ({ value: p, label: priorityGuidance[p].label }));

export const clockFilterOptions: SelectOption[] = [
  { value: 'at_risk,breached', label: 'At risk or breached' },
  { value: 'on_track', label: 'On track' },
  { value: 'at_risk', label: 'At risk' },
  { value: 'breached', label: 'Breached' },
  { value: 'paused', label: 'Paused' },
];
