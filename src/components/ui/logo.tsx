import clsx from 'clsx';

/** Gridkeep's mark: a grid of cabinets with one picked out, and the name. */
export function Logo({ className, showName = true, tone = 'light' }: { className?: string; showName?: boolean; tone?: 'light' | 'dark' }) {
  return (
    <span className={clsx('inline-flex items-center gap-2', className)}>
      <svg viewBox="0 0 32 32" className="h-7 w-7 shrink-0" aria-hidden="true">
        <rect width="32" height="32" rx="7" fill={tone === 'light' ? '#1c3d44' : '#12343b'} />
        <g fill="#5f8c92">
          <rect x="6" y="6" width="6" height="6" rx="1" />
          <rect x="13" y="6" width="6" height="6" rx="1" />
          <rect x="20" y="6" width="6" height="6" rx="1" />
          <rect x="6" y="13" width="6" height="6" rx="1" />
          <rect x="13" y="13" width="6" height="6" rx="1" />
          <rect x="6" y="20" width="6" height="6" rx="1" />
          <rect x="13" y="20" width="6" height="6" rx="1" />
          <rect x="20" y="20" width="6" height="6" rx="1" />
        </g>
        <rect x="20" y="13" width="6" height="6" rx="1" fill="#f4a62a" />
      </svg>
      {showName ? (
        <span className={clsx('text-lg font-semibold tracking-tight', tone === 'light' ? 'text-white' : 'text-ink-950')}>Gridkeep</span>
      ) : null}
    </span>
  );
}
