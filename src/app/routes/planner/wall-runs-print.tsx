import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSpinner } from '@/components/ui/spinner';
import { useWallPlan, wallPlanQueryOptions } from '@/features/planner/api/get-wall-plan';
import { RunsSheet } from '@/features/planner/components/runs-sheet';
import { requireUser, staff } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  await queryClient.ensureQueryData(wallPlanQueryOptions(params.id ?? ''));
  return null;
}

/** The printable runs sheet: a page of its own, outside the app's shell (no navigation on paper). */
export function Component() {
  const { id = '' } = useParams();
  const wall = useWallPlan(id);
  useDocumentTitle(wall.data ? `Runs · ${wall.data.name} (print)` : 'Runs (print)');
  if (!wall.data) return <PageSpinner />;
  return <RunsSheet wall={wall.data} />;
}
