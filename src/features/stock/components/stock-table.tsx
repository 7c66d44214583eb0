import type { StockBalance } from '@shared/schemas/stock';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { Package } from 'lucide-react';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSelect } from '@/components/ui/filters';
import type { SelectOption } from '@/components/ui/select-field';
import { stockQueries, type StockFilters } from '@/resources/stock';

const column = createColumnHelper<StockBalance>();
const sortable = ['part', 'location', 'onHand'] as const;
const n = (v: number) => v.toLocaleString('en');

export const partKindLabels = {
  module: 'Module',
  power_supply: 'Power supply',
  receiving_card: 'Receiving card',
  cable: 'Cable',
  fan: 'Fan',
  cabinet: 'Cabinet',
} as const;

export const locationKindLabels = { warehouse: 'Warehouse', van: 'Van', site_kit: 'Site kit' } as const;

interface StockTableProps {
  filters: StockFilters;
  onFiltersChange: (filters: StockFilters) => void;
  locationOptions: SelectOption[];
  /** Offers a movement from a row (the office, or a technician for their own van). */
  onMove?: (row: StockBalance) => void;
  /** Offers the row's reorder point (the office). */
  onReorderPoint?: (row: StockBalance) => void;
}

/** On hand per part, batch and location: the ledger's sums, a reorder point marked when reached. */
export function StockTable({ filters, onFiltersChange, locationOptions, onMove, onReorderPoint }: StockTableProps) {
  const query = useInfiniteQuery({ ...stockQueries.balances(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);
  const columns = useMemo(
    () => [
      column.accessor('partName', {
        id: 'part',
        header: 'Part',
        enableSorting: true,
        meta: { alwaysVisible: true, className: 'min-w-[12rem]' },
        cell: (c) => (
          <span>
            <Link
              to={paths.stock.getHref({ tab: 'ledger', partId: c.row.original.partId })}
              className="font-medium text-ink-800 hover:underline"
            >
              {c.getValue()}
            </Link>
            <span className="block font-mono text-xs text-stone-600">{c.row.original.partSku}</span>
          </span>
        ),
      }),
      column.accessor('partKind', { header: 'Kind', cell: (c) => partKindLabels[c.getValue()] }),
      column.accessor('batch', {
        header: 'Batch',
        cell: (c) => (c.getValue() ? <span className="font-mono text-sm">{c.getValue()}</span> : '—'),
      }),
      column.accessor('locationName', {
        id: 'location',
        header: 'Location',
        enableSorting: true,
        cell: (c) => (
          <span>
            {c.getValue()} <span className="text-sm text-stone-600">({locationKindLabels[c.row.original.locationKind]})</span>
          </span>
        ),
      }),
      column.accessor('onHand', {
        header: 'On hand',
        enableSorting: true,
        meta: { align: 'right' },
        cell: (c) => {
          const low = c.row.original.reorderAt !== null && c.row.original.partOnHandHere <= c.row.original.reorderAt;
          return (
            <span className="inline-flex items-center gap-2 tabular-nums">
              {low ? <Badge tone="amber">Low: {c.row.original.partOnHandHere} of this part here</Badge> : null}
              <span className="font-semibold">{n(c.getValue())}</span>
            </span>
          );
        },
      }),
      column.accessor('reorderAt', {
        header: 'Reorder at',
        meta: { align: 'right', hiddenByDefault: true, csv: (r) => (r.reorderAt === null ? '' : String(r.reorderAt)) },
        cell: (c) => (c.getValue() === null ? '—' : n(c.getValue() ?? 0)),
      }),
      ...(onMove || onReorderPoint
        ? [
            column.display({
              id: 'actions',
              header: () => <span className="sr-only">Actions</span>,
              meta: { noCsv: true, alwaysVisible: true, align: 'right', className: 'w-px whitespace-nowrap' },
              cell: (c) => {
                const r = c.row.original;
                return (
                  <span className="inline-flex gap-1">
                    {onReorderPoint ? (
                      <Button
                        size="sm"
                        variant="ghost"
                        onClick={() => onReorderPoint(r)}
                        aria-label={`Reorder point of ${r.partName} at ${r.locationName}`}
                      >
                        Reorder point
                      </Button>
                    ) : null}
                    {onMove ? (
                      <Button size="sm" variant="ghost" onClick={() => onMove(r)} aria-label={`Move ${r.partName} from ${r.locationName}`}>
                        Move
                      </Button>
                    ) : null}
                  </span>
                );
              },
            }),
          ]
        : []),
    ],
    [onMove, onReorderPoint],
  );
  const filtered = Boolean(filters.locationId || filters.partKind);
  return (
    <DataTable
      tableId="stock"
      label="Stock on hand"
      columns={columns}
      data={rows}
      getRowId={(b) => `${b.partId}:${b.batch}:${b.locationId}`}
      {...pagedQueryProps(query)}
      sorting={[{ id: filters.sort ?? 'part', desc: filters.dir === 'desc' }]}
      onSortingChange={(next) => {
        const sort = sortable.find((s) => s === next[0]?.id);
        if (sort) onFiltersChange({ ...filters, sort, dir: next[0].desc ? 'desc' : 'asc' });
      }}
      toolbar={
        <>
          <FilterSelect
            label="Location"
            anyLabel="All locations"
            options={locationOptions}
            value={filters.locationId ?? ''}
            onChange={(v) => onFiltersChange({ ...filters, locationId: v || undefined })}
          />
          <FilterSelect
            label="Kind"
            anyLabel="All kinds"
            options={Object.entries(partKindLabels).map(([value, label]) => ({ value, label }))}
            value={filters.partKind ?? ''}
            onChange={(v) => onFiltersChange({ ...filters, partKind: (v || undefined) as StockFilters['partKind'] })}
          />
        </>
      }
      empty={
        <EmptyState
          icon={Package}
          title={filtered ? 'Nothing on hand here' : 'No stock yet'}
          description={filtered ? 'Try another location or kind.' : 'Record a receipt to put the first spares on the shelf.'}
        />
      }
    />
  );
}
