import { Outlet, ScrollRestoration, useNavigation } from 'react-router-dom';
import { PageSpinner } from '@/components/ui/spinner';
import { Logo } from '@/components/ui/logo';
import { RouteErrorBoundary } from '@/app/route-error';

/** A thin bar at the very top while the next screen loads. */
function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div className="fixed inset-x-0 top-0 z-[60] h-0.5 overflow-hidden bg-amber-100" role="progressbar" aria-label="Loading the page">
      <div className="h-full w-2/5 animate-progress bg-amber-400" />
    </div>
  );
}

export function Component() {
  return (
    <>
      <NavigationProgress />
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

export function HydrateFallback() {
  return <PageSpinner label="Starting Gridkeep" />;
}

/** Last resort, outside every shell. */
export function ErrorBoundary() {
  return (
    <div className="min-h-dvh bg-stone-50 px-4 py-10">
      <div className="mx-auto max-w-lg">
        <Logo tone="dark" />
        <RouteErrorBoundary />
      </div>
    </div>
  );
}
