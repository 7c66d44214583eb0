import type { PartKind } from '@shared/schemas/enums';
import type { StockLocation, WallSpare } from '@shared/schemas/stock';
import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { Check, TriangleAlert } from 'lucide-react';
import { Badge } from '@/components/ui/badge';
import { LoadError } from '@/components/ui/load-error';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import type { DraftSpare } from '@/features/repairs/utils/repair-draft';
import { stockQueries } from '@/resources/stock';

export const locationWords = (l: StockLocation) => (l.kind === 'van' ? `${l.name} (your van)` : `${l.name} (site kit)`);

/** Where a technician takes spares from on site: their own van(s), then the site's kit. */
export function spareSources(locations: StockLocation[], userId: string, siteId: string | null): StockLocation[] {
  const vans = locations.filter((l) => !l.archived && l.kind === 'van' && l.holder?.id === userId);
  const kits = locations.filter((l) => !l.archived && l.kind === 'site_kit' && siteId !== null && l.site?.id === siteId);
  return [...vans, ...kits];
}

/** Tabs between the places spares come from. */
export function SourceTabs({
  sources,
  value,
  onChange,
}: {
  sources: StockLocation[];
  value: string | null;
  onChange: (locationId: string) => void;
}) {
  return (
    <div role="group" aria-label="Take the spare from" className="flex flex-wrap gap-2">
      {sources.map((l) => (
        <button
          key={l.id}
          type="button"
          aria-pressed={l.id === value}
          onClick={() => onChange(l.id)}
          className={clsx(
            'min-h-touch rounded-full border px-4 text-base font-medium',
            l.id === value ? 'border-ink-800 bg-ink-800 text-white' : 'border-stone-300 bg-white text-ink-900 hover:bg-stone-50',
          )}
        >
          {l.kind === 'van' ? `${l.name} · van` : `${l.name} · site kit`}
        </button>
      ))}
    </div>
  );
}

/** Modules come from the wall's spares (its model, its own batches first); other parts from the location's stock. */
function useSpares(wallId: string, location: StockLocation, kind: PartKind) {
  const modules = useQuery({ ...stockQueries.wallSpares(wallId, location.id), enabled: kind === 'module' });
  const parts = useInfiniteQuery({ ...stockQueries.balances({ locationId: location.id, partKind: kind }), enabled: kind !== 'module' });
  if (kind === 'module') {
    return {
      isPending: modules.isPending,
      error: modules.error,
      wallBatches: modules.data?.wallBatches ?? [],
      items: (modules.data?.items ?? []).filter((s) => s.partKind === 'module' && s.onHand > 0),
    };
  }
  const items: WallSpare[] = (parts.data?.pages.flatMap((p) => p.items) ?? [])
    .filter((b) => b.onHand > 0)
    // Power supplies, cards, cables and fans carry no colour batch: any of them fits.
    .map((b) => ({ ...b, matchesWallBatch: true }));
  return { isPending: parts.isPending, error: parts.error, wallBatches: [] as string[], items };
}

/** The spares of one location that fit the component, the wall's batch first; a tap picks one. */
export function SpareList({
  wallId,
  location,
  kind,
  value,
  onPick,
}: {
  wallId: string;
  location: StockLocation;
  kind: PartKind;
  value: DraftSpare | null;
  onPick: (spare: DraftSpare) => void;
}) {
  const spares = useSpares(wallId, location, kind);
  if (spares.isPending) return <Spinner label={`Loading the spares in ${location.name}`} />;
  if (spares.error) {
    return <LoadError title="The spares could not be loaded." error={spares.error} />;
  }
  if (!spares.items.length) return <p className="text-base text-stone-700">No spare that fits is on hand in {location.name}.</p>;
  return (
    <div className="space-y-2">
      {kind === 'module' && spares.wallBatches.length ? (
        <p className="break-words text-sm text-stone-700">
          {spares.wallBatches.length === 1 ? 'The wall’s batch: ' : 'The wall’s batches: '}
          <span className="font-mono font-semibold">{spares.wallBatches.join(', ')}</span>
        </p>
      ) : null}
      <ul className="space-y-2" aria-label={`Spares in ${location.name}`}>
        {spares.items.map((s) => {
          const chosen = value?.partId === s.partId && value.batch === s.batch && value.locationId === s.locationId;
          return (
            <li key={`${s.partId}:${s.batch}`}>
              <button
                type="button"
                aria-pressed={chosen}
                onClick={() =>
                  onPick({
                    partId: s.partId,
                    partName: s.partName,
                    batch: s.batch,
                    locationId: s.locationId,
                    locationName: s.locationName,
                    matchesWallBatch: s.matchesWallBatch,
                  })
                }
                className={clsx(
                  'flex min-h-touch-lg w-full items-center gap-3 rounded-md border-2 px-3.5 py-2.5 text-left',
                  chosen ? 'border-ink-800 bg-ink-50' : 'border-stone-300 bg-white hover:border-ink-400',
                )}
              >
                <span className="min-w-0 flex-1 space-y-1">
                  <span className="block font-semibold text-ink-950">{s.partName}</span>
                  {s.batch ? (
                    <span className="flex flex-wrap items-center gap-2 text-sm text-stone-700">
                      batch <span className="font-mono">{s.batch}</span>
                      {kind === 'module' ? (
                        s.matchesWallBatch ? (
                          <Badge tone="ink">Wall’s batch</Badge>
                        ) : (
                          <Badge tone="amber">Other batch</Badge>
                        )
                      ) : null}
                    </span>
                  ) : null}
                </span>
                <span className="text-right">
                  <span className="block text-xl font-semibold tabular-nums text-ink-950">{s.onHand}</span>
                  <span className="block text-xs text-stone-600">on hand</span>
                </span>
                {chosen ? <Check className="h-5 w-5 shrink-0 text-ink-800" aria-hidden="true" /> : null}
              </button>
            </li>
          );
        })}
      </ul>
    </div>
  );
}

/** Another batch than the wall's asks for a yes, and says why. */
export function BatchMismatchConfirm({
  spare,
  accepted,
  onAccept,
}: {
  spare: DraftSpare;
  accepted: boolean;
  onAccept: (accepted: boolean) => void;
}) {
  return (
    <div role="alert" className="space-y-3 rounded-md border-2 border-amber-400 bg-amber-50 p-3.5">
      <p className="flex gap-2 font-semibold text-amber-900">
        <TriangleAlert className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true" />
        Batch {spare.batch || '(none)'} is not the wall’s batch.
      </p>
      <p className="text-base text-stone-800">
        Modules of another production batch differ slightly in colour and brightness, so this module may stand out on the wall. Fit it only
        when no module of the wall’s batch is at hand; the mismatch is recorded with the repair.
      </p>
      <Button
        variant={accepted ? 'primary' : 'secondary'}
        size="lg"
        className="w-full"
        onClick={() => onAccept(!accepted)}
        aria-pressed={accepted}
      >
        {accepted ? 'Fitting it anyway: confirmed' : 'Fit it anyway'}
      </Button>
    </div>
  );
}
