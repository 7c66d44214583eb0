import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { auditInfiniteQueryOptions } from '@/features/audit/api/get-audit-events';
import type { AuditFilters } from '@/features/audit/api/keys';
import { AuditTable } from '@/features/audit/components/audit-table';
import { adminOnly, requireUser } from '@/app/auth-guard';
import { idParam, textParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
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
  await queryClient.ensureInfiniteQueryData(auditInfiniteQueryOptions(filters)).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Audit log');
  const [filters, setFilters] = useListFilters(filtersFrom);
  return (
    <>
      <PageHeader title="Audit log" description="Who changed what, and when. Open a row to see the values before and after." />
      <AuditTable
        filters={filters}
        onFiltersChange={setFilters}
      />
    </>
  );
}
