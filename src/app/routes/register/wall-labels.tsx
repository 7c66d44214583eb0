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
import { cabinetQueries } from '@/resources/cabinets';
import { wallQueries } from '@/resources/walls';
import type { CabinetSummary } from '@shared/schemas/cabinets';
import { useMemo } from 'react';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  const id = idParam(params);
  await Promise.all([queryClient.ensureQueryData(wallQueries.detail(id)), queryClient.prefetchQuery(cabinetQueries.onWall(id))]);
  return null;
}

/** Labels in the order the crew meets the cabinets: row by row from the top, left to right. */
const byPosition = (a: CabinetSummary, b: CabinetSummary) => (a.row ?? 0) - (b.row ?? 0) || (a.column ?? 0) - (b.column ?? 0);

/** A printable sheet of QR labels, one per cabinet of the wall. */
export function Component() {
  const { id } = useParams() as { id: string };
  const wall = useQuery(wallQueries.detail(id));
  const cabinets = useQuery(cabinetQueries.onWall(id));
  useDocumentTitle(wall.data ? `Labels · ${wall.data.name}` : 'Labels');
  const items = useMemo(() => [...(cabinets.data ?? [])].sort(byPosition), [cabinets.data]);
  if (!wall.data) return <PageSpinner />;

  return (
    <>
      <PageHeader
        eyebrow={
          <Link to={paths.wall.getHref(id)} className="hover:underline">
            {wall.data.name}
          </Link>
        }
        title="QR labels"
        description="One label per cabinet with its serial and model: scanning it opens the cabinet in Gridkeep, where it is now. No position is printed, so a move or a swap never makes a label wrong. Prints three across, seven down (63 × 36 mm) on A4 or Letter."
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
        <CabinetLabelsSheet cabinets={items} origin={window.location.origin} />
      )}
    </>
  );
}
