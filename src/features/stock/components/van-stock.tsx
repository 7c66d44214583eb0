import type { StockBalance, StockLocation } from '@shared/schemas/stock';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { Package } from 'lucide-react';
import { useMemo } from 'react';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Spinner } from '@/components/ui/spinner';
import { partKindLabels } from '@/features/stock/components/stock-table';
import { stockQueries } from '@/resources/stock';

/** What one location holds, as large cards for a phone: part, batch and count, low ones marked. */
export function LocationStockCards({ location, onMove }: { location: StockLocation; onMove: (row: StockBalance) => void }) {
  const query = useInfiniteQuery({ ...stockQueries.balances({ locationId: location.id }), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);
  if (query.isPending) return <Spinner label={`Loading ${location.name}`} />;
  if (!rows.length) {
    return (
      <EmptyState icon={Package} title={`${location.name} is empty`} description="Take spares from the warehouse before the next visit." />
    );
  }
  return (
    <ul className="space-y-2" aria-label={`On hand in ${location.name}`}>
      {rows.map((b) => {
        const low = b.reorderAt !== null && b.partOnHandHere <= b.reorderAt;
        return (
          <li
            key={`${b.partId}:${b.batch}`}
            className="flex items-center gap-3 rounded-md border border-stone-200 bg-white p-3 shadow-card"
          >
            <div className="min-w-0 flex-1">
              <p className="font-semibold text-ink-950">{b.partName}</p>
              <p className="text-sm text-stone-700">
                {partKindLabels[b.partKind]}
                {b.batch ? (
                  <>
                    {' · batch '}
                    <span className="font-mono">{b.batch}</span>
                  </>
                ) : null}
              </p>
              {low ? <Badge tone="amber">Low: reorder at {b.reorderAt}</Badge> : null}
            </div>
            <p className="text-2xl font-semibold tabular-nums text-ink-950" aria-label={`${b.onHand} on hand`}>
              {b.onHand}
            </p>
            <Button size="lg" onClick={() => onMove(b)} aria-label={`Use or move ${b.partName}${b.batch ? ` batch ${b.batch}` : ''}`}>
              Use or move
            </Button>
          </li>
        );
      })}
    </ul>
  );
}
