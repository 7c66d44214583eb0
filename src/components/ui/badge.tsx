import clsx from 'clsx';
import type { ReactNode } from 'react';

type Tone = 'neutral' | 'ink' | 'amber' | 'danger';

const tones: Record<Tone, string> = {
  neutral: 'bg-stone-100 text-stone-700 ring-stone-300/70',
  ink: 'bg-ink-50 text-ink-800 ring-ink-200',
  amber: 'bg-amber-50 text-amber-800 ring-amber-200',
  danger: 'bg-danger-50 text-danger-700 ring-danger-100',
};

export function Badge({ tone = 'neutral', children, className }: { tone?: Tone; children: ReactNode; className?: string }) {
  return (
    <span
      className={clsx(
        'inline-flex items-center gap-1 whitespace-nowrap rounded px-1.5 py-0.5 text-xs font-medium ring-1 ring-inset',
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}

/** The product's states: the service-plan clock and a cabinet's condition. */
export type PillState = 'on-track' | 'at-risk' | 'breached' | 'installed' | 'spare' | 'at-bench' | 'returned' | 'retired' | 'open-ticket';

// Written out in full so Tailwind finds every class name.
const states: Record<PillState, [pill: string, dot: string]> = {
  'on-track': ['bg-state-on-track-bg text-state-on-track', 'bg-state-on-track-dot'],
  'at-risk': ['bg-state-at-risk-bg text-state-at-risk', 'bg-state-at-risk-dot'],
  breached: ['bg-state-breached-bg text-state-breached', 'bg-state-breached-dot'],
  installed: ['bg-state-installed-bg text-state-installed', 'bg-state-installed-dot'],
  spare: ['bg-state-spare-bg text-state-spare', 'bg-state-spare-dot'],
  'at-bench': ['bg-state-at-bench-bg text-state-at-bench', 'bg-state-at-bench-dot'],
  returned: ['bg-state-returned-bg text-state-returned', 'bg-state-returned-dot'],
  retired: ['bg-state-retired-bg text-state-retired', 'bg-state-retired-dot'],
  'open-ticket': ['bg-state-open-ticket-bg text-state-open-ticket', 'bg-state-open-ticket-dot'],
};

/** A state with a coloured dot and a word: colour is never the only signal. */
export function StatusPill({ state, children, className }: { state: PillState; children: ReactNode; className?: string }) {
  return (
    <span
      className={clsx(
        'inline-flex items-center gap-1.5 whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-medium',
        states[state][0],
        className,
      )}
    >
      <span className={clsx('h-2 w-2 shrink-0 rounded-full', states[state][1])} aria-hidden="true" />
      {children}
    </span>
  );
}
