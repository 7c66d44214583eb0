import { useQuery } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation, useNavigation, type LoaderFunctionArgs } from 'react-router-dom';
import { ClientLayout } from '@/components/layouts/client-layout';
import { OfficeLayout } from '@/components/layouts/office-layout';
import { TechnicianLayout } from '@/components/layouts/technician-layout';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useLogout } from '@/features/auth/api/mutations';
import { requireUser } from '@/app/auth-guard';
import { audienceOf, SessionProvider } from '@/lib/session';
import { sessionQueries } from '@/resources/session';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const shells = { office: OfficeLayout, technician: TechnicianLayout, client: ClientLayout };

/** Every signed-in screen sits in here: signed-out visitors go to sign-in and come back after. */
export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  return null;
}

export function Component() {
  const me = useQuery(sessionQueries.me());
  const location = useLocation();
  const navigation = useNavigation();
  const logout = useLogout();

  // The session ended while the app was open (a 401 somewhere, or the check on focus): sign in
  // and come back to where the person was going (the pending navigation's target, if any).
  if (me.data === null) {
    const back = navigation.location ?? location;
    return <Navigate to={paths.auth.signIn.getHref(back.pathname + back.search)} replace />;
  }
  if (!me.data) return <PageSpinner />;

  const user = me.data;
  const Shell = shells[audienceOf(user)];
  return (
    <SessionProvider user={user}>
      <Shell user={user} onSignOut={() => logout.mutate()} signingOut={logout.isPending}>
        <Outlet />
      </Shell>
    </SessionProvider>
  );
}
