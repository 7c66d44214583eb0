import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { stockQueries } from '@/resources/stock';

/** Whole spare cabinets on the shelves (status spare), by model, batch and location; none: nothing shown. */
export function SpareCabinets({ locationId }: { locationId?: string }) {
  const spares = useQuery(stockQueries.spareCabinets(locationId));
  const items = spares.data?.items ?? [];
  if (!items.length) return null;
  return (
    <section aria-labelledby="spare-cabinets" className="mb-5 rounded-md border border-stone-200 bg-white shadow-card">
      <h2 id="spare-cabinets" className="border-b border-stone-100 px-4 py-2.5 text-base font-semibold text-ink-950 sm:px-5">
        Spare cabinets
      </h2>
      <ul className="divide-y divide-stone-100">
        {items.map((g) => (
          <li
            key={`${g.cabinetModel.id}:${g.batch}:${g.location.id}`}
            className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-2.5 sm:px-5"
          >
            <span className="min-w-0">
              <span className="font-medium text-ink-950">{g.cabinetModel.name}</span>
              {g.batch ? <span className="font-mono text-sm text-stone-700"> · batch {g.batch}</span> : null}
              <span className="block text-sm text-stone-600">
                {g.location.name} ·{' '}
                {g.cabinets.map(({ id, serial }, i) => (
                  <span key={id}>
                    {i ? ', ' : ''}
                    <Link to={paths.cabinetLabel.getHref(serial)} className="font-mono hover:underline">
                      {serial}
                    </Link>
                  </span>
                ))}
              </span>
            </span>
            <span className="text-lg font-semibold tabular-nums text-ink-950" aria-label={`${g.count} spare`}>
              {g.count}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
