import { ZoomIn } from 'lucide-react';
import { wallLayout } from '@/components/wall-map/wall-map-geometry';
import { useMediaQuery } from '@/lib/use-media-query';

/** The smallest target a finger hits reliably: 44 × 44 CSS px (WCAG 2.2 SC 2.5.5). */
export const MIN_TARGET_PX = 44;

interface SmallCellsHintProps {
  columns: number;
  rows: number;
  cellAspect?: number;
}

/** The page's and the form card's side margins around the map on a phone, in CSS px. */
const AROUND_MAP_PX = 96;

/**
 * Beside a map to tap: when the whole wall leaves each cabinet smaller than a fingertip (a
 * 12-column wall on a phone draws 25 px cells), the map starts zoomed in; this says so and how to
 * move around or see the whole wall. It
 * follows the screen's width (a media query), not the map's measured size: a hint that changes
 * the layout must not be decided by that layout.
 */
export function SmallCellsHint({ columns, rows, cellAspect }: SmallCellsHintProps) {
  const layout = wallLayout(columns, rows, 'front', cellAspect);
  // The map's width at which a whole-wall cell is 44 px, plus what surrounds the map.
  const wideEnough = Math.ceil((MIN_TARGET_PX * layout.content.width) / Math.min(layout.cellWidth, layout.cellHeight)) + AROUND_MAP_PX;
  const zoomNeeded = useMediaQuery(`(max-width: ${wideEnough - 0.02}px)`);
  if (!zoomNeeded) return null;
  return (
    <p
      className="flex items-start gap-2 rounded-md border border-ink-200 bg-ink-50 px-3 py-2 text-sm text-ink-900"
      data-testid="small-cells-hint"
    >
      <ZoomIn className="mt-0.5 h-4 w-4 shrink-0" aria-hidden="true" />
      <span>
        <strong className="font-semibold">The map starts zoomed in</strong> so a cabinet is big enough to tap: drag to move along the wall,
        or show the whole wall with the button above it.
      </span>
    </p>
  );
}
