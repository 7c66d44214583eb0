import type { ReactNode } from 'react';

/**
 * Says that a list shows only part of what exists: the server caps some reads and answers
 * `truncated` when there is more. Nothing when the list is whole.
 */
export function TruncatedNote({
  truncated,
  children,
  className = '',
}: {
  truncated: boolean | undefined;
  children: ReactNode;
  className?: string;
}) {
  if (!truncated) return null;
  return (
    <p role="status" className={`rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-900 ${className}`}>
      {children}
    </p>
  );
}
