import { CircleAlert, SearchX } from 'lucide-react';
import { isRouteErrorResponse, Link, Navigate, useLocation, useRouteError } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { paths } from '@/config/paths';
import { errorMessage, isNotFound, isSignedOut } from '@/lib/errors';

/** A page that is not there (or that this person may not see: the same answer on purpose). */
export function NotFoundContent() {
  return (
    <EmptyState
      icon={SearchX}
      title="We could not find that page"
      description="The address may be mistyped, or the page was moved or removed."
      action={
        <Link to={paths.home.getHref()} className="link">
          Go to the start page
        </Link>
      }
      className="py-20"
    />
  );
}

const isChunkLoadError = (error: unknown) =>
  error instanceof Error && /dynamically imported module|Importing a module script failed|error loading dynamically/i.test(error.message);

/** The error boundary of every route: sign-in when the session ended, "not found", or a retry. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const location = useLocation();

  if (isSignedOut(error)) return <Navigate to={paths.auth.signIn.getHref(location.pathname + location.search)} replace />;
  if ((isRouteErrorResponse(error) && error.status === 404) || isNotFound(error)) return <NotFoundContent />;

  const newVersion = isChunkLoadError(error);
  return (
    <EmptyState
      icon={CircleAlert}
      title={newVersion ? 'A newer version of Gridkeep is available' : 'This page could not be shown'}
      description={newVersion ? 'Reload to continue with the latest version.' : errorMessage(error)}
      action={
        <Button variant="primary" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      }
      className="py-20"
    />
  );
}
