import { visitStatuses, type VisitStatus } from '@shared/schemas/enums';
import { visitStatusLabels } from '@shared/schemas/visits';
import { keepPreviousData, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import { CalendarRange } from 'lucide-react';
import { useMemo } from 'react';
import type { LoaderFunctionArgs, ShouldRevalidateFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { pagedQueryProps } from '@/components/ui/data-table';
import { FilterBar, FilterSelect } from '@/components/ui/filters';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { VisitCardList, VisitTable } from '@/features/visits/components/visit-list';
import { requireUser } from '@/app/auth-guard';
import { idParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { audienceOf, isOffice, useUser, type Audience } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useMediaQuery } from '@/lib/use-media-query';
import { userQueries } from '@/resources/users';
import { visitQueries, type VisitFilters } from '@/resources/visits';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** What the list asks for: latest first; staff filter by status and technician (from the address). */
function filtersFrom(audience: Audience, params: URLSearchParams): VisitFilters {
  if (audience === 'client') return { dir: 'desc' };
  const status = params.get('status');
  const technicianId = params.get('technicianId');
  return {
    dir: 'desc',
    status: visitStatuses.find((s) => s === status),
    technicianId: technicianId === 'me' ? 'me' : idParam(params, 'technicianId'),
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  const filters = filtersFrom(audienceOf(user), new URL(request.url).searchParams);
  // Warm the cache; a failure shows in the list (with a retry) rather than instead of the page.
  await queryClient.ensureInfiniteQueryData(visitQueries.list(filters)).catch(() => undefined);
  return null;
}

/**
 * The loader warms the first load only. Choosing a filter changes the address at once and the
 * page's own query fetches (showing the previous answer meanwhile); a loader run would hold the
 * address back, and a second quick change would then be written over the old one.
 */
export const shouldRevalidate = ({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) =>
  currentUrl.pathname === nextUrl.pathname ? false : defaultShouldRevalidate;

const statusOptions = visitStatuses.map((s: VisitStatus) => ({ value: s, label: visitStatusLabels[s] }));

/** Visits, latest first: the client's visits and their reports; for staff, every visit with filters. */
export function Component() {
  const user = useUser();
  const audience = audienceOf(user);
  useDocumentTitle('Visits');
  const [filters, setFilters] = useListFilters((p) => filtersFrom(audience, p), { dir: 'desc' });
  const query = useInfiniteQuery({ ...visitQueries.list(filters), placeholderData: keepPreviousData });
  const items = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);
  const wide = useMediaQuery('(min-width: 768px)');
  const list = { items, ...pagedQueryProps(query) };

  if (audience === 'client') {
    return (
      <>
        <PageHeader
          title="Visits"
          description="Our technicians’ visits to your sites, latest first, with the report of each completed visit."
        />
        <VisitCardList
          {...list}
          linkToVisit={false}
          showClient={false}
          empty={{ title: 'No visits yet', description: 'When a visit is booked for one of your sites, it shows here.' }}
        />
      </>
    );
  }

  const filtered = Boolean(filters.status || filters.technicianId);
  const empty = filtered
    ? { title: 'No visits match these filters', description: 'Try another status or technician.' }
    : { title: 'No visits yet' };
  // Each filter writes only its own key: two quick changes in a row both stay in the address.
  const toolbar = <VisitFilterBar status={filters.status ?? ''} technicianId={filters.technicianId ?? ''} onChange={setFilters} />;
  return (
    <>
      <PageHeader
        title="Visits"
        description="Every visit, latest first. Times are at each site."
        actions={
          isOffice(user) ? (
            <ButtonLink to={paths.dispatch.getHref()} icon={<CalendarRange className="h-4 w-4" aria-hidden="true" />}>
              Dispatch week
            </ButtonLink>
          ) : undefined
        }
      />
      {wide ? (
        <VisitTable {...list} toolbar={toolbar} empty={empty} />
      ) : (
        <div className="space-y-4">
          <div className="flex flex-wrap items-end gap-3">
            <FilterBar>{toolbar}</FilterBar>
          </div>
          <VisitCardList {...list} linkToVisit showClient empty={empty} />
        </div>
      )}
    </>
  );
}

interface FilterBarProps {
  status: string;
  technicianId: string;
  onChange: (next: { status?: string; technicianId?: string }) => void;
}

/** Status and technician; the technician list is the team's (staff only). */
function VisitFilterBar({ status, technicianId, onChange }: FilterBarProps) {
  const staff = useQuery(userQueries.staff());
  const technicianOptions = [
    { value: 'me', label: 'Me' },
    ...(staff.data?.items ?? []).filter((s) => s.role === 'technician').map((s) => ({ value: s.id, label: s.name })),
  ];
  return (
    <>
      <FilterSelect
        label="Status"
        anyLabel="Any status"
        options={statusOptions}
        value={status}
        onChange={(v) => onChange({ status: v || undefined })}
      />
      <FilterSelect
        label="Technician"
        anyLabel="Any technician"
        options={technicianOptions}
        value={technicianId}
        onChange={(v) => onChange({ technicianId: v || undefined })}
      />
    </>
  );
}
