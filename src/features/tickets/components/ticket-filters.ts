import { ticketPriorities, ticketStatuses } from '@shared/schemas/enums';
import { ticketClockStates } from '@shared/schemas/tickets';
import type { TicketFilters } from '@/resources/tickets';
import { isRecordId } from '@/lib/record-id';

/** Keeps only the values of a comma-separated list that the API knows. */
const csvOf = (value: string | null, allowed: readonly string[]) => {
  const kept = (value ?? '').split(',').filter((v) => allowed.includes(v));
  return kept.length ? kept.join(',') : undefined;
};
const idOf = (value: string | null) => (value && isRecordId(value) ? value : undefined);

export const filterKeys = [
  'status',
  'open',
  'priority',
  'clock',
  'clientId',
  'siteId',
  'wallId',
  'assigneeId',
  'q',
  'sort',
  'dir',
] as const;

/**
 * `open=all` in the address: every ticket, closed ones included. Without `open` or `status` the
 * list shows the open tickets, which is what a desk works from.
 */
export const everyTicket = 'all';

/**
 * The list's filters from the address. Unknown or malformed values are dropped, so a pasted or
 * old link still opens the list rather than an error.
 */
export function filtersFromParams(params: URLSearchParams): TicketFilters {
  const status = csvOf(params.get('status'), ticketStatuses);
  const open = params.get('open') ?? (status ? null : 'true');
  const sort = params.get('sort');
  const dir = params.get('dir');
  const assignee = params.get('assigneeId');
  return {
    status,
    open: open === 'true' || open === 'false' ? open : undefined,
    priority: csvOf(params.get('priority'), ticketPriorities),
    clock: csvOf(params.get('clock'), ticketClockStates),
    clientId: idOf(params.get('clientId')),
    siteId: idOf(params.get('siteId')),
    wallId: idOf(params.get('wallId')),
    assigneeId: assignee === 'me' || assignee === 'none' ? assignee : idOf(assignee),
    q: params.get('q')?.trim().slice(0, 100) || undefined,
    sort: sort === 'createdAt' || sort === 'resolutionDueAt' || sort === 'updatedAt' ? sort : undefined,
    dir: dir === 'asc' || dir === 'desc' ? dir : undefined,
  };
}

/**
 * The filters as a plain object of strings (the address, and what a saved view stores), leaving
 * out empty ones; no status filter at all is written `open=all`, as an empty one means open.
 */
export function filtersToRecord(filters: TicketFilters): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of filterKeys) {
    const value = filters[key];
    if (value) out[key] = value;
  }
  if (!filters.open && !filters.status) out.open = everyTicket;
  return out;
}

export const sameFilters = (a: TicketFilters, b: TicketFilters) => {
  const ra = filtersToRecord(a);
  const rb = filtersToRecord(b);
  const keys = new Set([...Object.keys(ra), ...Object.keys(rb)]);
  return [...keys].every((k) => ra[k] === rb[k]);
};

export const hasAnyFilter = (f: TicketFilters) =>
  Boolean(f.status || f.open || f.priority || f.clock || f.clientId || f.siteId || f.wallId || f.assigneeId || f.q);

/**
 * The status filter is one select: "open", "done" (resolved or closed) or one status. It maps
 * onto the API's `open` and `status` parameters.
 */
export function statusChoiceOf(f: TicketFilters): string {
  if (f.status) return f.status;
  if (f.open === 'true') return 'open';
  if (f.open === 'false') return 'done';
  return '';
}

export function withStatusChoice(f: TicketFilters, choice: string): TicketFilters {
  const rest = { ...f, status: undefined, open: undefined };
  if (choice === 'open') return { ...rest, open: 'true' };
  if (choice === 'done') return { ...rest, open: 'false' };
  return { ...rest, status: choice || undefined };
}
