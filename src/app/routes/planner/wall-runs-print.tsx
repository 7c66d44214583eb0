import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSpinner } from '@/components/ui/spinner';
import { RunsSheet } from '@/features/planner/components/runs-sheet';
import { requireUser, staff } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  await queryClient.ensureQueryData(wallQueries.detail(params.id ?? ''));
  return null;
}

/** The printable runs sheet: a page of its own, outside the app's shell (no navigation on paper). */
export function Component() {
  const { id = '' } = useParams();
  const wall = useQuery(wallQueries.detail(id));
  useDocumentTitle(wall.data ? `Runs · ${wall.data.name} (print)` : 'Runs (print)');
  if (!wall.data) return <PageSpinner />;
  return <RunsSheet wall={wall.data} />;
}
