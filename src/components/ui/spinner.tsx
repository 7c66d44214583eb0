import clsx from 'clsx';

interface SpinnerProps {
  className?: string;
  /** Read by screen readers; pass '' when a visible text already says what is happening. */
  label?: string;
}

export function Spinner({ className, label = 'Loading' }: SpinnerProps) {
  return (
    <span role={label ? 'status' : undefined} className={clsx('inline-flex items-center', className)}>
      <svg className="h-[1.1em] w-[1.1em] animate-spin" viewBox="0 0 24 24" fill="none" aria-hidden="true">
        <circle cx="12" cy="12" r="9" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
        <path d="M21 12a9 9 0 0 0-9-9" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      {label ? <span className="sr-only">{label}</span> : null}
    </span>
  );
}

/** A centred spinner for a page or panel that is loading. */
export function PageSpinner({ label = 'Loading' }: { label?: string }) {
  return (
    <div className="flex min-h-[40vh] items-center justify-center text-ink-500">
      <Spinner className="text-2xl" label={label} />
    </div>
  );
}
