import type { StockLocation } from '@shared/schemas/stock';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { Check } from 'lucide-react';
import { Badge } from '@/components/ui/badge';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import type { DraftReplacement } from '@/features/repairs/utils/repair-draft';
import { stockQueries } from '@/resources/stock';

/**
 * Whole spare cabinets of the wall's model in one location, the removed cabinet's batch first;
 * a tap picks the one that takes the position.
 */
export function SpareCabinetList({
  location,
  modelId,
  batch,
  value,
  onPick,
}: {
  location: StockLocation;
  modelId: string;
  /** The batch of the cabinet being replaced. */
  batch: string;
  value: DraftReplacement | null;
  onPick: (replacement: DraftReplacement) => void;
}) {
  const query = useQuery(stockQueries.spareCabinets(location.id));

  if (query.isPending) return <Spinner label={`Loading the spare cabinets in ${location.name}`} />;
  if (query.isError) {
    return <LoadError title="The spare cabinets could not be loaded." error={query.error} />;
  }
  const same = (b: string) => b.trim().toLowerCase() === batch.trim().toLowerCase();
  const groups = query.data.items
    .filter((g) => g.cabinetModel.id === modelId && g.count > 0)
    .sort((a, b) => Number(same(b.batch)) - Number(same(a.batch)));
  if (!groups.length) return <p className="text-base text-stone-700">No spare cabinet of this model is in {location.name}.</p>;

  return (
    <div className="space-y-3">
      {groups.map((g) => (
        <section key={`${g.batch}:${g.location.id}`} className="space-y-2">
          <h3 className="flex flex-wrap items-center gap-2 text-base font-semibold">
            Batch <span className="font-mono">{g.batch || '(none)'}</span>
            {same(g.batch) ? <Badge tone="ink">Same batch</Badge> : <Badge tone="amber">Other batch</Badge>}
          </h3>
          <ul className="grid grid-cols-1 gap-2" aria-label={`Spare cabinets of batch ${g.batch || 'none'}`}>
            {g.cabinets.map(({ id, serial }) => {
              const chosen = value?.cabinetId === id;
              return (
                <li key={id}>
                  <button
                    type="button"
                    aria-pressed={chosen}
                    onClick={() => onPick({ cabinetId: id, serial, batch: g.batch, locationName: location.name })}
                    className={clsx(
                      'flex min-h-touch-lg w-full items-center justify-between gap-3 rounded-md border-2 px-3.5 text-left font-mono text-md font-semibold',
                      chosen ? 'border-ink-800 bg-ink-50' : 'border-stone-300 bg-white hover:border-ink-400',
                    )}
                  >
                    {serial}
                    {chosen ? <Check className="h-5 w-5 text-ink-800" aria-hidden="true" /> : null}
                  </button>
                </li>
              );
            })}
          </ul>
        </section>
      ))}
    </div>
  );
}
