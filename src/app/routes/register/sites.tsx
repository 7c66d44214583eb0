import { useMemo } from 'react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import type { SiteFilters } from '@/resources/sites';
import { SitesTable } from '@/features/sites/components/sites-table';
import { requireUser } from '@/app/auth-guard';
import { idParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { clientQueries } from '@/resources/clients';
import { siteQueries } from '@/resources/sites';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** The filters live in the address, so a sorted, filtered list can be bookmarked. */
function filtersFrom(params: URLSearchParams): SiteFilters {
  const sort = params.get('sort');
  return {
    q: params.get('q')?.trim() || undefined,
    clientId: idParam(params, 'clientId'),
    sort: sort === 'city' || sort === 'createdAt' ? sort : undefined,
    dir: params.get('dir') === 'desc' ? 'desc' : undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  await queryClient.ensureInfiniteQueryData(siteQueries.list(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Sites');
  const user = useUser();
  const staff = user.role !== 'client';
  const [filters, setFilters] = useListFilters(filtersFrom, { sort: 'name', dir: 'asc' });
  // Client users have one organisation, so no client filter.
  const clients = useQuery({ ...clientQueries.options(), enabled: staff });
  const clientOptions = useMemo(() => (clients.data ?? []).map((c) => ({ value: c.id, label: c.name })), [clients.data]);

  return (
    <>
      <PageHeader
        title="Sites"
        description={staff ? 'Every place where a client has walls: address, time zone and access notes.' : "Your organisation's sites."}
      />
      <SitesTable filters={filters} staff={staff} clientOptions={staff ? clientOptions : undefined} onFiltersChange={setFilters} />
    </>
  );
}
