import { Cpu } from 'lucide-react';
import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import type { WallDetail } from '@/features/walls/api/types';
import { wallFigures } from '@/features/walls/components/wall-spec-card';

/** The controllers driving the wall, and whether their outputs cover the wall's pixels. */
export function WallControllersCard({ wall, actions }: { wall: WallDetail; actions?: ReactNode }) {
  const plan = wallFigures(wall);
  const outputs = wall.controllers.reduce((sum, c) => sum + c.outputs, 0);
  return (
    <Card title="Controllers" actions={actions} flush>
      {wall.controllers.length === 0 ? (
        <EmptyState icon={Cpu} title="No controller recorded" description="Record the processor that drives this wall: model, serial, firmware, outputs." className="py-8" />
      ) : (
        <>
          <ul className="divide-y divide-stone-100">
            {wall.controllers.map((c) => (
              <li key={c.id} className="px-4 py-3 sm:px-5">
                <p className="font-medium text-ink-950">
                  {c.model} <span className="font-mono text-sm font-normal text-stone-700">{c.serial}</span>
                </p>
                <p className="text-sm text-stone-700">
                  Firmware {c.firmware || '—'} · {c.outputsInUse} of {c.outputs} outputs in use ·{' '}
                  {c.pixelsPerOutput.toLocaleString('en')} px per output
                </p>
              </li>
            ))}
          </ul>
          {plan ? (
            <p className="border-t border-stone-100 px-4 py-2.5 text-sm text-stone-700 sm:px-5">
              The wall needs at least {plan.outputsNeeded} output{plan.outputsNeeded === 1 ? '' : 's'} ({plan.cabinetsPerOutput} cabinets per
              output, a cabinet is never split); the controllers have {outputs}.
            </p>
          ) : null}
        </>
      )}
    </Card>
  );
}
