import clsx from 'clsx';
import type { LucideIcon } from 'lucide-react';
import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';

interface ListStatesProps {
  /** What the list holds, plural: "The visits could not be loaded.", "Loading visits…". */
  noun: string;
  /** The empty state's picture. */
  icon: LucideIcon;
  /** Items loaded so far: the states stand in for the list only while there are none. */
  count: number;
  isLoading: boolean;
  error: unknown;
  onRetry: () => void;
  empty: { title: string; description?: ReactNode; action?: ReactNode };
  /** Less room around the loading line and the empty state, for a list that is one section of a page. */
  compact?: boolean;
  /** The list, once it has something in it. */
  children: ReactNode;
}

/**
 * A card list's first load: the error with "Try again", the loading line, or the empty state;
 * the list itself once it has items (a later page failing or loading keeps what is shown).
 */
export function ListStates({ noun, icon, count, isLoading, error, onRetry, empty, compact = false, children }: ListStatesProps) {
  if (count > 0) return <>{children}</>;
  if (error) return <LoadError title={`The ${noun} could not be loaded.`} error={error} onRetry={onRetry} />;
  if (isLoading) {
    return (
      <p className={clsx('flex items-center justify-center gap-2 text-stone-600', compact ? 'py-8' : 'py-12')}>
        <Spinner label="" /> {`Loading ${noun}…`}
      </p>
    );
  }
  return (
    <div className="rounded-md border border-stone-200 bg-white shadow-card">
      <EmptyState
        icon={icon}
        title={empty.title}
        description={empty.description}
        action={empty.action}
        className={compact ? 'py-8' : undefined}
      />
    </div>
  );
}
