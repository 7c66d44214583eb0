import { Plus } from 'lucide-react';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { usePlaceFilterOptions } from '@/app/use-place-filter-options';
import type { WallFilters } from '@/resources/walls';
import { CreateWallDialog } from '@/features/walls/components/wall-form-dialog';
import { WallsTable } from '@/features/walls/components/walls-table';
import { requireUser } from '@/app/auth-guard';
import { idParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { siteQueries } from '@/resources/sites';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

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
  await queryClient.ensureInfiniteQueryData(wallQueries.list(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Walls');
  const user = useUser();
  const staff = user.role !== 'client';
  const canEdit = isOffice(user);
  const [filters, setFilters] = useListFilters(filtersFrom, { sort: 'name', dir: 'asc' });
  const [adding, setAdding] = useState(false);
  const filterOptions = usePlaceFilterOptions(staff, filters.clientId);
  const models = useQuery(cabinetModelQueries.list());
  const allSites = useQuery({ ...siteQueries.options({}), enabled: canEdit && adding });

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
      <WallsTable filters={filters} filterOptions={filterOptions} emptyAction={addButton} onFiltersChange={setFilters} />
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
