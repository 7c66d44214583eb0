import { Grid3x3, Pencil, Plus } from 'lucide-react';
import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { ContactsCard } from '@/features/clients/components/contacts-card';
import { SiteAccessNotes } from '@/features/sites/components/site-access-notes';
import { SiteAddressCard } from '@/features/sites/components/site-address-card';
import { EditSiteDialog } from '@/features/sites/components/site-form-dialog';
import { CreateWallDialog } from '@/features/walls/components/wall-form-dialog';
import { mountingLabels } from '@/features/walls/components/wall-labels';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { idParam } from '@/app/routes/register/id-param';
import { prefetchRecordWork, RecordWork } from '@/app/routes/register/record-work';
import { useQuery } from '@tanstack/react-query';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { siteQueries } from '@/resources/sites';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  const id = idParam(params);
  await queryClient.ensureQueryData(siteQueries.detail(id));
  prefetchRecordWork({ siteId: id });
  if (isOffice(user)) void queryClient.prefetchQuery(cabinetModelQueries.list());
  return null;
}

export function Component() {
  const { id } = useParams() as { id: string };
  const user = useUser();
  const query = useQuery(siteQueries.detail(id));
  const canEdit = isOffice(user);
  const models = useQuery(cabinetModelQueries.list());
  const [editing, setEditing] = useState(false);
  const [addingWall, setAddingWall] = useState(false);
  const site = query.data;
  useDocumentTitle(site?.name ?? 'Site');
  if (!site) return <PageSpinner />;
  const staff = user.role !== 'client';

  return (
    <>
      <PageHeader
        eyebrow={
          <Link to={paths.client.getHref(site.clientId)} className="hover:underline">
            {site.clientName}
          </Link>
        }
        title={
          <span className="flex flex-wrap items-center gap-2">
            {site.name}
            {site.archived ? <Badge>Archived</Badge> : null}
          </span>
        }
        actions={
          canEdit ? (
            <>
              <Button onClick={() => setEditing(true)} icon={<Pencil className="h-4 w-4" aria-hidden="true" />}>
                Edit
              </Button>
              <Button variant="primary" onClick={() => setAddingWall(true)} icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
                Add wall
              </Button>
            </>
          ) : null
        }
      />
      <div className="space-y-5">
        <SiteAccessNotes notes={site.accessNotes} />
        <div className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <div className="space-y-5">
            <Card title="Walls" flush>
              {site.walls.length === 0 ? (
                <EmptyState
                  icon={Grid3x3}
                  title="No walls at this site yet"
                  description={canEdit ? 'Add one with the button above.' : undefined}
                  className="py-8"
                />
              ) : (
                <ul className="divide-y divide-stone-100">
                  {site.walls.map((w) => (
                    <li key={w.id}>
                      <Link
                        to={paths.wall.getHref(w.id)}
                        className="flex min-h-touch items-center justify-between gap-3 px-4 py-3 hover:bg-stone-50 sm:px-5"
                      >
                        <span className="min-w-0">
                          <span className="block font-medium text-ink-800">{w.name}</span>
                          <span className="block text-sm text-stone-600">
                            {w.columns} × {w.rows} cabinets · {mountingLabels[w.mounting]}
                          </span>
                        </span>
                        <Grid3x3 className="h-5 w-5 shrink-0 text-stone-400" aria-hidden="true" />
                      </Link>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
            <ContactsCard
              clientId={site.clientId}
              siteId={site.id}
              contacts={site.contacts}
              canEdit={canEdit}
              description="This site's contacts and the organisation's."
            />
          </div>
          <div className="space-y-5">
            <SiteAddressCard site={site} />
            {staff && site.internalNotes ? (
              <Card title="Internal notes" description="Staff only.">
                <p className="whitespace-pre-line">{site.internalNotes}</p>
              </Card>
            ) : null}
          </div>
        </div>
      </div>
      <RecordWork scope={{ siteId: site.id }} name={site.name} staff={staff} />
      {canEdit ? (
        <>
          <EditSiteDialog site={site} open={editing} onClose={() => setEditing(false)} />
          <CreateWallDialog
            open={addingWall}
            onClose={() => setAddingWall(false)}
            models={models.data?.items ?? []}
            siteId={site.id}
            description={`At ${site.name}, ${site.clientName}.`}
          />
        </>
      ) : null}
    </>
  );
}
