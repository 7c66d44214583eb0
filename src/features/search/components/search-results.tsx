import { cellLabel } from '@shared/calc/grid';
import type { TicketStatus } from '@shared/schemas/enums';
import { searchCountCap, type SearchCabinet, type SearchKind } from '@shared/schemas/search';
import { statusLabels } from '@shared/schemas/tickets';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { LucideIcon } from 'lucide-react';
import { Boxes, Building2, Grid3x3, MapPin, SearchX, Square, TicketCheck } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { toneStyles } from '@/components/wall-map/wall-map-tones';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/errors';
import { useUser } from '@/lib/session';
import { searchQueries } from '@/resources/search';

/** Where a found cabinet is: its wall and cell, or only its status when it is off any wall. */
function cabinetWhereabouts(c: SearchCabinet) {
  const status = toneStyles[c.status].label;
  return c.wallName && c.column && c.row ? `${c.wallName} · ${cellLabel({ column: c.column, row: c.row })} · ${status}` : status;
}

/** A found cabinet opens on its wall's map at its cell, or by its label when off any wall. */
function cabinetHref(c: SearchCabinet) {
  return c.wallId && c.column && c.row ? paths.wall.getHref(c.wallId, { col: c.column, row: c.row }) : paths.cabinetLabel.getHref(c.serial);
}

/** "3", or "8 of 57" when the list shows the first few, or "8 of 1000+" past the count's cap. */
function countWords(shown: number, total: number) {
  if (total <= shown) return String(shown);
  return `${shown} of ${total >= searchCountCap ? `${searchCountCap}+` : total}`;
}

function Group({
  kind,
  title,
  icon: Icon,
  shown,
  total,
  children,
}: {
  kind: SearchKind;
  title: string;
  icon: LucideIcon;
  shown: number;
  total: number;
  children: ReactNode;
}) {
  if (shown === 0) return null;
  const headingId = `search-group-${kind}`;
  return (
    <section aria-labelledby={headingId}>
      <Card
        title={
          <span id={headingId} className="flex items-center gap-2">
            <Icon className="h-4 w-4 text-ink-500" aria-hidden="true" />
            {title} <span className="font-normal text-stone-500">({countWords(shown, total)})</span>
          </span>
        }
        flush
        as="div"
      >
        <ul className="divide-y divide-stone-100">{children}</ul>
      </Card>
    </section>
  );
}

function Row({ to, primary, secondary }: { to: string; primary: ReactNode; secondary?: ReactNode }) {
  return (
    <li>
      <Link to={to} className="flex min-h-touch flex-col justify-center px-4 py-2.5 hover:bg-stone-50 sm:px-5">
        <span className="font-medium text-ink-800">{primary}</span>
        {secondary ? <span className="text-sm text-stone-600">{secondary}</span> : null}
      </Link>
    </li>
  );
}

/** The status as the reader says it: "Waiting for you" is only the client's wording. */
const ticketStatusWords = (status: TicketStatus, forClient: boolean) =>
  status === 'waiting_client' && !forClient ? 'Waiting for client' : statusLabels[status];

/** Tickets by number and words; client, site and wall names; serials and batches by any part; grouped by kind. */
export function SearchResults({ q }: { q: string }) {
  const user = useUser();
  const query = useQuery({ ...searchQueries.results(q), enabled: q.trim().length > 0, placeholderData: keepPreviousData });
  if (!q.trim()) {
    return (
      <EmptyState
        icon={SearchX}
        title="Type something to search for"
        description="A ticket number or words from a ticket, a client, site or wall name, or any part of a serial or batch code."
      />
    );
  }
  if (query.isPending) return <PageSpinner label="Searching" />;
  if (query.isError)
    return (
      <Alert tone="danger" title="The search did not work.">
        {errorMessage(query.error)}
      </Alert>
    );
  const r = query.data;
  const total = Object.values(r.counts).reduce((sum, n) => sum + n, 0);
  if (total === 0) {
    return (
      <EmptyState
        icon={SearchX}
        title={`Nothing matches “${q}”`}
        description="Tickets match by number or by words of their title and description; serials and batch codes by any part of at least three characters."
      />
    );
  }
  const forClient = user.role === 'client';
  return (
    <div className="grid items-start gap-5 lg:grid-cols-2" aria-live="polite">
      <Group kind="tickets" title="Tickets" icon={TicketCheck} shown={r.tickets.length} total={r.counts.tickets}>
        {r.tickets.map((t) => (
          <Row
            key={t.id}
            to={paths.ticket.getHref(t.id)}
            primary={
              <>
                <span className="font-mono">{t.ref}</span> {t.title}
              </>
            }
            secondary={[ticketStatusWords(t.status, forClient), t.wallName ?? t.siteName, forClient ? null : t.clientName]
              .filter(Boolean)
              .join(' · ')}
          />
        ))}
      </Group>
      <Group kind="cabinets" title="Cabinets" icon={Square} shown={r.cabinets.length} total={r.counts.cabinets}>
        {r.cabinets.map((c) => (
          <Row key={c.id} to={cabinetHref(c)} primary={<span className="font-mono">{c.serial}</span>} secondary={cabinetWhereabouts(c)} />
        ))}
      </Group>
      <Group kind="batches" title="Batches" icon={Boxes} shown={r.batches.length} total={r.counts.batches}>
        {r.batches.map((b) => (
          <Row
            key={b.batch}
            to={paths.cabinets.getHref({ batch: b.batch })}
            primary={<span className="font-mono">{b.batch}</span>}
            secondary={b.cabinetCount === 1 ? '1 cabinet' : `${b.cabinetCount} cabinets`}
          />
        ))}
      </Group>
      <Group kind="clients" title="Clients" icon={Building2} shown={r.clients.length} total={r.counts.clients}>
        {r.clients.map((c) => (
          <Row key={c.id} to={paths.client.getHref(c.id)} primary={c.name} />
        ))}
      </Group>
      <Group kind="sites" title="Sites" icon={MapPin} shown={r.sites.length} total={r.counts.sites}>
        {r.sites.map((s) => (
          <Row key={s.id} to={paths.site.getHref(s.id)} primary={s.name} secondary={[s.city, s.clientName].filter(Boolean).join(' · ')} />
        ))}
      </Group>
      <Group kind="walls" title="Walls" icon={Grid3x3} shown={r.walls.length} total={r.counts.walls}>
        {r.walls.map((w) => (
          <Row key={w.id} to={paths.wall.getHref(w.id)} primary={w.name} secondary={`${w.siteName} · ${w.clientName}`} />
        ))}
      </Group>
    </div>
  );
}
