import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { MailboxView } from '@/features/mailbox/components/mailbox-view';
import { adminOnly, requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { mailboxQueries } from '@/resources/mailbox';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, adminOnly);
  await queryClient.ensureQueryData(mailboxQueries.list()).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Mailbox');
  return (
    <>
      <PageHeader
        title="Development mailbox"
        description="Every e-mail Gridkeep sent while it runs with the local mail server: invitations, reset links, ticket notices."
      />
      <MailboxView />
    </>
  );
}
