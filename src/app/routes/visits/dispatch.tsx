import type { VisitListItem, VisitRef } from '@shared/schemas/visits';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { format } from 'date-fns';
import { CalendarPlus, List } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs, type ShouldRevalidateFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { PageHeader } from '@/components/ui/page-header';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useToast } from '@/components/ui/toast';
import { useUpdateVisit } from '@/features/dispatch/api/mutations';
import { DispatchGrid } from '@/features/dispatch/components/dispatch-grid';
import { EditVisitDialog, movedMessage } from '@/features/dispatch/components/edit-visit-dialog';
import { PlanVisitDialog } from '@/features/dispatch/components/plan-visit-dialog';
import { ConflictSummary, WeekBar } from '@/features/dispatch/components/week-bar';
import {
  doubleBookings,
  movedToDate,
  replaceTechnician,
  shiftWeek,
  siteDate,
  weekDays,
  weekStartOf,
  weekWindow,
} from '@/features/dispatch/utils/week';
import { office, requireUser } from '@/app/auth-guard';
import { errorMessage } from '@/lib/errors';
import { idParam } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { userQueries } from '@/resources/users';
import { visitQueries } from '@/resources/visits';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const weekQuery = (monday: string) => visitQueries.range(weekWindow(monday));

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, office);
  const monday = weekStartOf(new URL(request.url).searchParams.get('week'));
  // Warm the cache; a failure shows on the page (with a retry) rather than instead of it.
  await Promise.all([
    queryClient.ensureQueryData(weekQuery(monday)).catch(() => undefined),
    queryClient.ensureQueryData(userQueries.staff()).catch(() => undefined),
  ]);
  return null;
}

/**
 * The loader warms the first load only. Choosing another week changes the address at once and the
 * page's own query fetches (showing the previous answer meanwhile); a loader run would hold the
 * address back, and a second quick change would then be written over the old one.
 */
export const shouldRevalidate = ({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) =>
  currentUrl.pathname === nextUrl.pathname ? false : defaultShouldRevalidate;

/** The rows: the team's technicians by name, then anyone else booked this week (e.g. someone who has left). */
function rowsOf(staff: { id: string; name: string; role: string }[], visits: VisitListItem[]): VisitRef[] {
  const rows: VisitRef[] = staff.filter((s) => s.role === 'technician').map(({ id, name }) => ({ id, name }));
  for (const v of visits) for (const t of v.technicians) if (!rows.some((r) => r.id === t.id)) rows.push(t);
  return rows;
}

/** The office's week: every technician's visits by day; plan, drag to move, open to change or cancel. */
export function Component() {
  useDocumentTitle('Dispatch');
  const [params, setParams] = useSearchParams();
  const toast = useToast();
  const update = useUpdateVisit();
  const monday = weekStartOf(params.get('week'));
  const thisMonday = weekStartOf(null);
  const days = useMemo(() => weekDays(monday), [monday]);
  const visits = useQuery({ ...weekQuery(monday), placeholderData: keepPreviousData });
  const staff = useQuery(userQueries.staff());
  const [showCancelled, setShowCancelled] = useState(false);
  const [picked, setPicked] = useState<string | null>(null);
  // A link from a ticket or a visit names the visit to open (`?visit=`); a tap on the grid opens another.
  const asked = idParam(params, 'visit');
  const editing = picked ?? asked ?? null;
  const planFor = idParam(params, 'ticketId');
  const [planning, setPlanning] = useState(false);

  const inWeek = useMemo(
    () => (visits.data?.items ?? []).filter((v) => days.includes(siteDate(v.windowStart, v.site.timeZone))),
    [visits.data, days],
  );
  const shown = showCancelled ? inWeek : inWeek.filter((v) => v.status !== 'cancelled');
  const bookings = useMemo(() => doubleBookings(inWeek), [inWeek]);
  const rows = rowsOf(staff.data?.items ?? [], shown);
  const technicians = (staff.data?.items ?? []).filter((s) => s.role === 'technician');
  const editingVisit = inWeek.find((v) => v.id === editing) ?? null;

  const setParam = (key: string, value: string | undefined) =>
    setParams(
      (prev) => {
        const p = new URLSearchParams(prev);
        if (value) p.set(key, value);
        else p.delete(key);
        return p;
      },
      { replace: key !== 'week' },
    );
  const closePlan = () => {
    setPlanning(false);
    if (planFor) setParam('ticketId', undefined);
  };

  const move = async (visit: VisitListItem, from: string, to: string, date: string) => {
    const sameDay = date === siteDate(visit.windowStart, visit.site.timeZone);
    const technicianIds = replaceTechnician(
      visit.technicians.map((t) => t.id),
      from,
      to,
    );
    if (sameDay && from === to) return;
    try {
      await update.mutateAsync({
        id: visit.id,
        ...(sameDay ? {} : movedToDate(visit, date)),
        ...(from === to ? {} : { technicianIds }),
      });
      toast(movedMessage);
    } catch (e) {
      toast(errorMessage(e), 'danger');
    }
  };

  const today = format(new Date(), 'yyyy-MM-dd');
  return (
    <>
      <PageHeader
        title="Dispatch"
        description="The week’s visits by technician. Times are at each site. Drag a visit to move it, or open it to change it."
        actions={
          <>
            <ButtonLink to={paths.visits.getHref()} icon={<List className="h-4 w-4" aria-hidden="true" />}>
              All visits
            </ButtonLink>
            <Button variant="primary" icon={<CalendarPlus className="h-4 w-4" aria-hidden="true" />} onClick={() => setPlanning(true)}>
              Plan a visit
            </Button>
          </>
        }
      />
      <WeekBar
        days={days}
        isThisWeek={monday === thisMonday}
        onWeek={(weeks) => setParam('week', weeks === 0 ? undefined : shiftWeek(monday, weeks))}
        showCancelled={showCancelled}
        onShowCancelled={setShowCancelled}
        cancelledCount={inWeek.length - inWeek.filter((v) => v.status !== 'cancelled').length}
      />
      <ConflictSummary bookings={bookings} visits={inWeek} />
      {visits.isError && !visits.data ? (
        <LoadError title="The week’s visits could not be loaded." error={visits.error} onRetry={() => void visits.refetch()} />
      ) : visits.isPending || staff.isPending ? (
        <p className="flex items-center justify-center gap-2 py-12 text-stone-600">
          <Spinner label="" /> Loading the week…
        </p>
      ) : rows.length === 0 ? (
        <Alert title="No technicians in the team yet">Invite technicians from Users; their rows appear here.</Alert>
      ) : (
        <>
          <DispatchGrid
            days={days}
            today={today}
            visits={shown}
            technicians={rows}
            onOpen={(v) => setPicked(v.id)}
            onMove={(v, from, to, date) => void move(v, from, to, date)}
          />
          <p className="mt-2 text-sm text-stone-600" aria-live="polite">
            {shown.length === 0 ? 'No visits this week.' : shown.length === 1 ? '1 visit this week.' : `${shown.length} visits this week.`}
            {update.isPending ? ' Saving…' : ''}
          </p>
        </>
      )}
      <PlanVisitDialog
        open={planning || Boolean(planFor)}
        onClose={closePlan}
        ticketId={planFor}
        date={monday === thisMonday ? today : monday}
        onPlanned={(visit) => {
          closePlan();
          const week = weekStartOf(siteDate(visit.windowStart, visit.site.timeZone));
          if (week !== monday) setParam('week', week);
        }}
      />
      <EditVisitDialog
        visit={editingVisit}
        technicians={technicians}
        onClose={() => {
          setPicked(null);
          if (asked) setParam('visit', undefined);
        }}
      />
    </>
  );
}
