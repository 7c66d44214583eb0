import clsx from 'clsx';
import type { ReactNode } from 'react';

interface CardProps {
  title?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  /** Leave out the body padding, e.g. for a table that runs to the edges. */
  flush?: boolean;
  as?: 'section' | 'div' | 'article';
}

export function Card({ title, description, actions, children, className, flush = false, as: Tag = 'section' }: CardProps) {
  return (
    <Tag className={clsx('rounded-md border border-stone-200 bg-white shadow-card', className)}>
      {title || actions ? (
        <div className="flex items-start justify-between gap-3 border-b border-stone-200 px-4 py-3 sm:px-5">
          <div className="space-y-0.5">
            {title ? <h2 className="text-base font-semibold">{title}</h2> : null}
            {description ? <p className="text-sm text-stone-600">{description}</p> : null}
          </div>
          {actions ? <div className="flex shrink-0 items-center gap-2">{actions}</div> : null}
        </div>
      ) : null}
      <div className={flush ? undefined : 'px-4 py-4 sm:px-5'}>{children}</div>
    </Tag>
  );
}
