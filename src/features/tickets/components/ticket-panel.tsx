import clsx from 'clsx';
import type { LucideIcon } from 'lucide-react';
import { useId, type ReactNode } from 'react';

interface TicketPanelProps {
  title: ReactNode;
  icon: LucideIcon;
  children: ReactNode;
  /** Beside the title: a count or a short note. */
  aside?: ReactNode;
  className?: string;
}

/** One part of a ticket page's column ("The wall", photos, visits, repairs): a titled panel under the column's heading. */
export function TicketPanel({ title, icon: Icon, children, aside, className }: TicketPanelProps) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={clsx('rounded-md border border-stone-200 bg-white px-4 py-4 shadow-card sm:px-5', className)}>
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
        <h3 id={id} className="flex items-center gap-2 text-base font-semibold text-ink-950">
          <Icon className="h-4 w-4 text-ink-600" aria-hidden="true" />
          {title}
        </h3>
        {aside ? <div className="text-sm text-stone-600">{aside}</div> : null}
      </div>
      {children}
    </section>
  );
}
