import type { LoaderFunctionArgs } from 'react-router-dom';
import { cabinetStatuses, type CabinetStatus } from '@shared/schemas/enums';
import { PageHeader } from '@/components/ui/page-header';
import type { CabinetFilters } from '@/resources/cabinets';
import { CabinetsTable } from '@/features/cabinets/components/cabinets-table';
import { usePlaceFilterOptions } from '@/app/use-place-filter-options';
import { requireUser } from '@/app/auth-guard';
import { idParam, textParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { cabinetQueries } from '@/resources/cabinets';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** The filters live in the address: `/cabinets?batch=…` is the list of a batch recall. */
function filtersFrom(params: URLSearchParams): CabinetFilters {
  const status = params.get('status');
  const sort = params.get('sort');
  return {
    serial: textParam(params, 'serial', 64),
    batch: textParam(params, 'batch', 40),
    clientId: idParam(params, 'clientId'),
    siteId: idParam(params, 'siteId'),
    modelId: idParam(params, 'modelId'),
    status: cabinetStatuses.includes(status as CabinetStatus) ? (status as CabinetStatus) : undefined,
    sort: sort === 'batch' || sort === 'installedOn' ? sort : undefined,
    dir: params.get('dir') === 'desc' ? 'desc' : undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  await queryClient.ensureInfiniteQueryData(cabinetQueries.list(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Cabinets');
  const user = useUser();
  const staff = user.role !== 'client';
  const [filters, setFilters] = useListFilters(filtersFrom, { sort: 'serial', dir: 'asc' });
  const filterOptions = usePlaceFilterOptions(staff, filters.clientId);

  return (
    <>
      <PageHeader
        title="Cabinets"
        description={
          staff
            ? 'Every registered cabinet, on a wall or in stock. For a batch recall, filter by the batch code or follow a batch from any row.'
            : "The cabinets of your organisation's walls."
        }
      />
      <CabinetsTable filters={filters} staff={staff} filterOptions={filterOptions} onFiltersChange={setFilters} />
    </>
  );
}
