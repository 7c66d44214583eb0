import { cellLabel } from '@shared/calc/grid';
import type { CabinetStatus } from '@shared/schemas/enums';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { LucideIcon } from 'lucide-react';
import { Building2, Grid3x3, MapPin, SearchX, Square } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/errors';
import { searchQueries } from '@/resources/search';

const statusWords: Record<CabinetStatus, string> = {
  installed: 'installed',
  spare: 'spare',
  at_bench: 'at bench',
  returned_to_vendor: 'returned to vendor',
  retired: 'retired',
};

function Group({ title, icon: Icon, count, children }: { title: string; icon: LucideIcon; count: number; children: ReactNode }) {
  if (count === 0) return null;
  return (
    <Card
      title={
        <span className="flex items-center gap-2">
          <Icon className="h-4 w-4 text-ink-500" aria-hidden="true" />
          {title} <span className="font-normal text-stone-500">({count})</span>
        </span>
      }
      flush
    >
      <ul className="divide-y divide-stone-100">{children}</ul>
    </Card>
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

/** Clients, sites and walls by name, and cabinets by serial prefix, grouped by kind. */
export function SearchResults({ q }: { q: string }) {
  const query = useQuery({ ...searchQueries.results(q), enabled: q.trim().length > 0, placeholderData: keepPreviousData });
  if (!q.trim()) {
    return (
      <EmptyState
        icon={SearchX}
        title="Type something to search for"
        description="A client, site or wall name, or the first characters of a serial."
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
  const total = r.clients.length + r.sites.length + r.walls.length + r.cabinets.length;
  if (total === 0) {
    return (
      <EmptyState
        icon={SearchX}
        title={`Nothing matches “${q}”`}
        description="Names match anywhere in the name; serials match from their first character."
      />
    );
  }
  return (
    <div className="grid items-start gap-5 lg:grid-cols-2" aria-live="polite">
      <Group title="Clients" icon={Building2} count={r.clients.length}>
        {r.clients.map((c) => (
          <Row key={c.id} to={paths.client.getHref(c.id)} primary={c.name} />
        ))}
      </Group>
      <Group title="Sites" icon={MapPin} count={r.sites.length}>
        {r.sites.map((s) => (
          <Row key={s.id} to={paths.site.getHref(s.id)} primary={s.name} secondary={[s.city, s.clientName].filter(Boolean).join(' · ')} />
        ))}
      </Group>
      <Group title="Walls" icon={Grid3x3} count={r.walls.length}>
        {r.walls.map((w) => (
          <Row key={w.id} to={paths.wall.getHref(w.id)} primary={w.name} secondary={`${w.siteName} · ${w.clientName}`} />
        ))}
      </Group>
      <Group title="Cabinets" icon={Square} count={r.cabinets.length}>
        {r.cabinets.map((c) => (
          <Row
            key={c.id}
            to={
              c.wallId && c.column && c.row
                ? paths.wall.getHref(c.wallId, { col: c.column, row: c.row })
                : paths.cabinetLabel.getHref(c.serial)
            }
            primary={<span className="font-mono">{c.serial}</span>}
            secondary={
              c.wallName && c.column && c.row
                ? `${c.wallName} · ${cellLabel({ column: c.column, row: c.row })} · ${statusWords[c.status]}`
                : statusWords[c.status]
            }
          />
        ))}
      </Group>
    </div>
  );
}
