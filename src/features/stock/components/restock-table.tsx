import type { RestockLine } from '@shared/schemas/stock';
import { useQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { PackageSearch } from 'lucide-react';
import { useMemo, useState } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSelect } from '@/components/ui/filters';
import { stockQueries } from '@/resources/stock';

const column = createColumnHelper<RestockLine>();
const fixed = (v: number, digits: number) => v.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });
const levels = ['0.9', '0.95', '0.99'] as const;

/**
 * What each wall's site kit should hold of the wall's own module batches to cover one restock
 * lead time at the chosen service level (a Poisson forecast), and what to send.
 */
export function RestockTable() {
  const [level, setLevel] = useState<(typeof levels)[number]>('0.95');
  const restock = useQuery(stockQueries.restock(Number(level)));
  // Walls whose kit is short first; walls without a site kit after the ones with one.
  const rows = useMemo(
    () => [...(restock.data?.items ?? [])].sort((a, b) => Number(Boolean(b.kit)) - Number(Boolean(a.kit)) || b.toSend - a.toSend),
    [restock.data],
  );
  const columns = useMemo(
    () => [
      column.accessor('wallName', {
        header: 'Wall',
        meta: { alwaysVisible: true },
        cell: (c) => (
          <span>
            <span className="font-medium text-ink-950">{c.getValue()}</span>
            <span className="block text-sm text-stone-600">
              {c.row.original.clientName} · {c.row.original.siteName}
            </span>
          </span>
        ),
      }),
      column.accessor((r) => r.kit?.name ?? '', {
        id: 'kit',
        header: 'Site kit',
        cell: (c) => c.getValue() || <span className="text-stone-500">none</span>,
      }),
      column.accessor('modules', { header: 'Modules', meta: { align: 'right' } }),
      column.accessor('failuresPerThousandModuleMonths', {
        header: 'Failures / 1,000 module-months',
        meta: { align: 'right' },
        cell: (c) => (
          <span>
            {fixed(c.getValue(), 2)}{' '}
            <span className="text-sm text-stone-600">({c.row.original.rateBasis === 'wall' ? 'this wall' : 'its model'})</span>
          </span>
        ),
      }),
      column.accessor('leadTimeMonths', {
        header: 'Lead time (months)',
        meta: { align: 'right', hiddenByDefault: true },
        cell: (c) => fixed(c.getValue(), 1),
      }),
      column.accessor('expectedFailures', { header: 'Expected failures', meta: { align: 'right' }, cell: (c) => fixed(c.getValue(), 2) }),
      column.accessor('recommended', { header: 'Keep', meta: { align: 'right' } }),
      column.accessor('onHand', { header: 'In the kit (own batches)', meta: { align: 'right' } }),
      column.accessor('toSend', {
        header: 'Send',
        meta: { align: 'right' },
        cell: (c) =>
          c.row.original.kit ? (
            <span className={c.getValue() > 0 ? 'font-semibold text-danger-700' : ''}>{c.getValue()}</span>
          ) : (
            <span className="text-sm text-stone-600">no site kit</span>
          ),
      }),
    ],
    [],
  );
  return (
    <DataTable
      tableId="restock"
      label="Restock list"
      columns={columns}
      data={rows}
      getRowId={(r) => r.wallId}
      isLoading={restock.isPending}
      error={restock.error}
      onRetry={() => void restock.refetch()}
      toolbar={
        <FilterSelect
          label="Service level"
          anyLabel="95 %"
          options={levels.map((l) => ({ value: l, label: `${Number(l) * 100} %` }))}
          value={level}
          onChange={(v) => setLevel((levels.find((l) => l === v) ?? '0.95') as (typeof levels)[number])}
        />
      }
      empty={
        <EmptyState icon={PackageSearch} title="No walls to forecast" description="Walls in service appear here with their site kits." />
      }
    />
  );
}
