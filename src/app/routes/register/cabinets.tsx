import { useMemo } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { cabinetStatuses, type CabinetStatus } from '@shared/schemas/enums';
import { PageHeader } from '@/components/ui/page-header';
import { cabinetsInfiniteQueryOptions } from '@/features/cabinets/api/get-cabinets';
import type { CabinetFilters } from '@/features/cabinets/api/keys';
import { CabinetsTable } from '@/features/cabinets/components/cabinets-table';
import { useCabinetModels } from '@/features/catalogue/api/get-cabinet-models';
import { useClientOptions } from '@/features/clients/api/get-clients';
import { useSites } from '@/features/sites/api/get-sites';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const idParam = (params: URLSearchParams, key: string) => {
  const v = params.get(key) ?? '';
  return uuid.test(v) ? v : undefined;
};
const textParam = (params: URLSearchParams, key: string, max: number) => params.get(key)?.trim().slice(0, max) || undefined;

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
  await queryClient.ensureInfiniteQueryData(cabinetsInfiniteQueryOptions(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Cabinets');
  const user = useUser();
  const staff = user.role !== 'client';
  const [params, setParams] = useSearchParams();
  const filters = filtersFrom(params);

  // The filters' choices: client users have one organisation, so no client filter.
  const clients = useClientOptions(staff);
  const sites = useSites({ clientId: filters.clientId });
  const models = useCabinetModels();
  const clientOptions = useMemo(() => (clients.data ?? []).map((c) => ({ value: c.id, label: c.name })), [clients.data]);
  const siteOptions = useMemo(
    () => (sites.data?.items ?? []).map((s) => ({ value: s.id, label: staff && !filters.clientId ? `${s.name} (${s.clientName})` : s.name })),
    [sites.data, staff, filters.clientId],
  );
  const modelOptions = useMemo(() => (models.data?.items ?? []).map((m) => ({ value: m.id, label: m.name })), [models.data]);

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
      <CabinetsTable
        filters={filters}
        staff={staff}
        clientOptions={staff ? clientOptions : undefined}
        siteOptions={siteOptions}
        modelOptions={modelOptions}
        onFiltersChange={(next) =>
          setParams(
            (prev) => {
              const p = new URLSearchParams(prev);
              for (const [key, value] of Object.entries(next)) {
                if (value === undefined || value === '') p.delete(key);
                else p.set(key, String(value));
              }
              // Defaults stay out of the address.
              if (p.get('sort') === 'serial') p.delete('sort');
              if (p.get('dir') === 'asc') p.delete('dir');
              return p;
            },
            { replace: true },
          )
        }
      />
    </>
  );
}
