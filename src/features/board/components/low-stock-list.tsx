import { useQuery } from '@tanstack/react-query';
import { PackageCheck } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { stockQueries } from '@/resources/stock';

/** Parts at or below their reorder point, per location: what to reorder or restock today. */
export function LowStockList() {
  const low = useQuery(stockQueries.low());
  const items = low.data?.items ?? [];
  return (
    <Card title="Low stock" description="At or below the reorder point, all batches together." flush>
      {low.isPending ? null : items.length === 0 ? (
        <p className="flex items-center gap-2 px-4 py-3 text-stone-700 sm:px-5">
          <PackageCheck className="h-4 w-4 text-state-on-track" aria-hidden="true" /> Nothing is below its reorder point.
        </p>
      ) : (
        <ul className="divide-y divide-stone-100" aria-label="Low stock">
          {items.map((i) => (
            <li key={`${i.partId}:${i.locationId}`} className="flex items-baseline justify-between gap-3 px-4 py-2.5 sm:px-5">
              <span className="min-w-0">
                <Link
                  to={paths.stock.getHref({ locationId: i.locationId })}
                  className="inline-flex min-h-touch items-center font-medium text-ink-800 hover:underline md:min-h-0"
                >
                  {i.partName}
                </Link>
                <span className="block text-sm text-stone-600">{i.locationName}</span>
              </span>
              <span className="shrink-0 text-sm tabular-nums text-stone-800">
                <span className="font-semibold">{i.onHand}</span> left · reorder {i.reorderQuantity}
              </span>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
