import { Maximize2, Minus, Plus } from 'lucide-react';
import type { ReactNode } from 'react';
import type { WallView } from '@/components/wall-map/wall-map-geometry';

export const viewCaptions: Record<WallView, string> = {
  front: 'Front view (as seen by the audience)',
  rear: 'Rear view (as seen by the technician behind the wall)',
};

interface WallMapToolbarProps {
  view: WallView;
  /** 1 is the whole wall. */
  scale: number;
  maxScale: number;
  onZoomBy: (factor: number) => void;
  onShowWhole: () => void;
}

/** Above the map: which side is shown, and the zoom (its level, out, in, the whole wall). */
export function WallMapToolbar({ view, scale, maxScale, onZoomBy, onShowWhole }: WallMapToolbarProps) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-2">
      <p className="text-sm font-medium text-stone-700" data-testid="wall-map-caption">
        {viewCaptions[view]}
      </p>
      <div className="ml-auto flex items-center gap-1" role="group" aria-label="Zoom">
        <span className="mr-1 min-w-[3.5rem] text-right text-xs tabular-nums text-stone-600" aria-live="polite">
          {Math.round(scale * 100)} %
        </span>
        <MapButton label="Zoom out" onClick={() => onZoomBy(1 / 1.5)} disabled={scale <= 1.001}>
          <Minus className="h-4 w-4" aria-hidden="true" />
        </MapButton>
        <MapButton label="Zoom in" onClick={() => onZoomBy(1.5)} disabled={scale >= maxScale - 0.001}>
          <Plus className="h-4 w-4" aria-hidden="true" />
        </MapButton>
        <MapButton label="Show the whole wall" onClick={onShowWhole} disabled={scale <= 1.001}>
          <Maximize2 className="h-4 w-4" aria-hidden="true" />
        </MapButton>
      </div>
    </div>
  );
}

function MapButton({
  label,
  onClick,
  disabled,
  children,
}: {
  label: string;
  onClick: () => void;
  disabled?: boolean;
  children: ReactNode;
}) {
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled}
      aria-label={label}
      title={label}
      className="flex h-touch w-touch items-center justify-center rounded border border-stone-300 bg-white text-ink-800 shadow-sm hover:bg-stone-50 disabled:cursor-not-allowed disabled:opacity-50 md:h-9 md:w-9"
    >
      {children}
    </button>
  );
}
