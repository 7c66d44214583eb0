import { LowStockList } from '@/features/board/components/low-stock-list';
import { VisitsToday } from '@/features/board/components/visits-today';
import { priorityGuidance, type OpenClockState, type TicketClockState, type TicketListItem } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { AlarmClock, ArrowRight, Inbox, PartyPopper, type LucideIcon } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Badge, StatusPill, type PillState } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useAcknowledgeTicket } from '@/features/board/api/mutations';
import { errorMessage } from '@/lib/errors';
import { formatAgo, formatDateTime } from '@/lib/format';
import { boardListLimit, ticketQueries } from '@/resources/tickets';

const clockTiles: { state: OpenClockState; label: string; hint: string; tone: string; dot: string }[] = [
  { state: 'breached', label: 'Breached', hint: 'Past a due time', tone: 'border-l-state-breached-dot', dot: 'bg-state-breached-dot' },
  { state: 'at_risk', label: 'At risk', hint: 'Close to a due time', tone: 'border-l-state-at-risk-dot', dot: 'bg-state-at-risk-dot' },
  { state: 'paused', label: 'Paused', hint: 'Waiting for the client', tone: 'border-l-stone-400', dot: 'bg-stone-400' },
  { state: 'on_track', label: 'On track', hint: 'Within the plan', tone: 'border-l-state-on-track-dot', dot: 'bg-state-on-track-dot' },
];

const pill: Partial<Record<TicketClockState, [PillState, string]>> = {
  at_risk: ['at-risk', 'At risk'],
  breached: ['breached', 'Breached'],
  on_track: ['on-track', 'On track'],
};

/** The office's start page: what needs attention first, by service-plan clock. */
export function TodayBoard() {
  return (
    <div className="space-y-6">
      <ClockCountTiles />
      <div className="grid gap-5 xl:grid-cols-2">
        <AttentionList />
        <WaitingList />
      </div>
      <div className="grid gap-5 xl:grid-cols-2">
        <VisitsToday />
        <LowStockList />
      </div>
    </div>
  );
}

function ClockCountTiles() {
  const counts = useQuery(ticketQueries.clockCounts());
  return (
    <section aria-labelledby="board-counts">
      <h2 id="board-counts" className="sr-only">
        Open tickets by clock state
      </h2>
      {counts.isError ? (
        <Alert tone="danger" title="The counts could not be loaded.">
          {errorMessage(counts.error)}
        </Alert>
      ) : (
        <ul className="grid grid-cols-2 gap-3 lg:grid-cols-4">
          {clockTiles.map((t) => (
            <li key={t.state}>
              <Link
                to={paths.tickets.getHref({ clock: t.state, open: 'true' })}
                className={clsx(
                  'group block rounded-md border border-l-4 border-stone-200 bg-white px-4 py-3 shadow-card hover:border-stone-300 hover:bg-stone-50',
                  t.tone,
                )}
              >
                <span className="flex items-center gap-2 text-sm font-semibold text-stone-800">
                  <span className={clsx('h-2.5 w-2.5 rounded-full', t.dot)} aria-hidden="true" />
                  {t.label}
                </span>
                <span className="mt-1 block text-3xl font-semibold tabular-nums text-ink-950" data-testid={`count-${t.state}`}>
                  {counts.isPending ? <Spinner label="" className="text-lg text-stone-400" /> : counts.data[t.state]}
                </span>
                <span className="block text-xs text-stone-600 group-hover:underline">{t.hint}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function Section({ title, icon: Icon, action, children }: { title: string; icon: LucideIcon; action?: ReactNode; children: ReactNode }) {
  const id = `board-${title.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <section aria-labelledby={id} className="rounded-md border border-stone-200 bg-white shadow-card">
      <div className="flex items-center justify-between gap-3 border-b border-stone-200 px-4 py-3 sm:px-5">
        <h2 id={id} className="flex items-center gap-2 text-base font-semibold">
          <Icon className="h-5 w-5 text-ink-600" aria-hidden="true" />
          {title}
        </h2>
        {action}
      </div>
      {children}
    </section>
  );
}

function SeeAll({ to, label }: { to: string; label: string }) {
  return (
    <Link to={to} className="inline-flex items-center gap-1 text-sm font-medium text-ink-700 hover:underline">
      {label} <ArrowRight className="h-4 w-4" aria-hidden="true" />
    </Link>
  );
}

function ListState({
  isPending,
  error,
  empty,
  count,
  children,
}: {
  isPending: boolean;
  error: unknown;
  empty: ReactNode;
  count: number;
  children: ReactNode;
}) {
  if (isPending)
    return (
      <p className="flex items-center gap-2 px-5 py-6 text-sm text-stone-600">
        <Spinner label="" /> Loading…
      </p>
    );
  if (error)
    return (
      <div className="p-4">
        <Alert tone="danger">{errorMessage(error)}</Alert>
      </div>
    );
  if (count === 0) return <div className="px-5 py-8 text-center text-sm text-stone-600">{empty}</div>;
  return <>{children}</>;
}

function TicketLine({ t, due, action }: { t: TicketListItem; due: ReactNode; action?: ReactNode }) {
  const p = t.clockState ? pill[t.clockState] : undefined;
  return (
    <li className="flex items-start gap-3 px-4 py-3 sm:px-5">
      <div className="min-w-0 flex-1">
        <p className="flex flex-wrap items-center gap-x-2 gap-y-1">
          <Link to={paths.ticket.getHref(t.id)} className="font-mono text-sm font-medium text-ink-700 hover:underline">
            {t.ref}
          </Link>
          {p ? <StatusPill state={p[0]}>{p[1]}</StatusPill> : null}
          <Badge tone={t.priority === 'critical' ? 'danger' : t.priority === 'high' ? 'amber' : 'neutral'}>
            {priorityGuidance[t.priority].label}
          </Badge>
        </p>
        <Link to={paths.ticket.getHref(t.id)} className="mt-0.5 block font-medium text-ink-950 hover:underline">
          {t.title}
        </Link>
        <p className="text-sm text-stone-600">
          {t.client.name} · {t.site.name}
          {t.wall ? ` · ${t.wall.name}` : ''}
        </p>
        <p className="text-sm text-stone-700">
          {due}
          {' · '}
          {t.assignee ? t.assignee.name : <span className="text-stone-500">Unassigned</span>}
        </p>
      </div>
      {action}
    </li>
  );
}

function dueText(iso: string | null, what: string) {
  if (!iso) return <span>No {what} target</span>;
  const past = new Date(iso).getTime() < Date.now();
  return (
    <span title={formatDateTime(iso)} className={past ? 'font-medium text-state-breached' : undefined}>
      {past ? `${what} was due ${formatAgo(iso)}` : `${what} due ${formatAgo(iso)}`}
    </span>
  );
}

function AttentionList() {
  const query = useQuery(ticketQueries.attention());
  const items = query.data?.items ?? [];
  return (
    <Section
      title="At risk and breached"
      icon={AlarmClock}
      action={
        <SeeAll to={paths.tickets.getHref({ clock: 'at_risk,breached', open: 'true', sort: 'resolutionDueAt', dir: 'asc' })} label="All" />
      }
    >
      <ListState
        isPending={query.isPending}
        error={query.error}
        count={items.length}
        empty={
          <span className="inline-flex items-center gap-2">
            <PartyPopper className="h-4 w-4 text-state-on-track" aria-hidden="true" /> Every open ticket is on track.
          </span>
        }
      >
        <ul className="divide-y divide-stone-100" aria-label="Tickets at risk or breached">
          {items.map((t) => (
            <TicketLine
              key={t.id}
              t={t}
              due={t.status === 'new' && t.responseDueAt ? dueText(t.responseDueAt, 'Response') : dueText(t.resolutionDueAt, 'Resolution')}
            />
          ))}
        </ul>
        {query.data?.nextCursor ? (
          <p className="border-t border-stone-100 px-5 py-2 text-sm text-stone-600">The {boardListLimit} most urgent are shown.</p>
        ) : null}
      </ListState>
    </Section>
  );
}

function WaitingList() {
  const query = useQuery(ticketQueries.waiting());
  const acknowledge = useAcknowledgeTicket();
  const toast = useToast();
  const items = query.data?.items ?? [];
  return (
    <Section
      title="New, waiting for acknowledgement"
      icon={Inbox}
      action={<SeeAll to={paths.tickets.getHref({ status: 'new', sort: 'createdAt', dir: 'asc' })} label="All" />}
    >
      <ListState isPending={query.isPending} error={query.error} count={items.length} empty="No new tickets waiting. Nice.">
        <ul className="divide-y divide-stone-100" aria-label="New tickets waiting for acknowledgement">
          {items.map((t) => (
            <TicketLine
              key={t.id}
              t={t}
              due={
                <>
                  Opened {formatAgo(t.createdAt)}
                  {' · '}
                  {dueText(t.responseDueAt, 'Response')}
                </>
              }
              action={
                <Button
                  size="sm"
                  loading={acknowledge.isPending && acknowledge.variables === t.id}
                  onClick={async () => {
                    try {
                      await acknowledge.mutateAsync(t.id);
                      toast(`${t.ref} is acknowledged. The client gets an e-mail.`);
                    } catch (e) {
                      toast(errorMessage(e), 'danger');
                    }
                  }}
                  aria-label={`Acknowledge ${t.ref}`}
                >
                  Acknowledge
                </Button>
              }
            />
          ))}
        </ul>
        {query.data?.nextCursor ? (
          <p className="border-t border-stone-100 px-5 py-2 text-sm text-stone-600">The {boardListLimit} oldest are shown.</p>
        ) : null}
      </ListState>
    </Section>
  );
}
