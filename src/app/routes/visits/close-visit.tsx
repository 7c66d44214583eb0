import type { VisitDetail } from '@shared/schemas/visits';
import { ArrowLeft } from 'lucide-react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { CloseVisitForm } from '@/features/visits/components/close-visit-form';
import { VisitGate } from '@/features/visits/components/visit-gate';
import { formatSiteWindow } from '@/lib/site-time';
import { staff } from '@/app/auth-guard';
import { visitLoader } from '@/app/routes/visits/load-visit';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export const loader = visitLoader(staff);

export function Component() {
  const { id = '' } = useParams();
  return (
    <VisitGate id={id} title="Close visit">
      {(visit) => <ClosePage visit={visit} />}
    </VisitGate>
  );
}

/** Closing a visit on the phone: summary, checklist, the client's signature; then back to the visit. */
function ClosePage({ visit }: { visit: VisitDetail }) {
  const navigate = useNavigate();
  const back = paths.visit.getHref(visit.id);
  const open = visit.status === 'planned' || visit.status === 'in_progress';
  const repairs = visit.repairs.length;
  return (
    <>
      <PageHeader
        eyebrow={
          <Link to={back} className="inline-flex min-h-touch items-center gap-1 hover:underline md:min-h-0">
            <ArrowLeft className="h-4 w-4" aria-hidden="true" /> The visit
          </Link>
        }
        title="Close visit"
        description={
          <>
            {visit.site.name} · {formatSiteWindow(visit.windowStart, visit.windowEnd, visit.site.timeZone)}
            <span className="block">
              {repairs === 0 ? 'No repairs logged.' : repairs === 1 ? '1 repair logged.' : `${repairs} repairs logged.`} The report lists
              them for the client.
            </span>
          </>
        }
      />
      {!visit.can.work ? (
        <Alert tone="info" title="Only the visit's technicians close it.">
          <Link to={back} className="link">
            Back to the visit
          </Link>
        </Alert>
      ) : !open ? (
        <Alert tone="info" title={visit.status === 'completed' ? 'This visit is already closed.' : 'This visit was cancelled.'}>
          <Link to={back} className="link">
            Back to the visit
          </Link>
        </Alert>
      ) : (
        <CloseVisitForm visit={visit} onClosed={() => navigate(back, { state: { closed: true } })} />
      )}
    </>
  );
}
