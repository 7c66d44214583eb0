import type { StockMovement } from '@shared/schemas/stock';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { ScrollText } from 'lucide-react';
import { useMemo } from 'react';
import { Badge } from '@/components/ui/badge';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSelect } from '@/components/ui/filters';
import type { SelectOption } from '@/components/ui/select-field';
import { movementKindLabels } from '@/features/stock/components/movement-dialog';
import { formatDateTime } from '@/lib/format';
import { stockQueries, type MovementFilters } from '@/resources/stock';

const column = createColumnHelper<StockMovement>();

interface LedgerTableProps {
  filters: MovementFilters;
  onFiltersChange: (filters: MovementFilters) => void;
  partOptions: SelectOption[];
  locationOptions: SelectOption[];
}

/** The ledger, newest first: a part's or a location's every movement, who recorded it and why. */
export function LedgerTable({ filters, onFiltersChange, partOptions, locationOptions }: LedgerTableProps) {
  const query = useInfiniteQuery({ ...stockQueries.movements(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);
  const columns = useMemo(
    () => [
      column.accessor('createdAt', { header: 'When', meta: { alwaysVisible: true }, cell: (c) => formatDateTime(c.getValue()) }),
      column.accessor('kind', { header: 'What', cell: (c) => movementKindLabels[c.getValue()] }),
      column.accessor('partName', {
        header: 'Part',
        cell: (c) => (
          <span>
            {c.getValue()}
            {c.row.original.batch ? <span className="font-mono text-sm text-stone-600"> · {c.row.original.batch}</span> : null}
            {c.row.original.batchMismatch ? (
              <Badge tone="amber" className="ml-2">
                Other batch than the wall’s
              </Badge>
            ) : null}
          </span>
        ),
      }),
      column.accessor((m) => m.from?.name ?? '', { id: 'from', header: 'From', cell: (c) => c.getValue() || '—' }),
      column.accessor((m) => m.to?.name ?? '', { id: 'to', header: 'To', cell: (c) => c.getValue() || '—' }),
      column.accessor('quantity', { header: 'Quantity', meta: { align: 'right' } }),
      column.accessor('reason', { header: 'Note', cell: (c) => c.getValue() || '—' }),
      column.accessor('actorName', { header: 'By', meta: { hiddenByDefault: true }, cell: (c) => c.getValue() ?? '—' }),
    ],
    [],
  );
  return (
    <DataTable
      tableId="stock-ledger"
      label="Stock ledger"
      columns={columns}
      data={rows}
      getRowId={(m) => String(m.id)}
      {...pagedQueryProps(query)}
      toolbar={
        <>
          <FilterSelect
            label="Part"
            anyLabel="All parts"
            options={partOptions}
            value={filters.partId ?? ''}
            onChange={(v) => onFiltersChange({ ...filters, partId: v || undefined })}
          />
          <FilterSelect
            label="Location"
            anyLabel="All locations"
            options={locationOptions}
            value={filters.locationId ?? ''}
            onChange={(v) => onFiltersChange({ ...filters, locationId: v || undefined })}
          />
        </>
      }
      empty={<EmptyState icon={ScrollText} title="No movements" description="Every receipt, transfer, use and correction shows here." />}
    />
  );
}
