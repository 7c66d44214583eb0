import type { LoaderFunctionArgs } from 'react-router-dom';
import { ClientHome, prefetchClientHome } from '@/app/routes/app/client-home';
import { OfficeHome, prefetchOfficeHome } from '@/app/routes/app/office-home';
import { prefetchTechnicianHome, TechnicianHome } from '@/app/routes/app/technician-home';
import { requireUser } from '@/app/auth-guard';
import { audienceOf, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  // Warm what the start page shows; anything that fails shows in its own section with the error.
  const audience = audienceOf(user);
  if (audience === 'technician') await prefetchTechnicianHome();
  else if (audience === 'client') await prefetchClientHome();
  else await prefetchOfficeHome();
  return null;
}

/** The start page of each shell: the office's today board, the technician's tickets, the client's overview. */
export function Component() {
  const user = useUser();
  const audience = audienceOf(user);
  useDocumentTitle(audience === 'client' ? 'Overview' : 'Today');
  if (audience === 'technician') return <TechnicianHome name={user.name} />;
  if (audience === 'client') return <ClientHome name={user.name} organisation={user.clientName ?? 'your organisation'} />;
  return <OfficeHome name={user.name} />;
}
