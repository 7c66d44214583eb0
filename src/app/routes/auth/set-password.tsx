import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { SetPasswordForm } from '@/features/auth/components/set-password-form';
import { errorMessage, isNotFound } from '@/lib/errors';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { sessionQueries } from '@/resources/session';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** Looks the link up before the page shows, so it opens on the right words. */
export async function loader({ request }: LoaderFunctionArgs) {
  const token = new URL(request.url).searchParams.get('token');
  if (token) await queryClient.ensureQueryData(sessionQueries.linkToken(token)).catch(() => undefined);
  return null;
}

export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const link = useQuery({ ...sessionQueries.linkToken(token), enabled: Boolean(token) });
  useDocumentTitle(link.data?.kind === 'invite' ? 'Welcome' : 'Set a new password');

  if (!token || link.isError) {
    const expired = !token || isNotFound(link.error);
    return (
      <AuthLayout title={expired ? 'This link does not work any more' : 'The link could not be checked'}>
        <div className="space-y-5">
          <Alert tone={expired ? 'info' : 'danger'}>
            {expired
              ? 'Links to set a password work once and expire after a while. This one was already used, has expired, or was copied incompletely.'
              : errorMessage(link.error)}
          </Alert>
          <ButtonLink to={paths.auth.forgotPassword.getHref()} variant="primary" size="lg" className="w-full">
            Send me a new link
          </ButtonLink>
          <p className="text-center text-base">
            <Link to={paths.auth.signIn.getHref()} className="link">
              Back to sign-in
            </Link>
          </p>
        </div>
      </AuthLayout>
    );
  }

  if (!link.data) return <PageSpinner label="Checking the link" />;
  const invite = link.data.kind === 'invite';

  return (
    <AuthLayout
      title={invite ? `Welcome to Gridkeep, ${firstName(link.data.name)}` : 'Set a new password'}
      description={
        invite ? (
          <>
            Choose a password for <strong className="font-semibold text-stone-800">{link.data.email}</strong>. You will be signed in
            straight away.
          </>
        ) : (
          <>
            For <strong className="font-semibold text-stone-800">{link.data.email}</strong>. Other sign-ins with the old password stop
            working.
          </>
        )
      }
    >
      <SetPasswordForm token={token} link={link.data} />
    </AuthLayout>
  );
}
