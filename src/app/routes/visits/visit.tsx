import { TZDate } from '@date-fns/tz';
import type { Position } from '@shared/schemas/cabinets';
import type { VisitDetail } from '@shared/schemas/visits';
import { format, parseISO } from 'date-fns';
import { ArrowLeft, CalendarCog, Lock } from 'lucide-react';
import { useState } from 'react';
import { Link, useLocation, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { CabinetCellDialog } from '@/features/cabinets/components/cabinet-card';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { VisitActions } from '@/features/visits/components/visit-actions';
import { VisitChecklist } from '@/features/visits/components/visit-checklist';
import { VisitGate } from '@/features/visits/components/visit-gate';
import { VisitOutcome } from '@/features/visits/components/visit-outcome';
import { VisitContacts, VisitPlace } from '@/features/visits/components/visit-place';
import { VisitRepairs } from '@/features/visits/components/visit-repairs';
import { VisitStatusBadge } from '@/features/visits/components/visit-status';
import { VisitWork } from '@/features/visits/components/visit-work';
import { useVisitChecklist } from '@/features/visits/hooks/use-visit-checklist';
import { formatSiteWindow } from '@/lib/site-time';
import { visitLoader } from '@/app/routes/visits/load-visit';
import { audienceOf, useUser } from '@/lib/session';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export const loader = visitLoader();

export function Component() {
  const { id = '' } = useParams();
  return (
    <VisitGate id={id} title="Visit">
      {(visit) => <VisitPage visit={visit} />}
    </VisitGate>
  );
}

/** The office moves, reassigns or cancels a visit in dispatch: its week, with the visit open. */
function MoveInDispatch({ visit }: { visit: VisitDetail }) {
  const week = format(new TZDate(parseISO(visit.windowStart), visit.site.timeZone), 'yyyy-MM-dd');
  return (
    <ButtonLink to={paths.dispatch.getHref({ week, visit: visit.id })} icon={<CalendarCog className="h-4 w-4" aria-hidden="true" />}>
      Move or cancel
    </ButtonLink>
  );
}

/** A visit, phone first: what to do next, where and whom to ask, the work, the checklist, the repairs. */
function VisitPage({ visit }: { visit: VisitDetail }) {
  const audience = audienceOf(useUser());
  const open = visit.status === 'planned' || visit.status === 'in_progress';
  const checklist = useVisitChecklist(visit, visit.can.work && open);
  const working = visit.can.work && open;
  // Arrived here from the close form: say the report went out (the mail itself is queued with the close).
  const justClosed = (useLocation().state as { closed?: boolean } | null)?.closed === true && visit.status === 'completed';
  // A cell tapped on the wall map: its cabinet card, with "Log repair" on this visit while it is worked.
  const [openCell, setOpenCell] = useState<Position | null>(null);
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
                {formatSiteWindow(visit.windowStart, visit.windowEnd, visit.site.timeZone)}
              </span>
              <VisitStatusBadge status={visit.status} size="md" />
            </span>
            <span className="text-base">
              {visit.kind === 'maintenance' ? 'Planned maintenance' : 'Ticket visit'} · {visit.technicians.map((t) => t.name).join(', ')}
            </span>
          </span>
        }
        actions={visit.can.edit ? <MoveInDispatch visit={visit} /> : null}
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
        <VisitWork visit={visit} onOpenCell={setOpenCell} />
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
      {visit.wall ? (
        <CabinetCellDialog
          wall={visit.wall}
          position={openCell}
          onClose={() => setOpenCell(null)}
          canOperate={audience !== 'client'}
          visitId={working ? visit.id : undefined}
        />
      ) : null}
    </>
  );
}
