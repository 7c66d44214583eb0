import { createColumnHelper, type SortingState } from '@tanstack/react-table';
import { MapPin } from 'lucide-react';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import type { SelectOption } from '@/components/ui/select-field';
import { paths } from '@/config/paths';
import type { SiteFilters } from '@/resources/sites';
import type { SiteSummary } from '@shared/schemas/sites';
import { formatDate } from '@/lib/format';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { siteQueries } from '@/resources/sites';

const column = createColumnHelper<SiteSummary>();
const sortable = ['name', 'city', 'createdAt'] as const;
type SiteSort = (typeof sortable)[number];

interface SitesTableProps {
  filters: SiteFilters;
  onFiltersChange: (filters: SiteFilters) => void;
  /** Staff see each site's client; client users have one organisation. */
  staff: boolean;
  /** Choices of the client filter; without them the filter is not shown (client users have one organisation). */
  clientOptions?: SelectOption[];
}

/** Every site of the register: search by site, city or client; sort by name, city or date added. */
export function SitesTable({ filters, onFiltersChange, staff, clientOptions }: SitesTableProps) {
  const query = useInfiniteQuery({ ...siteQueries.list(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Site',
        enableSorting: true,
        meta: { alwaysVisible: true, className: 'min-w-[12rem]' },
        cell: (c) => (
          <Link to={paths.site.getHref(c.row.original.id)} className="font-medium text-ink-800 hover:underline">
            {c.getValue()}
          </Link>
        ),
      }),
      ...(staff ? [column.accessor('clientName', { header: 'Client' })] : []),
      column.accessor('city', { header: 'City', enableSorting: true, cell: (c) => c.getValue() || '—' }),
      column.accessor('region', { header: 'Region', cell: (c) => c.getValue() || '—' }),
      column.accessor('country', { header: 'Country', cell: (c) => c.getValue() || '—' }),
      column.accessor('timeZone', { header: 'Time zone', meta: { hiddenByDefault: true } }),
      column.accessor('wallCount', { header: 'Walls', meta: { align: 'right' } }),
      column.accessor('createdAt', {
        header: 'Added',
        enableSorting: true,
        meta: { hiddenByDefault: true, csv: (s) => s.createdAt.slice(0, 10) },
        cell: (c) => formatDate(c.getValue()),
      }),
    ],
    [staff],
  );

  const sorting: SortingState = [{ id: filters.sort ?? 'name', desc: filters.dir === 'desc' }];
  const filtered = Boolean(filters.q || filters.clientId);

  return (
    <DataTable
      tableId="sites"
      label="Sites"
      columns={columns}
      data={rows}
      getRowId={(s) => s.id}
      {...pagedQueryProps(query)}
      sorting={sorting}
      onSortingChange={(next) => {
        const first = next[0];
        const sort = sortable.find((s) => s === first?.id) as SiteSort | undefined;
        if (first && sort) onFiltersChange({ ...filters, sort, dir: first.desc ? 'desc' : 'asc' });
      }}
      toolbar={
        <>
          <FilterSearch
            label="Search"
            placeholder={staff ? 'Site, city or client' : 'Site or city'}
            value={filters.q ?? ''}
            onChange={(q) => onFiltersChange({ ...filters, q: q || undefined })}
          />
          {clientOptions && clientOptions.length > 1 ? (
            <FilterSelect
              label="Client"
              anyLabel="All clients"
              options={clientOptions}
              value={filters.clientId ?? ''}
              onChange={(v) => onFiltersChange({ ...filters, clientId: v || undefined })}
            />
          ) : null}
        </>
      }
      empty={
        <EmptyState
          icon={MapPin}
          title={filtered ? 'No site matches these filters' : 'No sites yet'}
          description={filtered ? 'Try another name or city, or clear the filters.' : 'Sites are added from a client’s page.'}
        />
      }
    />
  );
}
