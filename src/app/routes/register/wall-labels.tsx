import { Printer, QrCode } from 'lucide-react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { CabinetLabelsSheet } from '@/features/cabinets/components/cabinet-labels-sheet';
import { requireUser, staff } from '@/app/auth-guard';
import { errorMessage } from '@/lib/errors';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { idParam } from '@/app/routes/register/id-param';
import { useQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  const id = idParam(params);
  await Promise.all([queryClient.ensureQueryData(wallQueries.detail(id)), queryClient.prefetchQuery(wallQueries.cabinets(id))]);
  return null;
}

/** A printable sheet of QR labels, one per cabinet of the wall. */
export function Component() {
  const { id } = useParams() as { id: string };
  const wall = useQuery(wallQueries.detail(id));
  const cabinets = useQuery(wallQueries.cabinets(id));
  useDocumentTitle(wall.data ? `Labels · ${wall.data.name}` : 'Labels');
  if (!wall.data) return <PageSpinner />;
  const items = cabinets.data?.items ?? [];

  return (
    <>
      <PageHeader
        eyebrow={
          <Link to={paths.wall.getHref(id)} className="hover:underline">
            {wall.data.name}
          </Link>
        }
        title="QR labels"
        description="One label per cabinet: scanning it opens the cabinet in Gridkeep. Prints three across, seven down (63 × 36 mm) on A4 or Letter."
        actions={
          <Button
            variant="primary"
            onClick={() => window.print()}
            disabled={items.length === 0}
            icon={<Printer className="h-4 w-4" aria-hidden="true" />}
          >
            Print
          </Button>
        }
      />
      {cabinets.isPending ? (
        <PageSpinner />
      ) : cabinets.isError ? (
        <Alert tone="danger" title="The cabinets could not be loaded.">
          {errorMessage(cabinets.error)}
        </Alert>
      ) : items.length === 0 ? (
        <EmptyState icon={QrCode} title="No cabinets on this wall yet" description="Register or import the cabinets first." />
      ) : (
        <CabinetLabelsSheet
          wall={{ name: wall.data.name, siteName: wall.data.siteName, clientName: wall.data.clientName }}
          cabinets={items}
          origin={window.location.origin}
        />
      )}
    </>
  );
}
