import { Plus } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { useCabinetModels } from '@/features/catalogue/api/get-cabinet-models';
import { useClientOptions } from '@/features/clients/api/get-clients';
import { useSites } from '@/features/sites/api/get-sites';
import { wallsInfiniteQueryOptions } from '@/features/walls/api/get-walls';
import type { WallFilters } from '@/features/walls/api/keys';
import { CreateWallDialog } from '@/features/walls/components/wall-form-dialog';
import { WallsTable } from '@/features/walls/components/walls-table';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const idParam = (params: URLSearchParams, key: string) => {
  const v = params.get(key) ?? '';
  return uuid.test(v) ? v : undefined;
};

function filtersFrom(params: URLSearchParams): WallFilters {
  return {
    q: params.get('q')?.trim() || undefined,
    clientId: idParam(params, 'clientId'),
    siteId: idParam(params, 'siteId'),
    cabinetModelId: idParam(params, 'cabinetModelId'),
    sort: params.get('sort') === 'createdAt' ? 'createdAt' : undefined,
    dir: params.get('dir') === 'desc' ? 'desc' : undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  await queryClient.ensureInfiniteQueryData(wallsInfiniteQueryOptions(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Walls');
  const user = useUser();
  const staff = user.role !== 'client';
  const canEdit = isOffice(user);
  const [params, setParams] = useSearchParams();
  const filters = filtersFrom(params);
  const [adding, setAdding] = useState(false);

  // The filters' choices: client users have one organisation, so no client filter.
  const clients = useClientOptions(staff);
  const sites = useSites({ clientId: filters.clientId });
  const allSites = useSites({}, canEdit && adding);
  const models = useCabinetModels();
  const clientOptions = useMemo(() => (clients.data ?? []).map((c) => ({ value: c.id, label: c.name })), [clients.data]);
  const siteOptions = useMemo(
    () => (sites.data?.items ?? []).map((s) => ({ value: s.id, label: staff && !filters.clientId ? `${s.name} (${s.clientName})` : s.name })),
    [sites.data, staff, filters.clientId],
  );
  const modelOptions = useMemo(() => (models.data?.items ?? []).map((m) => ({ value: m.id, label: m.name })), [models.data]);

  const addButton = canEdit ? (
    <Button variant="primary" onClick={() => setAdding(true)} icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
      Add wall
    </Button>
  ) : null;

  return (
    <>
      <PageHeader
        title="Walls"
        description={staff ? 'Every installed wall: open one for its map, cabinets, history and documents.' : "Your organisation's walls."}
        actions={addButton}
      />
      <WallsTable
        filters={filters}
        clientOptions={staff ? clientOptions : undefined}
        siteOptions={siteOptions}
        modelOptions={modelOptions}
        emptyAction={addButton}
        onFiltersChange={(next) =>
          setParams(
            (prev) => {
              const p = new URLSearchParams(prev);
              for (const [key, value] of Object.entries(next)) {
                if (value === undefined || value === '') p.delete(key);
                else p.set(key, String(value));
              }
              if (p.get('sort') === 'name') p.delete('sort');
              if (p.get('dir') === 'asc') p.delete('dir');
              return p;
            },
            { replace: true },
          )
        }
      />
      {canEdit ? (
        <CreateWallDialog
          open={adding}
          onClose={() => setAdding(false)}
          models={models.data?.items ?? []}
          sites={(allSites.data?.items ?? []).map((s) => ({ value: s.id, label: `${s.name} (${s.clientName})` }))}
        />
      ) : null}
    </>
  );
}
