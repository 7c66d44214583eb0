import { NotFoundContent } from '@/app/route-error';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export function Component() {
  useDocumentTitle('Not found');
  return <NotFoundContent />;
}
