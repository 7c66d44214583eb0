import clsx from 'clsx';
import { WallViewToggle } from '@/components/wall-map/wall-map';

type View = 'front' | 'rear';

/**
 * The modules inside one cabinet, to tap the one worked on. Positions are stored as the audience
 * sees them (column 1 at the audience's left); in the rear view, as the technician faces the
 * open cabinet, the columns are drawn mirrored, like the wall map.
 */
export function ModuleGrid({
  wide,
  high,
  view,
  onViewChange,
  value,
  onChoose,
}: {
  wide: number;
  high: number;
  view: View;
  onViewChange: (view: View) => void;
  value: { column: number; row: number } | null;
  onChoose: (p: { column: number; row: number }) => void;
}) {
  const columns = Array.from({ length: wide }, (_, i) => (view === 'rear' ? wide - i : i + 1));
  const rows = Array.from({ length: high }, (_, i) => i + 1);
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-base font-medium text-ink-950">
          {view === 'rear' ? 'Seen from the rear' : 'Seen from the front'} · {wide} × {high} modules
        </p>
        <WallViewToggle view={view} onChange={onViewChange} />
      </div>
      <p className="text-sm text-stone-700">
        {view === 'rear'
          ? 'As you face the back of the cabinet: left and right are mirrored. The position is saved as the audience sees it.'
          : 'As the audience sees it, counted from the top-left.'}
      </p>
      <div
        role="group"
        aria-label={`Modules of the cabinet, ${view === 'rear' ? 'rear' : 'front'} view`}
        className="grid gap-1.5 rounded-md border-4 border-stone-700 bg-stone-700 p-1.5"
        style={{ gridTemplateColumns: `repeat(${wide}, minmax(0, 1fr))` }}
        data-view={view}
      >
        {rows.map((row) =>
          columns.map((column) => {
            const chosen = value?.column === column && value.row === row;
            return (
              <button
                key={`${column}:${row}`}
                type="button"
                aria-pressed={chosen}
                aria-label={`Module column ${column}, row ${row} (as the audience sees it)`}
                onClick={() => onChoose({ column, row })}
                className={clsx(
                  'flex min-h-touch-lg items-center justify-center rounded font-mono text-md font-semibold',
                  chosen
                    ? 'bg-amber-400 text-ink-950 ring-4 ring-amber-200'
                    : 'bg-stone-100 text-ink-900 hover:bg-white active:bg-amber-100',
                )}
              >
                {column}·{row}
              </button>
            );
          }),
        )}
      </div>
      <p className="text-xs text-stone-600">Labels read column·row from the audience’s top-left.</p>
    </div>
  );
}
