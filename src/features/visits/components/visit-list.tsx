// Visits as a list: a table for the office, cards for the client portal and for phones. Times are
// written at the site; a completed visit links to its report.
import { visitStatusLabels, type VisitListItem } from '@shared/schemas/visits';
import { createColumnHelper } from '@tanstack/react-table';
import { CalendarDays, ChevronRight, FileDown, Grid3x3, MapPin, UserRound } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Pager } from '@/components/ui/data-table-pager';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ListStates } from '@/components/ui/list-states';
import { paths } from '@/config/paths';
import { VisitStatusBadge } from '@/features/visits/components/visit-status';
import { formatSiteTime, formatSiteWindow } from '@/lib/site-time';
import { visitReportHref } from '@/resources/visits';

/** "Thu 10 Dec, 09:00–11:00 CST" at the site. */
export function visitWhen(v: Pick<VisitListItem, 'windowStart' | 'windowEnd' | 'site'>) {
  return formatSiteWindow(v.windowStart, v.windowEnd, v.site.timeZone, { withYear: true });
}

const purpose = (v: VisitListItem) => (v.ticket ? `${v.ticket.ref} · ${v.ticket.title}` : 'Planned maintenance');
const hasReport = (v: VisitListItem) => v.status === 'completed';

/** The report of a completed visit (a PDF, made on first download). */
export function VisitReportLink({ visit }: { visit: VisitListItem }) {
  if (!hasReport(visit)) return null;
  return (
    <a
      href={visitReportHref(visit.id)}
      target="_blank"
      rel="noopener"
      className="inline-flex min-h-touch items-center gap-1.5 font-medium text-ink-700 hover:underline md:min-h-0"
      aria-label={`Report (PDF) of the visit on ${formatSiteTime(visit.windowStart, visit.site.timeZone, 'EEE d MMM yyyy')}`}
    >
      <FileDown className="h-4 w-4" aria-hidden="true" />
      Report (PDF)
    </a>
  );
}

const column = createColumnHelper<VisitListItem>();
const dash = <span className="text-stone-400">—</span>;

const columns = [
  column.accessor('windowStart', {
    header: 'When (at the site)',
    meta: { alwaysVisible: true, className: 'whitespace-nowrap', csv: (v) => visitWhen(v) },
    cell: ({ row: { original: v } }) => (
      <Link to={paths.visit.getHref(v.id)} className="font-medium text-ink-700 hover:underline">
        {visitWhen(v)}
      </Link>
    ),
  }),
  column.accessor('status', {
    header: 'Status',
    meta: { csv: (v) => visitStatusLabels[v.status] },
    cell: (c) => <VisitStatusBadge status={c.getValue()} />,
  }),
  column.accessor((v) => v.site.name, {
    id: 'site',
    header: 'Site',
    meta: { className: 'min-w-[11rem]' },
    cell: ({ row: { original: v } }) => (
      <>
        <Link to={paths.site.getHref(v.site.id)} className="block text-stone-900 hover:underline">
          {v.site.name}
        </Link>
        <Link to={paths.client.getHref(v.client.id)} className="block text-xs text-stone-600 hover:underline">
          {v.client.name}
        </Link>
      </>
    ),
  }),
  column.accessor((v) => v.wall?.name ?? '', {
    id: 'wall',
    header: 'Wall',
    cell: ({ row: { original: v } }) =>
      v.wall ? (
        <Link to={paths.wall.getHref(v.wall.id)} className="hover:underline">
          {v.wall.name}
        </Link>
      ) : (
        dash
      ),
  }),
  column.accessor((v) => purpose(v), {
    id: 'for',
    header: 'For',
    meta: { className: 'min-w-[12rem]' },
    cell: ({ row: { original: v } }) =>
      v.ticket ? (
        <Link to={paths.ticket.getHref(v.ticket.id)} className="hover:underline">
          <span className="font-mono text-ink-700">{v.ticket.ref}</span> {v.ticket.title}
        </Link>
      ) : (
        <span className="italic text-stone-700">Planned maintenance</span>
      ),
  }),
  column.accessor((v) => v.technicians.map((t) => t.name).join(', '), { id: 'technicians', header: 'Technicians' }),
  column.display({
    id: 'report',
    header: 'Report',
    meta: { noCsv: true },
    cell: ({ row: { original: v } }) => (hasReport(v) ? <VisitReportLink visit={v} /> : dash),
  }),
];

interface ListState {
  items: VisitListItem[];
  isLoading: boolean;
  error: unknown;
  onRetry: () => void;
  hasNextPage: boolean;
  onLoadMore: () => void;
  isLoadingMore: boolean;
  onLoadAll?: (maxPages: number) => Promise<void>;
  empty: { title: string; description?: ReactNode };
}

/** The office's table of visits (filters in the toolbar), latest first. */
export function VisitTable({ toolbar, ...list }: ListState & { toolbar: ReactNode }) {
  return (
    <DataTable
      tableId="visits"
      label="Visits"
      columns={columns}
      data={list.items}
      getRowId={(v) => v.id}
      isLoading={list.isLoading}
      error={list.error}
      onRetry={list.onRetry}
      hasNextPage={list.hasNextPage}
      onLoadMore={list.onLoadMore}
      isLoadingMore={list.isLoadingMore}
      onLoadAll={list.onLoadAll}
      toolbar={toolbar}
      empty={<EmptyState icon={CalendarDays} title={list.empty.title} description={list.empty.description} />}
    />
  );
}

/** Visits as cards: the client's visit history, or the list on a phone. `linkToVisit` opens each visit (staff). */
export function VisitCardList({ linkToVisit, showClient, ...list }: ListState & { linkToVisit: boolean; showClient: boolean }) {
  return (
    <ListStates
      noun="visits"
      icon={CalendarDays}
      count={list.items.length}
      isLoading={list.isLoading}
      error={list.error}
      onRetry={list.onRetry}
      empty={list.empty}
    >
      <div className="space-y-3">
        <ul aria-label="Visits" className="space-y-2">
          {list.items.map((v) => (
            <li key={v.id}>
              <VisitCard visit={v} linkToVisit={linkToVisit} showClient={showClient} />
            </li>
          ))}
        </ul>
        <Pager
          shown={list.items.length}
          hasNextPage={list.hasNextPage}
          onLoadMore={list.onLoadMore}
          isLoadingMore={list.isLoadingMore}
          noun={['visit', 'visits']}
        />
      </div>
    </ListStates>
  );
}

function VisitCard({ visit: v, linkToVisit, showClient }: { visit: VisitListItem; linkToVisit: boolean; showClient: boolean }) {
  const when = visitWhen(v);
  return (
    <article className="flex items-start gap-3 rounded-md border border-stone-200 bg-white p-4 shadow-card">
      <div className="min-w-0 flex-1 space-y-2">
        <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
          <VisitStatusBadge status={v.status} />
          <span className="text-sm text-stone-700">
            {v.ticket ? (
              <Link to={paths.ticket.getHref(v.ticket.id)} className="font-mono hover:underline">
                {v.ticket.ref}
              </Link>
            ) : (
              'Planned maintenance'
            )}
          </span>
        </div>
        <h3 className="text-md font-semibold leading-snug text-ink-950">
          {linkToVisit ? (
            <Link to={paths.visit.getHref(v.id)} className="hover:underline">
              {when}
            </Link>
          ) : (
            when
          )}
        </h3>
        {v.ticket ? <p className="text-sm text-stone-800">{v.ticket.title}</p> : null}
        <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-stone-600">
          <span className="inline-flex items-center gap-1">
            <MapPin className="h-3.5 w-3.5" aria-hidden="true" />
            {showClient ? `${v.client.name} · ${v.site.name}` : v.site.name}
          </span>
          {v.wall ? (
            <span className="inline-flex items-center gap-1">
              <Grid3x3 className="h-3.5 w-3.5" aria-hidden="true" />
              <Link to={paths.wall.getHref(v.wall.id)} className="hover:underline">
                {v.wall.name}
              </Link>
            </span>
          ) : null}
          {v.technicians.length ? (
            <span className="inline-flex items-center gap-1">
              <UserRound className="h-3.5 w-3.5" aria-hidden="true" />
              {v.technicians.map((t) => t.name).join(', ')}
            </span>
          ) : null}
        </p>
        <VisitReportLink visit={v} />
      </div>
      {linkToVisit ? <ChevronRight className="mt-1 h-5 w-5 shrink-0 text-stone-400" aria-hidden="true" /> : null}
    </article>
  );
}
