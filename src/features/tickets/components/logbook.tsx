import { TZDate } from '@date-fns/tz';
import type { TicketComment, TicketDetail } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { format, isValid, parseISO } from 'date-fns';
import {
  CalendarCheck,
  CalendarClock,
  CircleCheck,
  CircleDot,
  CircleSlash,
  Lock,
  NotebookPen,
  Wrench,
  type LucideIcon,
} from 'lucide-react';
import { useId, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { visitStatusText } from '@/features/tickets/components/ticket-facts';
import { LogComposer } from '@/features/tickets/components/log-composer';
import { logbookEntries, type LogEntry } from '@/features/tickets/components/logbook-entries';
import { repairHeadline } from '@/features/tickets/components/ticket-repairs';
import { errorMessage } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { formatSiteWindow, zoneAbbreviation } from '@/lib/site-time';
import { ticketQueries } from '@/resources/tickets';
import { TruncatedNote } from '@/components/ui/truncated-note';

/** The words that mark a staff note wherever it shows. */
export const staffNoteLabel = 'Staff note — not shown to the client';

/** "Sat 5 Dec" and "13:28" at the site, for the logbook's time column. */
function siteStamp(iso: string, timeZone: string) {
  const d = parseISO(iso);
  if (!isValid(d)) return { day: '—', time: '' };
  try {
    const local = new TZDate(d, timeZone);
    return { day: format(local, 'EEE d MMM'), time: format(local, 'HH:mm') };
  } catch {
    return { day: format(d, 'EEE d MMM'), time: format(d, 'HH:mm') };
  }
}

interface LogbookProps {
  ticket: TicketDetail;
  /** Staff see staff notes and may write them; client users only ever write to the service desk. */
  staff: boolean;
  /** A closed or merged ticket takes no more entries. */
  closed: boolean;
}

/** The ticket's logbook: everything that happened on it, oldest first, and the composer under the newest. */
export function Logbook({ ticket, staff, closed }: LogbookProps) {
  const headingId = useId();
  const comments = useQuery(ticketQueries.comments(ticket.id));
  const { past, upcoming } = logbookEntries(ticket, comments.data?.items ?? []);
  const zone = zoneAbbreviation(new Date(), ticket.siteTimeZone);
  return (
    <section aria-labelledby={headingId} className="rounded-md border border-stone-200 bg-white shadow-card">
      <div className="flex flex-wrap items-baseline justify-between gap-x-3 border-b border-stone-200 px-4 py-3 sm:px-5">
        <h2 id={headingId} className="flex items-center gap-2 text-lg font-semibold text-ink-950">
          <NotebookPen className="h-5 w-5 text-ink-600" aria-hidden="true" />
          Logbook
        </h2>
        <p className="text-xs text-stone-600">Times at the site ({zone})</p>
      </div>
      <TruncatedNote truncated={comments.data?.truncated} className="mx-4 mt-3 sm:mx-5">
        Only the newest {comments.data?.items.length.toLocaleString('en')} messages are shown.
      </TruncatedNote>
      <ol aria-label="Logbook entries" className="divide-y divide-stone-100 px-4 sm:px-5">
        {past.map((e) => (
          <LogRow key={e.id} at={e.at} timeZone={ticket.siteTimeZone}>
            <EntryBody entry={e} ticket={ticket} staff={staff} />
          </LogRow>
        ))}
      </ol>
      {comments.isPending ? (
        <p className="flex items-center gap-2 px-4 pb-3 text-sm text-stone-600 sm:px-5">
          <Spinner label="" /> Loading the messages…
        </p>
      ) : comments.isError ? (
        <div className="px-4 pb-3 sm:px-5">
          <Alert tone="danger">{errorMessage(comments.error)}</Alert>
        </div>
      ) : null}
      {upcoming.length ? (
        <ul aria-label="Visits booked" className="space-y-1 border-t border-stone-100 px-4 py-3 sm:px-5">
          {upcoming.map((v) => (
            <li key={v.id} className="flex items-center gap-2 text-sm text-stone-800">
              <CalendarClock className="h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
              <span>
                Booked:{' '}
                <Link to={paths.visit.getHref(v.id)} className="font-medium text-ink-800 underline underline-offset-2">
                  visit on {formatSiteWindow(v.windowStart, v.windowEnd, ticket.siteTimeZone)}
                </Link>
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      <div className="border-t border-stone-200 bg-stone-50 px-4 py-4 sm:px-5">
        {closed ? (
          <p className="text-sm text-stone-700">This ticket is closed. {staff ? '' : 'If the fault is back, open a new ticket.'}</p>
        ) : (
          <LogComposer ticketId={ticket.id} staff={staff} />
        )}
      </div>
    </section>
  );
}

/** One line of the log: the moment at the site on the left, what happened on the right. */
function LogRow({ at, timeZone, children }: { at: string; timeZone: string; children: ReactNode }) {
  const { day, time } = siteStamp(at, timeZone);
  return (
    <li className="grid grid-cols-[4.75rem_minmax(0,1fr)] gap-3 py-3 sm:grid-cols-[5rem_minmax(0,1fr)]">
      <time dateTime={at} title={formatDateTime(at)} className="pt-0.5 font-mono text-xs leading-4 text-stone-600">
        <span className="block">{day}</span>
        <span className="block text-stone-800">{time}</span>
      </time>
      <div className="min-w-0">{children}</div>
    </li>
  );
}

function EntryBody({ entry: e, ticket, staff }: { entry: LogEntry; ticket: TicketDetail; staff: boolean }) {
  switch (e.kind) {
    case 'report':
      return (
        <article aria-label="The report">
          <p className="text-sm text-stone-700">
            <span className="font-semibold text-ink-950">{ticket.reporterName ?? 'The service desk'}</span> reported the fault
          </p>
          <p className="mt-1 whitespace-pre-wrap break-words text-base text-stone-900">
            {ticket.description || <span className="text-stone-600">No description.</span>}
          </p>
        </article>
      );
    case 'comment':
      return <CommentEntry comment={e.comment} staff={staff} />;
    case 'repair':
      return (
        <SystemLine icon={Wrench}>
          Repair logged: <span className="font-medium text-ink-950">{repairHeadline(e.repair)}</span>
          {e.repair.technicianName ? ` · ${e.repair.technicianName}` : ''}
        </SystemLine>
      );
    case 'visit':
      return (
        <SystemLine icon={CalendarCheck}>
          <Link to={paths.visit.getHref(e.visit.id)} className="font-medium text-ink-800 underline underline-offset-2">
            Visit at the site
          </Link>
          , {formatSiteWindow(e.visit.windowStart, e.visit.windowEnd, ticket.siteTimeZone, { withDay: false })} ·{' '}
          {visitStatusText[e.visit.status].toLowerCase()}
        </SystemLine>
      );
    case 'status':
      return e.what === 'acknowledged' ? (
        <SystemLine icon={CircleDot}>Acknowledged by the service desk</SystemLine>
      ) : e.what === 'resolved' ? (
        <SystemLine icon={CircleCheck}>Marked resolved</SystemLine>
      ) : (
        <SystemLine icon={CircleSlash}>Closed</SystemLine>
      );
  }
}

function SystemLine({ icon: Icon, children }: { icon: LucideIcon; children: ReactNode }) {
  return (
    <p className="flex items-start gap-2 text-sm text-stone-700">
      <Icon className="mt-0.5 h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
      <span className="min-w-0">{children}</span>
    </p>
  );
}

/** A message or a staff note. A note says so with a lock and words, on the same white as the rest. */
function CommentEntry({ comment: c, staff }: { comment: TicketComment; staff: boolean }) {
  const note = c.visibility === 'internal';
  const who = c.author.staff ? 'Service desk' : 'Client';
  return (
    <article
      aria-label={`${note ? 'Staff note' : 'Message'} by ${c.author.name}`}
      className={clsx('rounded-md border bg-white px-3 py-2', note ? 'border-dashed border-stone-400' : 'border-stone-200')}
    >
      <header className="flex flex-wrap items-center gap-x-2 gap-y-0.5 text-sm">
        <span className="font-semibold text-ink-950">{c.author.name}</span>
        <span className="text-stone-600">{who}</span>
        {note ? (
          <span className="inline-flex items-center gap-1 font-medium text-ink-800">
            <Lock className="h-3.5 w-3.5" aria-hidden="true" />
            {staffNoteLabel}
          </span>
        ) : staff && c.author.staff ? (
          <span className="text-stone-600">· sent to the client</span>
        ) : null}
      </header>
      <p className="mt-1 whitespace-pre-wrap break-words text-base text-stone-900">{c.body}</p>
    </article>
  );
}
