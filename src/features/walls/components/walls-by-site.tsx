import { ChevronRight, MapPin } from 'lucide-react';
import { Link } from 'react-router-dom';
import { StatusPill } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import type { WallSummary } from '@shared/schemas/walls';

interface SiteGroup {
  id: string;
  name: string;
  walls: WallSummary[];
}

/** Walls grouped by site, sites and walls by name. */
export function groupBySite(walls: WallSummary[]): SiteGroup[] {
  const groups = new Map<string, SiteGroup>();
  for (const wall of walls) {
    const group = groups.get(wall.siteId) ?? { id: wall.siteId, name: wall.siteName, walls: [] };
    group.walls.push(wall);
    groups.set(wall.siteId, group);
  }
  const byName = (a: { name: string }, b: { name: string }) => a.name.localeCompare(b.name);
  return [...groups.values()].sort(byName).map((g) => ({ ...g, walls: [...g.walls].sort(byName) }));
}

/** A wall's state as its people see it: open tickets on it, or none. */
export function WallTicketState({ openTicketCount }: { openTicketCount: number }) {
  if (openTicketCount === 0) return <StatusPill state="on-track">No open tickets</StatusPill>;
  return <StatusPill state="open-ticket">{openTicketCount === 1 ? '1 open ticket' : `${openTicketCount} open tickets`}</StatusPill>;
}

/** Each site with its walls and their state; every wall opens its page. */
export function WallsBySite({ walls }: { walls: WallSummary[] }) {
  return (
    <div className="space-y-4">
      {groupBySite(walls).map((site) => (
        <section key={site.id} aria-labelledby={`site-${site.id}`} className="rounded-md border border-stone-200 bg-white shadow-card">
          <h3
            id={`site-${site.id}`}
            className="flex items-center gap-2 border-b border-stone-200 px-4 py-3 text-base font-semibold sm:px-5"
          >
            <MapPin className="h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
            <Link to={paths.site.getHref(site.id)} className="hover:underline">
              {site.name}
            </Link>
          </h3>
          <ul className="divide-y divide-stone-200">
            {site.walls.map((wall) => (
              <li key={wall.id}>
                <Link
                  to={paths.wall.getHref(wall.id)}
                  className="group flex min-h-touch items-center gap-3 px-4 py-3 hover:bg-ink-50/40 sm:px-5"
                >
                  <div className="min-w-0 flex-1">
                    <p className="font-medium text-ink-900 group-hover:underline">{wall.name}</p>
                    <p className="text-sm text-stone-600">
                      {wall.columns} × {wall.rows} cabinets · {wall.cabinetModel.name}
                    </p>
                  </div>
                  <WallTicketState openTicketCount={wall.openTicketCount} />
                  <ChevronRight className="h-5 w-5 shrink-0 text-stone-400 group-hover:text-ink-700" aria-hidden="true" />
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
