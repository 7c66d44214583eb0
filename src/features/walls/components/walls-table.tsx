import { createColumnHelper, type SortingState } from '@tanstack/react-table';
import { Grid3x3 } from 'lucide-react';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch } from '@/components/ui/filters';
import { paths } from '@/config/paths';
import type { WallFilters } from '@/resources/walls';
import type { WallSummary } from '@shared/schemas/walls';
import { PlaceFilters, type PlaceFilterOptions } from '@/components/ui/place-filters';
import { mountingLabels } from '@/features/walls/components/wall-labels';
import { formatDate } from '@/lib/format';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';

const column = createColumnHelper<WallSummary>();

interface WallsTableProps {
  filters: WallFilters;
  onFiltersChange: (filters: WallFilters) => void;
  filterOptions: Partial<PlaceFilterOptions>;
  emptyAction?: ReactNode;
}

/** How full a wall is: cabinets installed and positions still free (columns × rows − installed). */
function Positions({ wall }: { wall: WallSummary }) {
  return (
    <span className="whitespace-nowrap tabular-nums" title={`${wall.cabinetCount} positions (${wall.columns} × ${wall.rows})`}>
      {wall.installedCabinets} filled
      <span className="text-stone-400"> · </span>
      <span className={wall.freePositions > 0 ? 'font-medium text-ink-800' : 'text-stone-500'}>{wall.freePositions} free</span>
    </span>
  );
}

/** Every wall of the register, filtered by client, site and cabinet model; search by name. */
export function WallsTable({ filters, onFiltersChange, filterOptions, emptyAction }: WallsTableProps) {
  const query = useInfiniteQuery({ ...wallQueries.list(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Wall',
        enableSorting: true,
        meta: { alwaysVisible: true, className: 'min-w-[12rem]' },
        cell: (c) => (
          <Link to={paths.wall.getHref(c.row.original.id)} className="font-medium text-ink-800 hover:underline">
            {c.getValue()}
          </Link>
        ),
      }),
      column.accessor('clientName', { header: 'Client' }),
      column.accessor('siteName', {
        header: 'Site',
        cell: (c) => (
          <Link to={paths.site.getHref(c.row.original.siteId)} className="text-stone-800 hover:underline">
            {c.getValue()}
          </Link>
        ),
      }),
      column.accessor((w) => w.cabinetModel.name, { id: 'model', header: 'Cabinet model' }),
      column.accessor((w) => `${w.columns} × ${w.rows}`, {
        id: 'grid',
        header: 'Grid',
        meta: { align: 'right' },
        cell: (c) => <span className="tabular-nums">{c.getValue()}</span>,
      }),
      column.accessor('installedCabinets', {
        id: 'positions',
        header: 'Positions',
        meta: {
          align: 'right',
          csv: (w) => `${w.installedCabinets} filled, ${w.freePositions} free`,
        },
        cell: (c) => <Positions wall={c.row.original} />,
      }),
      column.accessor('cabinetCount', { header: 'All positions', meta: { align: 'right', hiddenByDefault: true } }),
      column.accessor((w) => w.cabinetModel.pixelPitchMm, {
        id: 'pitch',
        header: 'Pitch',
        meta: { align: 'right', csv: (w) => w.cabinetModel.pixelPitchMm },
        cell: (c) => `${c.getValue()} mm`,
      }),
      column.accessor('mounting', {
        header: 'Mounting',
        meta: { hiddenByDefault: true, csv: (w) => mountingLabels[w.mounting] },
        cell: (c) => mountingLabels[c.getValue()],
      }),
      column.accessor('installDate', { header: 'Installed', meta: { hiddenByDefault: true }, cell: (c) => formatDate(c.getValue()) }),
      column.accessor('warrantyEnd', {
        header: 'Warranty ends',
        meta: { hiddenByDefault: true },
        cell: (c) => formatDate(c.getValue()),
      }),
      column.accessor('openTicketCount', {
        header: 'Open tickets',
        meta: { align: 'right' },
        cell: (c) => (c.getValue() > 0 ? <Badge tone="amber">{c.getValue()}</Badge> : <span className="text-stone-500">0</span>),
      }),
    ],
    [],
  );

  const sorting: SortingState = [{ id: filters.sort ?? 'name', desc: filters.dir === 'desc' }];
  const filtered = Boolean(filters.q || filters.clientId || filters.siteId || filters.cabinetModelId);

  return (
    <DataTable
      tableId="walls"
      label="Walls"
      columns={columns}
      data={rows}
      getRowId={(w) => w.id}
      {...pagedQueryProps(query)}
      sorting={sorting}
      onSortingChange={(next) => {
        const first = next[0];
        if (first) onFiltersChange({ ...filters, sort: first.id === 'name' ? 'name' : 'createdAt', dir: first.desc ? 'desc' : 'asc' });
      }}
      toolbar={
        <>
          <FilterSearch
            label="Search"
            placeholder="Wall, site or client"
            value={filters.q ?? ''}
            onChange={(q) => onFiltersChange({ ...filters, q: q || undefined })}
          />
          <PlaceFilters
            options={filterOptions}
            values={{ clientId: filters.clientId, siteId: filters.siteId, modelId: filters.cabinetModelId }}
            onChange={({ clientId, siteId, modelId }) => onFiltersChange({ ...filters, clientId, siteId, cabinetModelId: modelId })}
          />
        </>
      }
      empty={
        <EmptyState
          icon={Grid3x3}
          title={filtered ? 'No wall matches these filters' : 'No walls yet'}
          description={filtered ? 'Try another name, or clear the filters.' : 'Walls are added from a site’s page.'}
          action={filtered ? undefined : emptyAction}
        />
      }
    />
  );
}
