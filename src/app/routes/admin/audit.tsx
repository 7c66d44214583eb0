import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { auditInfiniteQueryOptions } from '@/features/audit/api/get-audit-events';
import type { AuditFilters } from '@/features/audit/api/keys';
import { AuditTable } from '@/features/audit/components/audit-table';
import { adminOnly, requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function filtersFrom(params: URLSearchParams): AuditFilters {
  const actorId = params.get('actorId') ?? '';
  return {
    entity: params.get('entity')?.trim() || undefined,
    entityId: params.get('entityId')?.trim() || undefined,
    actorId: uuidPattern.test(actorId) ? actorId : undefined,
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
  const [params, setParams] = useSearchParams();
  const filters = filtersFrom(params);
  return (
    <>
      <PageHeader title="Audit log" description="Who changed what, and when. Open a row to see the values before and after." />
      <AuditTable
        filters={filters}
        onFiltersChange={(next) =>
          setParams(
            () => {
              const p = new URLSearchParams();
              for (const [key, value] of Object.entries(next)) if (value) p.set(key, value);
              return p;
            },
            { replace: true },
          )
        }
      />
    </>
  );
}
