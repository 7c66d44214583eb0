import { Plus } from 'lucide-react';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import type { ClientFilters } from '@/resources/clients';
import { CreateClientDialog } from '@/features/clients/components/client-form-dialog';
import { ClientsTable } from '@/features/clients/components/clients-table';
import { requireUser, staff } from '@/app/auth-guard';
import { useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { clientQueries } from '@/resources/clients';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** The filters live in the address, so a sorted, filtered list can be bookmarked. */
function filtersFrom(params: URLSearchParams): ClientFilters {
  return {
    q: params.get('q')?.trim() || undefined,
    sort: params.get('sort') === 'createdAt' ? 'createdAt' : undefined,
    dir: params.get('dir') === 'desc' ? 'desc' : undefined,
    archived: params.get('archived') === 'true' || undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  await queryClient.ensureInfiniteQueryData(clientQueries.list(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Clients');
  const user = useUser();
  const [filters, setFilters] = useListFilters(filtersFrom, { sort: 'name', dir: 'asc' });
  const [adding, setAdding] = useState(false);
  const canEdit = isOffice(user);
  const addButton = canEdit ? (
    <Button variant="primary" onClick={() => setAdding(true)} icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
      Add client
    </Button>
  ) : null;

  return (
    <>
      <PageHeader
        title="Clients"
        description="Every organisation whose walls you look after: service plan, contacts, sites and walls."
        actions={addButton}
      />
      <ClientsTable filters={filters} emptyAction={addButton} onFiltersChange={setFilters} />
      {canEdit ? <CreateClientDialog open={adding} onClose={() => setAdding(false)} /> : null}
    </>
  );
}
