import clsx from 'clsx';
import { CloudUpload, TriangleAlert } from 'lucide-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useOutboxCounts } from '@/lib/offline-queue';

/**
 * How many repairs wait on this phone to be sent (logged without signal), and how many the
 * server refused; a tap opens the outbox. Shows nothing when the outbox is empty.
 */
export function PendingRepairsBanner({ className }: { className?: string }) {
  const { waiting, needsAttention } = useOutboxCounts();
  if (!waiting && !needsAttention) return null;
  const attention = needsAttention > 0;
  const parts: string[] = [];
  if (waiting) parts.push(waiting === 1 ? '1 repair waiting to be sent' : `${waiting} repairs waiting to be sent`);
  if (needsAttention) parts.push(needsAttention === 1 ? '1 needs your attention' : `${needsAttention} need your attention`);
  const Icon = attention ? TriangleAlert : CloudUpload;
  return (
    <Link
      to={paths.outbox.getHref()}
      data-testid="pending-repairs"
      className={clsx(
        'flex min-h-touch items-center gap-3 rounded-md border px-3.5 py-2.5 text-base font-medium',
        attention ? 'border-danger-600/40 bg-danger-50 text-danger-700' : 'border-amber-300 bg-amber-50 text-amber-900',
        className,
      )}
    >
      <Icon className="h-5 w-5 shrink-0" aria-hidden="true" />
      <span className="flex-1">{parts.join(' · ')}</span>
      <span className="text-sm underline">Outbox</span>
    </Link>
  );
}

/** A small count for a navigation item: the repairs on this phone not yet sent. */
export function PendingRepairsCount({ className }: { className?: string }) {
  const { total, needsAttention } = useOutboxCounts();
  if (!total) return null;
  return (
    <span
      aria-label={`${total} repairs not sent`}
      className={clsx(
        'inline-flex min-w-5 items-center justify-center rounded-full px-1.5 text-xs font-semibold',
        needsAttention ? 'bg-danger-600 text-white' : 'bg-amber-400 text-ink-950',
        className,
      )}
    >
      {total}
    </span>
  );
}
