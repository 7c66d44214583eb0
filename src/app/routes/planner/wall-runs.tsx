import { Calculator, Printer } from 'lucide-react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { Alert } from '@/components/ui/alert';
import { paths } from '@/config/paths';
import { RunsEditor } from '@/features/planner/components/runs-editor';
import { requireUser, staff } from '@/app/auth-guard';
import { errorMessage } from '@/lib/errors';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  // A wall that does not exist (or is out of reach) throws here and shows the not-found page.
  await queryClient.ensureQueryData(wallQueries.detail(params.id ?? ''));
  return null;
}

/** A wall's data and power runs: view and print for everyone on staff, edit for the office. */
export function Component() {
  const { id = '' } = useParams();
  const user = useUser();
  const wall = useQuery(wallQueries.detail(id));
  useDocumentTitle(wall.data ? `Runs · ${wall.data.name}` : 'Runs');

  if (wall.isPending) return <PageSpinner />;
  if (wall.isError) return <Alert tone="danger">{errorMessage(wall.error)}</Alert>;
  const w = wall.data;

  return (
    <>
      <PageHeader
        eyebrow={
          <>
            <Link to={paths.walls.getHref()} className="link">
              Walls
            </Link>{' '}
            · {w.clientName} · {w.siteName}
          </>
        }
        title={`Runs of ${w.name}`}
        description={`${w.columns} × ${w.rows} cabinets of ${w.cabinetModel.name}. Numbered arrows show the order the cable links the cabinets.`}
        actions={
          <>
            <ButtonLink to={paths.planner.getHref(w.id)} icon={<Calculator className="h-4 w-4" aria-hidden="true" />}>
              Open in the planner
            </ButtonLink>
            <ButtonLink to={paths.wallRunsPrint.getHref(w.id)} variant="primary" icon={<Printer className="h-4 w-4" aria-hidden="true" />}>
              Print for the crew
            </ButtonLink>
          </>
        }
      />
      <RunsEditor wall={w} canEdit={isOffice(user)} />
    </>
  );
}
