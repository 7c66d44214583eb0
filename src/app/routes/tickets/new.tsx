import { ArrowLeft } from 'lucide-react';
import { Link, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { NewTicketForm } from '@/features/tickets/components/new-ticket-form';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { siteQueries } from '@/resources/sites';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  await queryClient.ensureQueryData(siteQueries.options()).catch(() => undefined);
  return null;
}

export function Component() {
  const user = useUser();
  const forClient = user.role === 'client';
  useDocumentTitle('Open a ticket');
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader
        eyebrow={
          <Link to={paths.tickets.getHref()} className="inline-flex items-center gap-1 hover:underline">
            <ArrowLeft className="h-4 w-4" aria-hidden="true" /> Tickets
          </Link>
        }
        title="Open a ticket"
        description={
          forClient
            ? 'Tell us what is wrong and where. The service desk answers within the times of your service plan.'
            : 'A ticket on behalf of a client: its due times come from the client’s service plan.'
        }
      />
      <NewTicketForm forClient={forClient} />
    </div>
  );
}
