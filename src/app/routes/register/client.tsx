import { Building2, MapPin, Pencil, Plus } from 'lucide-react';
import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { EditClientDialog } from '@/features/clients/components/client-form-dialog';
import { ContactsCard } from '@/features/clients/components/contacts-card';
import { ServicePlanCard } from '@/features/clients/components/service-plan-card';
import { CreateSiteDialog } from '@/features/sites/components/site-form-dialog';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { idParam } from '@/app/routes/register/id-param';
import { prefetchRecordWork, RecordWork } from '@/app/routes/register/record-work';
import { useQuery } from '@tanstack/react-query';
import { clientQueries } from '@/resources/clients';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  const id = idParam(params);
  // A client that does not exist (or is another organisation's) is a 404 page.
  await queryClient.ensureQueryData(clientQueries.detail(id));
  prefetchRecordWork({ clientId: id });
  if (isOffice(user)) void queryClient.prefetchQuery(clientQueries.servicePlans());
  return null;
}

export function Component() {
  const { id } = useParams() as { id: string };
  const user = useUser();
  const query = useQuery(clientQueries.detail(id));
  const [editing, setEditing] = useState(false);
  const [addingSite, setAddingSite] = useState(false);
  const client = query.data;
  useDocumentTitle(client?.name ?? 'Client');
  if (!client) return <PageSpinner />;
  const canEdit = isOffice(user);
  const staff = user.role !== 'client';

  return (
    <>
      <PageHeader
        eyebrow={
          staff ? (
            <Link to={paths.clients.getHref()} className="hover:underline">
              Clients
            </Link>
          ) : (
            'Your organisation'
          )
        }
        title={
          <span className="flex flex-wrap items-center gap-2">
            {client.name}
            {client.archived ? <Badge>Archived</Badge> : null}
          </span>
        }
        actions={
          canEdit ? (
            <>
              <Button onClick={() => setEditing(true)} icon={<Pencil className="h-4 w-4" aria-hidden="true" />}>
                Edit
              </Button>
              <Button variant="primary" onClick={() => setAddingSite(true)} icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
                Add site
              </Button>
            </>
          ) : null
        }
      />
      <div className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="space-y-5">
          <Card title="Sites" description="Locations with walls; open one for its access notes and walls." flush>
            {client.sites.length === 0 ? (
              <EmptyState
                icon={MapPin}
                title="No sites yet"
                description={canEdit ? 'Add the first location with the button above.' : undefined}
                className="py-8"
              />
            ) : (
              <ul className="divide-y divide-stone-100">
                {client.sites.map((s) => (
                  <li key={s.id}>
                    <Link
                      to={paths.site.getHref(s.id)}
                      className="flex min-h-touch items-center justify-between gap-3 px-4 py-3 hover:bg-stone-50 sm:px-5"
                    >
                      <span className="min-w-0">
                        <span className="block font-medium text-ink-800">{s.name}</span>
                        <span className="block text-sm text-stone-600">
                          {[s.city, s.region].filter(Boolean).join(', ') || 'No address'} · {s.timeZone.replace(/_/g, ' ')}
                        </span>
                      </span>
                      <Badge tone="ink">{s.wallCount === 1 ? '1 wall' : `${s.wallCount} walls`}</Badge>
                    </Link>
                  </li>
                ))}
              </ul>
            )}
          </Card>
          <ContactsCard clientId={client.id} contacts={client.contacts} sites={client.sites} users={client.users} canEdit={canEdit} />
        </div>
        <div className="space-y-5">
          <ServicePlanCard plan={client.servicePlan} />
          {staff ? (
            <Card title="Internal notes" description="Staff only: the client never sees these.">
              {client.notes ? (
                <p className="whitespace-pre-line">{client.notes}</p>
              ) : (
                <p className="flex items-center gap-2 text-stone-600">
                  <Building2 className="h-4 w-4" aria-hidden="true" /> No notes.
                </p>
              )}
            </Card>
          ) : null}
        </div>
      </div>
      <RecordWork scope={{ clientId: client.id }} name={client.name} staff={staff} />
      {canEdit ? (
        <>
          <EditClientDialog client={client} open={editing} onClose={() => setEditing(false)} />
          <CreateSiteDialog clientId={client.id} clientName={client.name} open={addingSite} onClose={() => setAddingSite(false)} />
        </>
      ) : null}
    </>
  );
}
