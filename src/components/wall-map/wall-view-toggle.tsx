import clsx from 'clsx';
import type { WallView } from '@/components/wall-map/wall-map-geometry';

/** Front / rear switch for a wall map. */
export function WallViewToggle({ view, onChange }: { view: WallView; onChange: (v: WallView) => void }) {
  const option = (value: WallView, label: string, hint: string) => (
    <button
      type="button"
      aria-pressed={view === value}
      title={hint}
      onClick={() => onChange(value)}
      className={clsx(
        'min-h-touch rounded px-3.5 text-base font-medium transition-colors md:min-h-9',
        view === value ? 'bg-ink-800 text-white shadow-sm' : 'text-ink-800 hover:bg-stone-100',
      )}
    >
      {label}
    </button>
  );
  return (
    <div role="group" aria-label="Wall view" className="inline-flex rounded-md border border-stone-300 bg-white p-0.5">
      {option('front', 'Front', 'As the audience sees it')}
      {option('rear', 'Rear', 'As the technician behind the wall sees it')}
    </div>
  );
}
