import { createColumnHelper, type SortingState } from '@tanstack/react-table';
import { Building2 } from 'lucide-react';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import { paths } from '@/config/paths';
import type { ClientFilters } from '@/resources/clients';
import type { ClientSummary } from '@shared/schemas/clients';
import { formatDate } from '@/lib/format';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { clientQueries } from '@/resources/clients';

const column = createColumnHelper<ClientSummary>();

const archivedOptions = [{ value: 'true', label: 'Archived' }];

interface ClientsTableProps {
  filters: ClientFilters;
  onFiltersChange: (filters: ClientFilters) => void;
  /** Shown in the empty state when there are no clients at all (office: "Add client"). */
  emptyAction?: ReactNode;
}

/** Client organisations: search and sort on the server, "load more", column chooser, CSV. */
export function ClientsTable({ filters, onFiltersChange, emptyAction }: ClientsTableProps) {
  const query = useInfiniteQuery({ ...clientQueries.list(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Client',
        enableSorting: true,
        meta: { alwaysVisible: true, className: 'min-w-[12rem]' },
        cell: (c) => (
          <Link to={paths.client.getHref(c.row.original.id)} className="font-medium text-ink-800 hover:underline">
            {c.getValue()}
            {c.row.original.archived ? (
              <Badge className="ml-2" tone="neutral">
                Archived
              </Badge>
            ) : null}
          </Link>
        ),
      }),
      column.accessor((c) => c.servicePlan?.name ?? '', {
        id: 'servicePlan',
        header: 'Service plan',
        cell: (c) => c.getValue() || <span className="text-stone-400">None</span>,
      }),
      column.accessor('siteCount', { header: 'Sites', meta: { align: 'right' } }),
      column.accessor('wallCount', { header: 'Walls', meta: { align: 'right' } }),
      column.accessor('openTicketCount', {
        header: 'Open tickets',
        meta: { align: 'right' },
        cell: (c) => (c.getValue() > 0 ? <Badge tone="amber">{c.getValue()}</Badge> : <span className="text-stone-500">0</span>),
      }),
      column.accessor('createdAt', {
        header: 'Added',
        enableSorting: true,
        meta: { hiddenByDefault: true, csv: (c) => c.createdAt.slice(0, 10) },
        cell: (c) => formatDate(c.getValue()),
      }),
    ],
    [],
  );

  const sorting: SortingState = [{ id: filters.sort ?? 'name', desc: filters.dir === 'desc' }];
  const filtered = Boolean(filters.q || filters.archived);

  return (
    <DataTable
      tableId="clients"
      label="Client organisations"
      columns={columns}
      data={rows}
      getRowId={(c) => c.id}
      {...pagedQueryProps(query)}
      sorting={sorting}
      onSortingChange={(next) => {
        const first = next[0];
        if (!first) return;
        onFiltersChange({ ...filters, sort: first.id === 'createdAt' ? 'createdAt' : 'name', dir: first.desc ? 'desc' : 'asc' });
      }}
      toolbar={
        <>
          <FilterSearch
            label="Search"
            placeholder="Client name"
            value={filters.q ?? ''}
            onChange={(q) => onFiltersChange({ ...filters, q: q || undefined })}
          />
          <FilterSelect
            label="Show"
            anyLabel="Active"
            options={archivedOptions}
            value={filters.archived ? 'true' : ''}
            onChange={(v) => onFiltersChange({ ...filters, archived: v === 'true' || undefined })}
          />
        </>
      }
      empty={
        <EmptyState
          icon={Building2}
          title={filtered ? 'No client matches' : 'No clients yet'}
          description={filtered ? 'Try another name, or clear the search.' : 'Clients are the organisations whose walls you look after.'}
          action={filtered ? undefined : emptyAction}
        />
      }
    />
  );
}
