import { priorityGuidance, type TicketListItem } from '@shared/schemas/tickets';
import { keepPreviousData, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { SortingState } from '@tanstack/react-table';
import { createColumnHelper } from '@tanstack/react-table';
import { Ticket } from 'lucide-react';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import { paths } from '@/config/paths';
import { clockFilterOptions, priorityFilterOptions, statusFilterOptions } from '@/features/tickets/components/ticket-filter-options';
import { hasAnyFilter, statusChoiceOf, withStatusChoice } from '@/features/tickets/components/ticket-filters';
import { ClockBadge, clockLabels, PriorityBadge, statusText, TicketStatusBadge } from '@/features/tickets/components/ticket-status';
import { formatAgo, formatDateTime } from '@/lib/format';
import { clientQueries } from '@/resources/clients';
import { siteQueries } from '@/resources/sites';
import { ticketQueries, type TicketFilters } from '@/resources/tickets';
import { userQueries } from '@/resources/users';
import { wallQueries } from '@/resources/walls';

const column = createColumnHelper<TicketListItem>();

interface TicketsTableProps {
  filters: TicketFilters;
  onFiltersChange: (filters: TicketFilters) => void;
}

const dash = <span className="text-stone-400">—</span>;

/** The list's columns: what each ticket row shows, and what the CSV export writes. */
const columns = [
  column.accessor('ref', {
    header: 'Ticket',
    meta: { alwaysVisible: true, className: 'w-px whitespace-nowrap' },
    cell: (c) => (
      <Link to={paths.ticket.getHref(c.row.original.id)} className="font-mono text-sm font-medium text-ink-700 hover:underline">
        {c.getValue()}
      </Link>
    ),
  }),
  column.accessor('title', {
    header: 'Title',
    meta: { alwaysVisible: true, className: 'min-w-[14rem]' },
    cell: (c) => (
      <Link to={paths.ticket.getHref(c.row.original.id)} className="font-medium text-ink-950 hover:text-ink-700 hover:underline">
        {c.getValue()}
      </Link>
    ),
  }),
  column.accessor('status', {
    header: 'Status',
    meta: { csv: (t) => statusText(t.status, false) },
    cell: (c) => <TicketStatusBadge status={c.getValue()} />,
  }),
  column.accessor('priority', {
    header: 'Priority',
    meta: { csv: (t) => priorityGuidance[t.priority].label },
    cell: (c) => <PriorityBadge priority={c.getValue()} />,
  }),
  column.accessor('clockState', {
    header: 'Clock',
    meta: { csv: (t) => (t.clockState ? clockLabels[t.clockState] : '') },
    cell: (c) => <ClockBadge state={c.getValue()} what="Service-plan clock" />,
  }),
  column.accessor((t) => t.client.name, {
    id: 'client',
    header: 'Client',
    meta: { className: 'min-w-[11rem]' },
    cell: ({ row: { original: t } }) => (
      <>
        <span className="block text-stone-900">{t.client.name}</span>
        <span className="block text-xs text-stone-600">
          {t.site.name}
          {t.wall ? ` · ${t.wall.name}` : ''}
        </span>
      </>
    ),
  }),
  column.accessor((t) => t.site.name, { id: 'site', header: 'Site', meta: { hiddenByDefault: true } }),
  column.accessor((t) => t.wall?.name ?? '', {
    id: 'wall',
    header: 'Wall',
    meta: { hiddenByDefault: true },
    cell: (c) => c.getValue() || dash,
  }),
  column.accessor('cellCount', {
    header: 'Cells',
    meta: { hiddenByDefault: true, align: 'right' },
    cell: (c) => c.getValue() || dash,
  }),
  column.accessor((t) => t.assignee?.name ?? '', {
    id: 'assignee',
    header: 'Assignee',
    cell: (c) => c.getValue() || <span className="text-stone-500">Unassigned</span>,
  }),
  column.accessor('reporterName', { header: 'Reported by', meta: { hiddenByDefault: true }, cell: (c) => c.getValue() ?? dash }),
  column.accessor('createdAt', {
    header: 'Opened',
    enableSorting: true,
    meta: { className: 'whitespace-nowrap' },
    cell: (c) => <span title={formatDateTime(c.getValue())}>{formatAgo(c.getValue())}</span>,
  }),
  column.accessor('resolutionDueAt', {
    header: 'Resolve by',
    enableSorting: true,
    meta: { className: 'whitespace-nowrap' },
    cell: (c) => (c.getValue() ? <span title={formatDateTime(c.getValue())}>{formatAgo(c.getValue())}</span> : dash),
  }),
  column.accessor('updatedAt', {
    header: 'Updated',
    enableSorting: true,
    meta: { hiddenByDefault: true, className: 'whitespace-nowrap' },
    cell: (c) => <span title={formatDateTime(c.getValue())}>{formatAgo(c.getValue())}</span>,
  }),
];

/** The office's list of every ticket: filters in the address, server-side sort, keyset pages. */
export function TicketsTable({ filters, onFiltersChange }: TicketsTableProps) {
  const query = useInfiniteQuery({ ...ticketQueries.list(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);
  const sorting: SortingState = [{ id: filters.sort ?? 'createdAt', desc: (filters.dir ?? 'desc') === 'desc' }];

  return (
    <DataTable
      tableId="tickets"
      label="Service tickets"
      columns={columns}
      data={rows}
      getRowId={(t) => t.id}
      {...pagedQueryProps(query)}
      sorting={sorting}
      onSortingChange={(next) => {
        const first = next[0];
        if (!first) return;
        onFiltersChange({ ...filters, sort: first.id as TicketFilters['sort'], dir: first.desc ? 'desc' : 'asc' });
      }}
      toolbar={<TicketFilterBar filters={filters} onFiltersChange={onFiltersChange} />}
      empty={
        <EmptyState
          icon={Ticket}
          title={hasAnyFilter(filters) ? 'No tickets match these filters' : 'No tickets yet'}
          description={
            hasAnyFilter(filters) ? 'Try other filters, or clear them.' : 'Tickets opened by clients or by the office appear here.'
          }
        />
      }
    />
  );
}

/** The list's search and filters: status, priority, clock, assignee, and the place (client, site, wall). */
function TicketFilterBar({ filters, onFiltersChange }: TicketsTableProps) {
  const clients = useQuery(clientQueries.options());
  const sites = useQuery(siteQueries.options());
  const walls = useQuery({ ...wallQueries.page({ siteId: filters.siteId }), enabled: Boolean(filters.siteId) });
  const staff = useQuery(userQueries.staff());
  const siteChoices = (sites.data?.items ?? [])
    .filter((s) => !filters.clientId || s.clientId === filters.clientId)
    .map((s) => ({ value: s.id, label: filters.clientId ? s.name : `${s.name} (${s.clientName})` }));
  const set = (patch: Partial<TicketFilters>) => onFiltersChange({ ...filters, ...patch });
  return (
    <>
      <FilterSearch
        label="Search"
        placeholder="Title or number (1041/26)"
        value={filters.q ?? ''}
        onChange={(q) => set({ q: q || undefined })}
      />
      <FilterSelect
        label="Status"
        anyLabel="Any status"
        options={statusFilterOptions}
        value={statusChoiceOf(filters)}
        onChange={(v) => onFiltersChange(withStatusChoice(filters, v))}
      />
      <FilterSelect
        label="Priority"
        anyLabel="Any priority"
        options={priorityFilterOptions}
        value={filters.priority ?? ''}
        onChange={(v) => set({ priority: v || undefined })}
      />
      <FilterSelect
        label="Clock"
        anyLabel="Any clock state"
        options={clockFilterOptions}
        value={filters.clock ?? ''}
        onChange={(v) => set({ clock: v || undefined })}
      />
      <FilterSelect
        label="Assignee"
        anyLabel="Anyone"
        options={[
          { value: 'me', label: 'Me' },
          { value: 'none', label: 'Unassigned' },
          ...(staff.data?.items ?? []).map((u) => ({ value: u.id, label: u.name })),
        ]}
        value={filters.assigneeId ?? ''}
        onChange={(v) => set({ assigneeId: v || undefined })}
      />
      <FilterSelect
        label="Client"
        anyLabel="All clients"
        options={(clients.data ?? []).map((c) => ({ value: c.id, label: c.name }))}
        value={filters.clientId ?? ''}
        onChange={(v) => set({ clientId: v || undefined, siteId: undefined, wallId: undefined })}
      />
      <FilterSelect
        label="Site"
        anyLabel="All sites"
        options={siteChoices}
        value={filters.siteId ?? ''}
        onChange={(v) => set({ siteId: v || undefined, wallId: undefined })}
      />
      {filters.siteId ? (
        <FilterSelect
          label="Wall"
          anyLabel="All walls"
          options={(walls.data?.items ?? []).map((w) => ({ value: w.id, label: w.name }))}
          value={filters.wallId ?? ''}
          onChange={(v) => set({ wallId: v || undefined })}
        />
      ) : null}
    </>
  );
}
