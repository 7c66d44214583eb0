import { redirect, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { safeNext } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { sessionQueries } from '@/resources/session';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** Someone already signed in goes straight on. */
export async function loader({ request }: LoaderFunctionArgs) {
  const user = await queryClient.ensureQueryData(sessionQueries.me()).catch(() => null);
  if (user) throw redirect(safeNext(new URL(request.url).searchParams.get('next')));
  return null;
}

export function Component() {
  useDocumentTitle('Sign in');
  const [params] = useSearchParams();
  const next = params.get('next');
  return (
    <AuthLayout
      title="Sign in to Gridkeep"
      description={
        next && next !== '/' ? 'Sign in to continue where you were going.' : 'Use the e-mail address your invitation was sent to.'
      }
    >
      <SignInForm next={next} defaultEmail={params.get('email') ?? ''} />
    </AuthLayout>
  );
}
