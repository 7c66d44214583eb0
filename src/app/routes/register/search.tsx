import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { SearchResults } from '@/features/search/components/search-results';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { searchQueries } from '@/resources/search';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  const q = new URL(request.url).searchParams.get('q')?.trim() ?? '';
  if (q) await queryClient.prefetchQuery(searchQueries.results(q));
  return null;
}

/** The results of the top bar's search box, grouped by kind: tickets, cabinets, batches, clients, sites, walls. */
export function Component() {
  const [params] = useSearchParams();
  const q = params.get('q')?.trim() ?? '';
  useDocumentTitle(q ? `Search: ${q}` : 'Search');
  return (
    <>
      <PageHeader
        title={q ? `Results for “${q}”` : 'Search'}
        description="Tickets by number or words; names, serials and batch codes by any part."
      />
      <SearchResults q={q} />
    </>
  );
}
