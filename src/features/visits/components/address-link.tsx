import { MapPin } from 'lucide-react';
import clsx from 'clsx';
import { mapsHref } from '@/features/visits/utils/maps-link';

/** The site's address as a link that opens the phone's maps app there. */
export function AddressLink({ address, className }: { address: string; className?: string }) {
  if (!address.trim()) return <p className="text-base text-stone-600">No address on file.</p>;
  return (
    <a
      href={mapsHref(address)}
      className={clsx(
        'flex min-h-touch items-start gap-2 py-2 text-base font-medium text-ink-800 underline-offset-2 hover:underline',
        className,
      )}
    >
      <MapPin className="mt-0.5 h-5 w-5 shrink-0 text-ink-600" aria-hidden="true" />
      <span>
        {address}
        <span className="sr-only"> (opens the maps app)</span>
      </span>
    </a>
  );
}
