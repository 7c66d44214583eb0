import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { AuditTable } from '@/features/audit/components/audit-table';
import { adminOnly, requireUser } from '@/app/auth-guard';
import { idParam, textParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { auditQueries, type AuditFilters } from '@/resources/audit';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

function filtersFrom(params: URLSearchParams): AuditFilters {
  return {
    entity: textParam(params, 'entity', 40),
    entityId: textParam(params, 'entityId', 80),
    actorId: idParam(params, 'actorId'),
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, adminOnly);
  const filters = filtersFrom(new URL(request.url).searchParams);
  await queryClient.ensureInfiniteQueryData(auditQueries.list(filters)).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Audit log');
  const [filters, setFilters] = useListFilters(filtersFrom);
  return (
    <>
      <PageHeader title="Audit log" description="Who changed what, and when. Open a row to see the values before and after." />
      <AuditTable filters={filters} onFiltersChange={setFilters} />
    </>
  );
}
