import { Grid3x3, SearchX } from 'lucide-react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { CabinetFacts } from '@/features/cabinets/components/cabinet-card';
import { CabinetHistory } from '@/features/cabinets/components/cabinet-history';
import { CabinetStatusPill, cabinetStatusLabels } from '@/features/cabinets/components/cabinet-status';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { requireUser } from '@/app/auth-guard';
import { errorMessage, isNotFound } from '@/lib/errors';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { cabinetQueries } from '@/resources/cabinets';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request);
  // Not found is answered on the page itself ("no cabinet has this serial"), not as an error.
  await queryClient.prefetchQuery(cabinetQueries.bySerial(params.serial ?? ''));
  return null;
}

/** Where a cabinet's QR label lands: phone first, the serial and model as printed, where it is now, its history. */
export function Component() {
  const { serial = '' } = useParams();
  const user = useUser();
  const query = useQuery(cabinetQueries.bySerial(serial));
  const cabinet = query.data;
  useDocumentTitle(cabinet ? `Cabinet ${cabinet.serial}` : `Cabinet ${serial}`);

  if (query.isPending) return <PageSpinner />;
  if (query.isError) {
    return isNotFound(query.error) ? (
      <EmptyState
        icon={SearchX}
        title={`No cabinet has the serial “${serial}”`}
        description="The label may belong to a cabinet that is not registered yet, or to another organisation."
        action={
          <Link to={paths.search.getHref(serial)} className="link">
            Search for it
          </Link>
        }
        className="py-16"
      />
    ) : (
      <Alert tone="danger" title="The cabinet could not be loaded.">
        {errorMessage(query.error)}
      </Alert>
    );
  }
  if (!cabinet) return null;
  const staff = user.role !== 'client';

  return (
    <div className="mx-auto max-w-2xl space-y-5">
      <header className="space-y-2">
        <p className="text-sm font-semibold uppercase tracking-wide text-stone-600">Cabinet</p>
        <h1 className="break-all font-mono text-[1.75rem] font-bold leading-tight text-ink-950 sm:text-[2.25rem]">{cabinet.serial}</h1>
        <p className="text-lg text-ink-900" data-testid="cabinet-model">
          {cabinet.model.name}
        </p>
        <CabinetStatusPill status={cabinet.status} className="text-sm" />
      </header>

      {/* The label prints no position (a move or a swap would make it wrong): this is where the cabinet is now. */}
      {cabinet.wall ? (
        <Card title="Where it is now">
          <div className="space-y-3">
            <div>
              <p className="text-xs font-semibold text-stone-600">Position</p>
              <p className="text-[2.5rem] font-bold leading-tight tabular-nums text-ink-950" data-testid="cabinet-position">
                {cabinet.position ?? '—'}
              </p>
              <p className="text-sm text-stone-600">Counted from the top-left as the audience sees the wall.</p>
            </div>
            <div>
              <p className="text-xs font-semibold text-stone-600">Wall</p>
              <p className="text-lg font-semibold text-ink-900">{cabinet.wall.name}</p>
              <p className="text-stone-700">
                {cabinet.wall.siteName} · {cabinet.wall.clientName}
              </p>
            </div>
            <ButtonLink
              to={paths.wall.getHref(cabinet.wall.id, { col: cabinet.column ?? undefined, row: cabinet.row ?? undefined })}
              variant="primary"
              size="lg"
              className="w-full sm:w-auto"
              icon={<Grid3x3 className="h-5 w-5" aria-hidden="true" />}
            >
              Open on the wall map
            </ButtonLink>
          </div>
        </Card>
      ) : (
        <Alert tone="info" title={`Where it is now: not on a wall (${cabinetStatusLabels[cabinet.status].toLowerCase()})`}>
          <span data-testid="cabinet-kept">
            {cabinet.stockLocation ? `Kept at ${cabinet.stockLocation.name}.` : 'This cabinet is not installed on any wall.'}
          </span>
        </Alert>
      )}

      {staff && cabinet.wall ? <ServiceCaution /> : null}

      <Card title="Details">
        <CabinetFacts cabinet={cabinet} />
      </Card>
      <Card title="History">
        <CabinetHistory events={cabinet.history} truncated={cabinet.historyTruncated} />
      </Card>
    </div>
  );
}
