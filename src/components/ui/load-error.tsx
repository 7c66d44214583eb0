import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/errors';

/** In place of what could not be loaded: what, why, and "Try again" where `onRetry` is given. */
export function LoadError({ title, error, onRetry }: { title: string; error: unknown; onRetry?: () => void }) {
  return (
    <Alert tone="danger" title={title}>
      <p>{errorMessage(error)}</p>
      {onRetry ? (
        <Button size="sm" className="mt-2" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </Alert>
  );
}
