import { createColumnHelper, type SortingState } from '@tanstack/react-table';
import { Square } from 'lucide-react';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { cellLabel } from '@shared/calc/grid';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import { paths } from '@/config/paths';
import type { CabinetFilters } from '@/resources/cabinets';
import type { CabinetSummary } from '@shared/schemas/cabinets';
import { CabinetStatusPill, cabinetStatusLabels, cabinetStatusOptions } from '@/features/cabinets/components/cabinet-status';
import { PlaceFilters, type PlaceFilterOptions } from '@/components/ui/place-filters';
import { formatDate } from '@/lib/format';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { cabinetQueries } from '@/resources/cabinets';

const column = createColumnHelper<CabinetSummary>();
const sortable = ['serial', 'batch', 'installedOn'] as const;
type CabinetSort = (typeof sortable)[number];

const position = (c: CabinetSummary) => (c.column && c.row ? cellLabel({ column: c.column, row: c.row }) : null);
const none = <span className="text-stone-500">—</span>;

interface CabinetsTableProps {
  filters: CabinetFilters;
  onFiltersChange: (filters: CabinetFilters) => void;
  /** Staff see each cabinet's client and where spares are kept; client users have one organisation and no stock. */
  staff: boolean;
  filterOptions: Partial<PlaceFilterOptions>;
}

/**
 * Every cabinet of the register, on a wall or in stock: find one by serial prefix, or all of one
 * production batch (a batch recall), client, site, state or model.
 */
export function CabinetsTable({ filters, onFiltersChange, staff, filterOptions }: CabinetsTableProps) {
  const query = useInfiniteQuery({ ...cabinetQueries.list(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);

  const columns = useMemo(
    () => [
      column.accessor('serial', {
        header: 'Serial',
        enableSorting: true,
        meta: { alwaysVisible: true },
        cell: (c) => (
          <Link
            to={paths.cabinetLabel.getHref(c.getValue())}
            className="whitespace-nowrap font-mono font-medium text-ink-800 hover:underline"
          >
            {c.getValue()}
          </Link>
        ),
      }),
      column.accessor('status', {
        header: 'Status',
        meta: { csv: (r) => cabinetStatusLabels[r.status] },
        cell: (c) => <CabinetStatusPill status={c.getValue()} />,
      }),
      ...(staff ? [column.accessor('clientName', { header: 'Client', cell: (c) => c.getValue() ?? none })] : []),
      column.accessor('siteName', {
        header: 'Site',
        cell: (c) => {
          const { siteId } = c.row.original;
          return siteId ? (
            <Link to={paths.site.getHref(siteId)} className="text-stone-800 hover:underline">
              {c.getValue()}
            </Link>
          ) : (
            none
          );
        },
      }),
      column.accessor('wallName', {
        header: 'Wall',
        meta: { className: 'min-w-[10rem]' },
        cell: (c) => {
          const { wallId, column: col, row } = c.row.original;
          // The wall's map opens on the cabinet's cell.
          return wallId ? (
            <Link
              to={paths.wall.getHref(wallId, { col: col ?? undefined, row: row ?? undefined })}
              className="text-stone-800 hover:underline"
            >
              {c.getValue()}
            </Link>
          ) : (
            none
          );
        },
      }),
      column.accessor(position, {
        id: 'position',
        header: 'Position',
        cell: (c) => (c.getValue() ? <span className="whitespace-nowrap tabular-nums">{c.getValue()}</span> : none),
      }),
      column.accessor('batch', {
        header: 'Batch',
        enableSorting: true,
        cell: (c) => {
          const batch = c.getValue();
          if (!batch) return none;
          return batch.toLowerCase() === filters.batch?.toLowerCase() ? (
            <span className="whitespace-nowrap font-mono">{batch}</span>
          ) : (
            <Link
              to={paths.cabinets.getHref({ batch })}
              className="whitespace-nowrap font-mono text-stone-800 hover:underline"
              title={`Every cabinet of batch ${batch}`}
            >
              {batch}
            </Link>
          );
        },
      }),
      column.accessor('modelName', { header: 'Model' }),
      column.accessor('installedOn', {
        header: 'Installed on',
        enableSorting: true,
        cell: (c) => (c.getValue() ? <span className="whitespace-nowrap">{formatDate(c.getValue())}</span> : none),
      }),
      ...(staff
        ? [
            column.accessor('locationName', {
              header: 'Stock location',
              meta: { hiddenByDefault: true },
              cell: (c) => c.getValue() ?? none,
            }),
          ]
        : []),
    ],
    [staff, filters.batch],
  );

  const sorting: SortingState = [{ id: filters.sort ?? 'serial', desc: filters.dir === 'desc' }];
  const filtered = Boolean(filters.serial || filters.clientId || filters.siteId || filters.status || filters.batch || filters.modelId);

  return (
    <DataTable
      tableId="cabinets"
      label="Cabinets"
      columns={columns}
      data={rows}
      getRowId={(c) => c.id}
      {...pagedQueryProps(query)}
      sorting={sorting}
      onSortingChange={(next) => {
        const first = next[0];
        const sort = sortable.find((s) => s === first?.id) as CabinetSort | undefined;
        if (first && sort) onFiltersChange({ ...filters, sort, dir: first.desc ? 'desc' : 'asc' });
      }}
      toolbar={
        <>
          <FilterSearch
            label="Serial"
            placeholder="Starts with…"
            className="w-full sm:w-48"
            value={filters.serial ?? ''}
            onChange={(serial) => onFiltersChange({ ...filters, serial: serial || undefined })}
          />
          <FilterSearch
            label="Batch"
            placeholder="Code or start of it"
            foldable
            className="w-full sm:w-48"
            value={filters.batch ?? ''}
            onChange={(batch) => onFiltersChange({ ...filters, batch: batch.trim() || undefined })}
          />
          <FilterSelect
            label="Status"
            anyLabel="Any status"
            className="w-full sm:w-40"
            options={cabinetStatusOptions}
            value={filters.status ?? ''}
            onChange={(v) => onFiltersChange({ ...filters, status: (v || undefined) as CabinetFilters['status'] })}
          />
          <PlaceFilters options={filterOptions} values={filters} onChange={(place) => onFiltersChange({ ...filters, ...place })} />
        </>
      }
      empty={
        <EmptyState
          icon={Square}
          title={filtered ? 'No cabinet matches these filters' : 'No cabinets yet'}
          description={
            filtered
              ? 'A batch matches only as a whole code. Check it, or clear the filters.'
              : 'Cabinets are added on a wall’s page, one by one or from a CSV file.'
          }
        />
      }
    />
  );
}
