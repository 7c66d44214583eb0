import type { Position } from '@shared/schemas/cabinets';
import clsx from 'clsx';
import { Cable, Pencil, Plus, QrCode } from 'lucide-react';
import { useState } from 'react';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { CabinetImport } from '@/features/cabinets/components/cabinet-import';
import { CabinetWallMap } from '@/features/cabinets/components/cabinet-wall-map';
import { CreateControllerDialog } from '@/features/catalogue/components/controller-form-dialog';
import { WallDocuments } from '@/features/documents/components/wall-documents';
import type { WallDetail } from '@shared/schemas/walls';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { WallControllersCard } from '@/features/walls/components/wall-controllers-card';
import { EditWallDialog } from '@/features/walls/components/wall-form-dialog';
import { mountingLabels } from '@/features/walls/components/wall-labels';
import { WallSpecCard } from '@/features/walls/components/wall-spec-card';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { idParam } from '@/app/routes/register/id-param';
import { useQuery } from '@tanstack/react-query';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

type Tab = 'map' | 'documents' | 'import';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request);
  const id = idParam(params);
  // A wall that does not exist (or is another organisation's) is a 404 page. Its cabinets come
  // in the same wait: the page is drawn once, with its map, rather than drawn and then restyled
  // cell by cell when they arrive.
  await Promise.all([queryClient.ensureQueryData(wallQueries.detail(id)), queryClient.prefetchQuery(wallQueries.cabinets(id))]);
  return null;
}

/**
 * The edit dialog with the catalogue it offers: the catalogue arrives while the wall map is being
 * drawn, and only this re-renders then, not the whole page.
 */
function EditWallWithModels({ wall, open, onClose }: { wall: WallDetail; open: boolean; onClose: () => void }) {
  const models = useQuery(cabinetModelQueries.list());
  return <EditWallDialog wall={wall} models={models.data?.items ?? []} open={open} onClose={onClose} />;
}

function positiveInt(value: string | null): number | null {
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 ? n : null;
}

export function Component() {
  const { id } = useParams() as { id: string };
  const user = useUser();
  const query = useQuery(wallQueries.detail(id));
  const [params, setParams] = useSearchParams();
  const [editing, setEditing] = useState(false);
  const [addingController, setAddingController] = useState(false);
  const office = isOffice(user);
  const staff = user.role !== 'client';
  const wall = query.data;
  useDocumentTitle(wall?.name ?? 'Wall');
  if (!wall) return <PageSpinner />;

  const requested = params.get('tab');
  const tab: Tab = requested === 'documents' || (requested === 'import' && office) ? requested : 'map';
  const col = positiveInt(params.get('col'));
  const row = positiveInt(params.get('row'));
  const selected: Position | null = col && row && col <= wall.columns && row <= wall.rows ? { column: col, row } : null;
  const view = params.get('view') === 'rear' ? 'rear' : 'front';

  const update = (changes: Record<string, string | null>) =>
    setParams(
      (prev) => {
        const p = new URLSearchParams(prev);
        for (const [key, value] of Object.entries(changes)) {
          if (value === null) p.delete(key);
          else p.set(key, value);
        }
        return p;
      },
      { replace: true },
    );

  const tabs: { key: Tab | 'labels'; label: string; href: string }[] = [
    { key: 'map', label: 'Map', href: paths.wall.getHref(id, { view }) },
    { key: 'documents', label: 'Documents', href: paths.wall.getHref(id, { tab: 'documents' }) },
    ...(office ? [{ key: 'import' as const, label: 'Import', href: paths.wall.getHref(id, { tab: 'import' }) }] : []),
    ...(staff ? [{ key: 'labels' as const, label: 'Labels', href: paths.wallLabels.getHref(id) }] : []),
  ];

  return (
    <>
      <PageHeader
        eyebrow={
          <span className="flex flex-wrap gap-x-1.5">
            <Link to={paths.client.getHref(wall.clientId)} className="hover:underline">
              {wall.clientName}
            </Link>
            <span aria-hidden="true">›</span>
            <Link to={paths.site.getHref(wall.siteId)} className="hover:underline">
              {wall.siteName}
            </Link>
          </span>
        }
        title={
          <span className="flex flex-wrap items-center gap-2">
            {wall.name}
            {wall.archived ? <Badge>Archived</Badge> : null}
            {wall.openTicketCount > 0 ? (
              <Badge tone="amber">{wall.openTicketCount === 1 ? '1 open ticket' : `${wall.openTicketCount} open tickets`}</Badge>
            ) : null}
          </span>
        }
        description={`${wall.cabinetModel.name} · ${wall.columns} × ${wall.rows} cabinets · ${mountingLabels[wall.mounting]}`}
        actions={
          <>
            {staff ? (
              <>
                <ButtonLink to={paths.wallRuns.getHref(id)} icon={<Cable className="h-4 w-4" aria-hidden="true" />}>
                  Power and data runs
                </ButtonLink>
                <ButtonLink to={paths.wallLabels.getHref(id)} icon={<QrCode className="h-4 w-4" aria-hidden="true" />}>
                  QR labels
                </ButtonLink>
              </>
            ) : null}
            {office ? (
              <Button onClick={() => setEditing(true)} icon={<Pencil className="h-4 w-4" aria-hidden="true" />}>
                Edit wall
              </Button>
            ) : null}
          </>
        }
      />

      <nav aria-label="Wall sections" className="-mt-2 mb-5 flex gap-1 overflow-x-auto border-b border-stone-200">
        {tabs.map((t) => (
          <Link
            key={t.key}
            to={t.href}
            replace={t.key !== 'labels'}
            aria-current={t.key === tab ? 'page' : undefined}
            className={clsx(
              '-mb-px flex min-h-touch items-center whitespace-nowrap border-b-2 px-3.5 text-base font-medium md:min-h-10',
              t.key === tab
                ? 'border-amber-500 text-ink-950'
                : 'border-transparent text-stone-600 hover:border-stone-300 hover:text-ink-900',
            )}
          >
            {t.label}
          </Link>
        ))}
      </nav>

      {tab === 'map' ? (
        <div className="space-y-5">
          <CabinetWallMap
            wall={{
              id: wall.id,
              name: wall.name,
              columns: wall.columns,
              rows: wall.rows,
              cellAspect: wall.cabinetModel.heightMm / wall.cabinetModel.widthMm,
            }}
            selected={selected}
            onSelect={(p) => update({ col: p ? String(p.column) : null, row: p ? String(p.row) : null })}
            view={view}
            onViewChange={(v) => update({ view: v === 'rear' ? 'rear' : null })}
            canRegister={office}
            canOperate={staff}
            notice={staff ? <ServiceCaution /> : null}
          />
          <div className="grid items-start gap-5 lg:grid-cols-2">
            <WallSpecCard wall={wall} />
            <WallControllersCard
              wall={wall}
              actions={
                office ? (
                  <Button size="sm" onClick={() => setAddingController(true)} icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
                    Add controller
                  </Button>
                ) : null
              }
            />
          </div>
        </div>
      ) : tab === 'documents' ? (
        <WallDocuments wallId={wall.id} canUpload={staff} canMarkInternal={staff} canDelete={office} />
      ) : (
        <CabinetImport wall={wall} mapHref={paths.wall.getHref(id)} />
      )}

      {office ? (
        <>
          <EditWallWithModels wall={wall} open={editing} onClose={() => setEditing(false)} />
          <CreateControllerDialog open={addingController} onClose={() => setAddingController(false)} wallOptions={[]} wallId={wall.id} />
        </>
      ) : null}
    </>
  );
}
