import clsx from 'clsx';
import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: ReactNode;
  description?: ReactNode;
  /** Buttons on the right (below the title on phones). */
  actions?: ReactNode;
  /** A small line above the title: a section name or a way back. */
  eyebrow?: ReactNode;
  className?: string;
}

export function PageHeader({ title, description, actions, eyebrow, className }: PageHeaderProps) {
  return (
    <header className={clsx('mb-6 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between', className)}>
      <div className="min-w-0 space-y-1">
        {eyebrow ? <div className="text-sm font-medium text-ink-500">{eyebrow}</div> : null}
        <h1 className="text-2xl font-semibold">{title}</h1>
        {description ? <div className="max-w-prose text-base text-stone-600">{description}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap items-center gap-2">{actions}</div> : null}
    </header>
  );
}
