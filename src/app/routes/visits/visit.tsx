import type { VisitDetail } from '@shared/schemas/visits';
import { useQuery } from '@tanstack/react-query';
import { ArrowLeft, Lock } from 'lucide-react';
import { data, Link, useLocation, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { VisitActions } from '@/features/visits/components/visit-actions';
import { VisitChecklist } from '@/features/visits/components/visit-checklist';
import { VisitOutcome } from '@/features/visits/components/visit-outcome';
import { VisitContacts, VisitPlace } from '@/features/visits/components/visit-place';
import { VisitRepairs } from '@/features/visits/components/visit-repairs';
import { VisitStatusBadge } from '@/features/visits/components/visit-status';
import { VisitWork } from '@/features/visits/components/visit-work';
import { useVisitChecklist } from '@/features/visits/hooks/use-visit-checklist';
import { visitWindowText } from '@/features/visits/utils/visit-time';
import { requireUser } from '@/app/auth-guard';
import { errorMessage } from '@/lib/errors';
import { queryClient } from '@/lib/query-client';
import { isRecordId } from '@/lib/record-id';
import { audienceOf, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { visitQueries } from '@/resources/visits';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request);
  const id = params.id ?? '';
  if (!isRecordId(id)) throw data('Not found', { status: 404 });
  await queryClient.ensureQueryData(visitQueries.detail(id));
  return null;
}

export function Component() {
  const { id = '' } = useParams();
  const visit = useQuery(visitQueries.detail(id));
  useDocumentTitle(visit.data ? `Visit: ${visit.data.site.name}` : 'Visit');
  if (visit.isPending) return <PageSpinner label="Loading the visit" />;
  if (visit.isError)
    return (
      <Alert tone="danger" title="The visit could not be loaded.">
        {errorMessage(visit.error)}
      </Alert>
    );
  return <VisitPage visit={visit.data} />;
}

/** A visit, phone first: what to do next, where and whom to ask, the work, the checklist, the repairs. */
function VisitPage({ visit }: { visit: VisitDetail }) {
  const audience = audienceOf(useUser());
  const open = visit.status === 'planned' || visit.status === 'in_progress';
  const checklist = useVisitChecklist(visit, visit.can.work && open);
  const working = visit.can.work && open;
  // Arrived here from the close form: say the report went out (the mail itself is queued with the close).
  const justClosed = (useLocation().state as { closed?: boolean } | null)?.closed === true && visit.status === 'completed';
  return (
    <>
      <PageHeader
        eyebrow={
          <Link
            to={audience === 'technician' ? paths.home.getHref() : paths.visits.getHref()}
            className="inline-flex min-h-touch items-center gap-1 hover:underline md:min-h-0"
          >
            <ArrowLeft className="h-4 w-4" aria-hidden="true" /> {audience === 'technician' ? 'Today' : 'Visits'}
          </Link>
        }
        title={visit.site.name}
        description={
          <span className="mt-1 flex flex-col gap-1.5">
            <span className="flex flex-wrap items-center gap-2">
              <span className="text-md font-semibold tabular-nums text-ink-900">
                {visitWindowText(visit.windowStart, visit.windowEnd, visit.site.timeZone)}
              </span>
              <VisitStatusBadge status={visit.status} size="md" />
            </span>
            <span className="text-base">
              {visit.kind === 'maintenance' ? 'Planned maintenance' : 'Ticket visit'} · {visit.technicians.map((t) => t.name).join(', ')}
            </span>
          </span>
        }
      />
      <div className="space-y-5">
        {justClosed ? <Alert tone="success" title="Visit closed." /> : null}
        {visit.status === 'completed' ? (
          <VisitOutcome visit={visit} mailed={justClosed || Boolean(visit.reportSentAt)} forClient={audience === 'client'} />
        ) : null}
        {visit.status === 'cancelled' ? (
          <Alert tone="info" title="This visit was cancelled.">
            {visit.cancelReason || null}
          </Alert>
        ) : null}
        <VisitActions visit={visit} />
        {working ? <ServiceCaution /> : null}
        <VisitPlace visit={visit} />
        <VisitContacts contacts={visit.contacts} />
        <VisitWork visit={visit} />
        <VisitChecklist
          items={checklist.items}
          onToggle={working ? checklist.toggle : undefined}
          state={checklist.state}
          error={checklist.error}
          onRetry={checklist.retry}
        />
        <VisitRepairs visit={visit} />
        {audience !== 'client' && visit.internalNotes ? (
          <Card
            title={
              <span className="inline-flex items-center gap-2">
                <Lock className="h-4 w-4 text-ink-600" aria-hidden="true" />
                Internal notes
              </span>
            }
            description="Not shown to the client."
          >
            <p className="whitespace-pre-line text-base text-stone-900">{visit.internalNotes}</p>
          </Card>
        ) : null}
      </div>
    </>
  );
}
