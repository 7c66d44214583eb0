import { continuousLoadNote, type Supply } from '@shared/calc/electrical';
import clsx from 'clsx';
import { TriangleAlert } from 'lucide-react';
import type { ReactNode } from 'react';

/** The product's cautions, word for word wherever a figure could be taken for a design. */
export const cautions = {
  power:
    'These figures are planning estimates: circuits and connections are designed and signed off by a licensed electrician under the local code.',
  structure:
    "Ground-stacked and flown walls follow the manufacturer's instructions and a qualified engineer's design; ballast and rigging are not computed here.",
  service:
    'Isolate power before opening a cabinet; handle modules with ESD protection; use proper access equipment when working at height.',
} as const;

export function Caution({ children, className }: { children: ReactNode; className?: string }) {
  return (
    <p className={clsx('flex items-start gap-2 rounded border border-amber-200 bg-amber-50 px-3 py-2 text-sm text-amber-900', className)}>
      <TriangleAlert className="mt-0.5 h-4 w-4 shrink-0 text-amber-700" aria-hidden="true" />
      <span>
        <span className="sr-only">Caution: </span>
        {children}
      </span>
    </p>
  );
}

/** The power caution with the code whose continuous-load factor the figures used. */
export function PowerCaution({
  supply,
  className,
}: {
  supply: Pick<Supply, 'voltage' | 'phases' | 'continuousFactor'>;
  className?: string;
}) {
  return (
    <Caution className={className}>
      {cautions.power} {continuousLoadNote(supply)}
    </Caution>
  );
}
