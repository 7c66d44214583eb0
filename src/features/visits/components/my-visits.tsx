import type { VisitListItem } from '@shared/schemas/visits';
import { useQuery } from '@tanstack/react-query';
import { TeamVisits, VisitCards } from '@/features/visits/components/visit-cards';
import { dayRanges } from '@/features/visits/utils/visit-time';
import { visitQueries } from '@/resources/visits';

const open = 'planned,in_progress';

/**
 * The queries of the technician's start page: their open visits of today and the coming days,
 * the ones they started earlier and never closed, and the whole team's day.
 */
export function myVisitQueries(now = new Date()) {
  const days = dayRanges(now);
  return {
    leftOpen: visitQueries.range({ technicianId: 'me', status: 'in_progress', ...days.earlier }),
    today: visitQueries.range({ technicianId: 'me', status: open, ...days.today }),
    upcoming: visitQueries.range({ technicianId: 'me', status: open, ...days.upcoming }),
    team: visitQueries.range({ status: 'planned,in_progress,completed', ...days.today }),
  };
}

const byStart = (a: VisitListItem, b: VisitListItem) => a.windowStart.localeCompare(b.windowStart);

/** Today: a visit still open from an earlier day first, then today's, in time order. */
function todays(leftOpen: VisitListItem[], today: VisitListItem[]) {
  const seen = new Set(today.map((v) => v.id));
  return [...leftOpen.filter((v) => !seen.has(v.id)), ...today].sort(byStart);
}

export function TodayVisits() {
  const q = myVisitQueries();
  const leftOpen = useQuery(q.leftOpen);
  const today = useQuery(q.today);
  const items = todays(leftOpen.data?.items ?? [], today.data?.items ?? []);
  return (
    <VisitCards
      label="Your visits today"
      items={items}
      isLoading={today.isPending}
      error={today.error}
      onRetry={() => void today.refetch()}
      withDay={false}
      empty={{ title: 'No visits today', description: 'The office books visits; they appear here with the address and the ticket.' }}
    />
  );
}

export function UpcomingVisits() {
  const upcoming = useQuery(myVisitQueries().upcoming);
  const items = [...(upcoming.data?.items ?? [])].sort(byStart);
  return (
    <VisitCards
      label="Your coming visits"
      items={items}
      isLoading={upcoming.isPending}
      error={upcoming.error}
      onRetry={() => void upcoming.refetch()}
      withDay
      empty={{ title: 'Nothing booked in the next two weeks' }}
    />
  );
}

/** The other technicians' visits of the day (read-only); `meId` leaves out the signed-in one's. */
export function TeamToday({ meId }: { meId: string }) {
  const team = useQuery(myVisitQueries().team);
  if (!team.data) return null;
  const others = team.data.items.filter((v) => !v.technicians.some((t) => t.id === meId)).sort(byStart);
  return <TeamVisits items={others} />;
}
