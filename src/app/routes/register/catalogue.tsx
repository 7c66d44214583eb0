import { Plus } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { SectionTabs } from '@/components/ui/section-tabs';
import { paths } from '@/config/paths';
import { CreateCabinetModelDialog } from '@/features/catalogue/components/cabinet-model-form-dialog';
import { CabinetModelsTable } from '@/features/catalogue/components/cabinet-models-table';
import { CreateControllerDialog } from '@/features/catalogue/components/controller-form-dialog';
import { ControllersTable } from '@/features/catalogue/components/controllers-table';
import { requireUser, staff } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { controllerQueries } from '@/resources/controllers';
import { wallQueries } from '@/resources/walls';
import { useQuery } from '@tanstack/react-query';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

type Tab = 'models' | 'controllers';
const tabFrom = (params: URLSearchParams): Tab => (params.get('tab') === 'controllers' ? 'controllers' : 'models');

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  const tab = tabFrom(new URL(request.url).searchParams);
  if (tab === 'models') await queryClient.prefetchQuery(cabinetModelQueries.list());
  else await queryClient.prefetchQuery(controllerQueries.list());
  return null;
}

/** Cabinet models (what walls are built from) and controllers (what drives them). */
export function Component() {
  useDocumentTitle('Catalogue');
  const user = useUser();
  const canEdit = isOffice(user);
  const [params] = useSearchParams();
  const tab = tabFrom(params);
  const [adding, setAdding] = useState(false);
  const walls = useQuery({ ...wallQueries.page({}), enabled: tab === 'controllers' && canEdit });
  const wallOptions = useMemo(
    () => (walls.data?.items ?? []).map((w) => ({ value: w.id, label: `${w.name} (${w.siteName}, ${w.clientName})` })),
    [walls.data],
  );

  return (
    <>
      <PageHeader
        title="Catalogue"
        description="Cabinet models with their data-sheet figures, and every controller with the wall it drives."
        actions={
          canEdit ? (
            <Button variant="primary" onClick={() => setAdding(true)} icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
              {tab === 'models' ? 'Add cabinet model' : 'Add controller'}
            </Button>
          ) : null
        }
      />
      <SectionTabs
        label="Catalogue sections"
        current={tab}
        tabs={[
          { key: 'models', label: 'Cabinet models', to: paths.catalogue.getHref() },
          { key: 'controllers', label: 'Controllers', to: paths.catalogue.getHref('controllers') },
        ]}
      />
      {tab === 'models' ? <CabinetModelsTable canEdit={canEdit} /> : <ControllersTable canEdit={canEdit} wallOptions={wallOptions} />}
      {canEdit && tab === 'models' ? <CreateCabinetModelDialog open={adding} onClose={() => setAdding(false)} /> : null}
      {canEdit && tab === 'controllers' ? (
        <CreateControllerDialog open={adding} onClose={() => setAdding(false)} wallOptions={wallOptions} />
      ) : null}
    </>
  );
}
