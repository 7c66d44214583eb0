import type { VisitListItem } from '@shared/schemas/visits';
import { format, parseISO } from 'date-fns';
import { ChevronLeft, ChevronRight } from 'lucide-react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { type DoubleBooking } from '@/features/dispatch/utils/week';
import { formatSiteWindow } from '@/lib/site-time';
import { formatSiteTime } from '@/lib/site-time';

interface WeekBarProps {
  days: string[];
  isThisWeek: boolean;
  onWeek: (weeks: -1 | 0 | 1) => void;
  showCancelled: boolean;
  onShowCancelled: (show: boolean) => void;
  cancelledCount: number;
}

/** "7 – 13 Dec 2026" (or across months and years as needed). */
function weekLabel(days: string[]) {
  const first = parseISO(days[0]);
  const last = parseISO(days[6]);
  const sameYear = first.getFullYear() === last.getFullYear();
  const sameMonth = sameYear && first.getMonth() === last.getMonth();
  return `${format(first, sameMonth ? 'd' : sameYear ? 'd MMM' : 'd MMM yyyy')} – ${format(last, 'd MMM yyyy')}`;
}

/** The week shown, the way to the weeks around it, and whether cancelled visits show. */
export function WeekBar({ days, isThisWeek, onWeek, showCancelled, onShowCancelled, cancelledCount }: WeekBarProps) {
  return (
    <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={() => onWeek(-1)} icon={<ChevronLeft className="h-4 w-4" aria-hidden="true" />}>
          Previous week
        </Button>
        <Button onClick={() => onWeek(0)} disabled={isThisWeek}>
          This week
        </Button>
        <Button onClick={() => onWeek(1)}>
          Next week
          <ChevronRight className="h-4 w-4" aria-hidden="true" />
        </Button>
        <h2 className="ml-2 text-lg font-semibold" aria-live="polite">
          Week of {weekLabel(days)}
        </h2>
      </div>
      <label className="flex min-h-touch cursor-pointer items-center gap-2 text-sm text-stone-800 md:min-h-9">
        <input
          type="checkbox"
          className="h-5 w-5 accent-ink-700"
          checked={showCancelled}
          onChange={(e) => onShowCancelled(e.target.checked)}
        />
        Show cancelled visits{cancelledCount ? ` (${cancelledCount})` : ''}
      </label>
    </div>
  );
}

const bookingTime = (b: DoubleBooking['first'], zoneOf: (visitId: string) => string | undefined) => {
  const zone = zoneOf(b.visitId);
  return zone ? formatSiteWindow(b.windowStart, b.windowEnd, zone) : formatSiteTime(b.windowStart, undefined);
};

/** The week's double bookings in words, above the grid, so none is missed. */
export function ConflictSummary({ bookings, visits }: { bookings: DoubleBooking[]; visits: VisitListItem[] }) {
  if (bookings.length === 0) return null;
  const zones = new Map(visits.map((v) => [v.id, v.site.timeZone]));
  const zoneOf = (id: string) => zones.get(id);
  return (
    <section aria-label="Double bookings this week" className="mb-4">
      <Alert
        tone="danger"
        live={false}
        title={bookings.length === 1 ? 'A technician is booked twice this week' : `${bookings.length} double bookings this week`}
      >
        <ul className="list-disc space-y-1 pl-5">
          {bookings.map((b) => (
            <li key={b.key}>
              <strong>{b.technician}</strong>: {b.first.siteName}, {bookingTime(b.first, zoneOf)}; and {b.second.siteName},{' '}
              {bookingTime(b.second, zoneOf)}.
            </li>
          ))}
        </ul>
      </Alert>
    </section>
  );
}
