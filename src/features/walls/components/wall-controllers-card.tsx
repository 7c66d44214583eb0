import { Cpu } from 'lucide-react';
import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import type { WallDetail } from '@shared/schemas/walls';
import { wholeUnitsWithin } from '@shared/calc/electrical';

/** The controllers driving the wall, and whether their outputs cover the wall's pixels. */
export function WallControllersCard({ wall, actions }: { wall: WallDetail; actions?: ReactNode }) {
  const m = wall.cabinetModel;
  const perOutput = wholeUnitsWithin(wall.controllers[0]?.pixelsPerOutput ?? 650_000, m.pixelsWide * m.pixelsHigh);
  // Whole rows per data line (common practice), a row split only when it is over one output.
  const byRows = perOutput >= 1 ? wall.rows * Math.ceil(wall.columns / perOutput) : null;
  const fewest = perOutput >= 1 ? Math.ceil((wall.columns * wall.rows) / perOutput) : null;
  const outputs = wall.controllers.reduce((sum, c) => sum + c.outputs, 0);
  return (
    <Card title="Controllers" actions={actions} flush>
      {wall.controllers.length === 0 ? (
        <EmptyState
          icon={Cpu}
          title="No controller recorded"
          description="Record the processor that drives this wall: model, serial, firmware, outputs."
          className="py-8"
        />
      ) : (
        <>
          <ul className="divide-y divide-stone-100">
            {wall.controllers.map((c) => (
              <li key={c.id} className="px-4 py-3 sm:px-5">
                <p className="font-medium text-ink-950">
                  {c.model} <span className="font-mono text-sm font-normal text-stone-700">{c.serial}</span>
                </p>
                <p className="text-sm text-stone-700">
                  Firmware {c.firmware || '—'} · {c.outputsInUse} of {c.outputs} outputs in use · {c.pixelsPerOutput.toLocaleString('en')}{' '}
                  px per output
                </p>
              </li>
            ))}
          </ul>
          {byRows !== null && fewest !== null ? (
            <p className="border-t border-stone-100 px-4 py-2.5 text-sm text-stone-700 sm:px-5">
              One data line per row takes {byRows} output{byRows === 1 ? '' : 's'}, the fewest any layout can use is {fewest} (at most{' '}
              {perOutput} cabinets per output, a cabinet is never split); the controllers have {outputs}.
            </p>
          ) : null}
        </>
      )}
    </Card>
  );
}
