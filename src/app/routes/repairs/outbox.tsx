import { PageHeader } from '@/components/ui/page-header';
import { OutboxList } from '@/features/repairs/components/outbox-list';
import { requireUser, staff } from '@/app/auth-guard';
import { useDocumentTitle } from '@/lib/use-document-title';
import type { LoaderFunctionArgs } from 'react-router-dom';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  return null;
}

/** The repairs kept on this phone: waiting for the network, or refused and waiting for the technician. */
export function Component() {
  useDocumentTitle('Outbox');
  return (
    <>
      <PageHeader
        title="Outbox"
        description="Repairs logged on this phone that the server does not have yet. They stay here, even with the app closed, until they are sent."
        className="mb-4"
      />
      <OutboxList />
    </>
  );
}
