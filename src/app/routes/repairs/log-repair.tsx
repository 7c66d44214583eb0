import type { Position } from '@shared/schemas/cabinets';
import { inGrid } from '@shared/calc/grid';
import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { PendingRepairsBanner } from '@/components/ui/pending-repairs-banner';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { LogRepairFlow } from '@/features/repairs/components/log-repair-flow';
import { WallChooser } from '@/features/repairs/components/wall-chooser';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { requireUser, staff } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { stockQueries } from '@/resources/stock';
import { ticketQueries } from '@/resources/tickets';
import { visitQueries } from '@/resources/visits';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

interface From {
  visitId?: string;
  ticketId?: string;
  wallId?: string;
}

function fromParams(params: URLSearchParams): From {
  return {
    visitId: params.get('visitId') ?? undefined,
    ticketId: params.get('ticketId') ?? undefined,
    wallId: params.get('wallId') ?? undefined,
  };
}

function positiveInt(value: string | null): number | null {
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 ? n : null;
}

/**
 * Everything the steps need is read now, while there is signal: the visit or ticket, the wall
 * and its cabinets, the van and the site kit. The technician may lose the network behind the
 * wall and still finish the repair from what is here.
 */
export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  const from = fromParams(new URL(request.url).searchParams);
  let wallId = from.wallId;
  if (from.visitId) wallId ??= (await queryClient.ensureQueryData(visitQueries.detail(from.visitId))).wall?.id;
  else if (from.ticketId) wallId ??= (await queryClient.ensureQueryData(ticketQueries.detail(from.ticketId))).wall?.id;
  void queryClient.prefetchQuery(stockQueries.locations());
  if (wallId) {
    await Promise.all([queryClient.ensureQueryData(wallQueries.detail(wallId)), queryClient.prefetchQuery(wallQueries.cabinets(wallId))]);
  }
  return null;
}

/** What the visit or ticket says: the wall, the reported cells, the site, where to go back to. */
function useOrigin(from: From) {
  const visit = useQuery({ ...visitQueries.detail(from.visitId ?? ''), enabled: Boolean(from.visitId) });
  const ticket = useQuery({ ...ticketQueries.detail(from.ticketId ?? ''), enabled: Boolean(from.ticketId) && !from.visitId });
  if (from.visitId) {
    const v = visit.data;
    return {
      ready: Boolean(v),
      wallId: from.wallId ?? v?.wall?.id,
      siteId: v?.site.id ?? null,
      reported: v?.ticket?.cells ?? [],
      origin: v ? `Visit to ${v.site.name}${v.ticket ? `, ${v.ticket.ref}` : ''}` : undefined,
      done: { href: paths.visit.getHref(from.visitId), label: 'Back to the visit' },
    };
  }
  if (from.ticketId) {
    const t = ticket.data;
    return {
      ready: Boolean(t),
      wallId: from.wallId ?? t?.wall?.id,
      siteId: t?.site.id ?? null,
      reported: t?.cells ?? [],
      origin: t ? `Ticket ${t.ref}` : undefined,
      done: { href: paths.ticket.getHref(from.ticketId), label: 'Back to the ticket' },
    };
  }
  return {
    ready: true,
    wallId: from.wallId,
    siteId: null,
    reported: [] as Position[],
    origin: undefined,
    done: { href: from.wallId ? paths.wall.getHref(from.wallId) : paths.home.getHref(), label: from.wallId ? 'Back to the wall' : 'Done' },
  };
}

export function Component() {
  useDocumentTitle('Log a repair');
  const user = useUser();
  const [params, setParams] = useSearchParams();
  const from = fromParams(params);
  const origin = useOrigin(from);
  const wall = useQuery({ ...wallQueries.detail(origin.wallId ?? ''), enabled: Boolean(origin.wallId) });
  const col = positiveInt(params.get('col'));
  const row = positiveInt(params.get('row'));

  if (!origin.ready || (origin.wallId && !wall.data)) return <PageSpinner label="Opening the repair" />;
  const initialCell =
    wall.data && col && row && inGrid({ column: col, row }, wall.data.columns, wall.data.rows) ? { column: col, row } : null;

  return (
    <>
      <PageHeader
        eyebrow={
          <Link to={origin.done.href} className="hover:underline">
            {origin.origin ?? wall.data?.name ?? 'Gridkeep'}
          </Link>
        }
        title="Log a repair"
        description={wall.data ? `${wall.data.name} · ${wall.data.siteName}` : undefined}
        className="mb-4"
      />
      {/* The technician's shell shows it on every screen already. */}
      {user.role !== 'technician' ? <PendingRepairsBanner className="mb-4" /> : null}
      {wall.data ? (
        <LogRepairFlow
          from={from}
          wall={wall.data}
          reported={origin.reported}
          initialCell={initialCell}
          origin={origin.origin}
          userId={user.id}
          done={origin.done}
          notice={<ServiceCaution />}
        />
      ) : (
        <WallChooser
          siteId={origin.siteId}
          onChoose={(wallId) =>
            setParams((prev) => {
              const p = new URLSearchParams(prev);
              p.set('wallId', wallId);
              return p;
            })
          }
        />
      )}
    </>
  );
}
