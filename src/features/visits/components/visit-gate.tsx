import type { VisitDetail } from '@shared/schemas/visits';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { PageSpinner } from '@/components/ui/spinner';
import { errorMessage } from '@/lib/errors';
import { useDocumentTitle } from '@/lib/use-document-title';
import { visitQueries } from '@/resources/visits';

interface VisitGateProps {
  id: string;
  /** The tab's title, followed by the site's name once the visit is here ("Visit: Riverside Hall"). */
  title: string;
  /** The page, given the visit. */
  children: (visit: VisitDetail) => ReactNode;
}

/** A page about one visit: the spinner while it loads, the error when it cannot be, then the page. */
export function VisitGate({ id, title, children }: VisitGateProps) {
  const visit = useQuery(visitQueries.detail(id));
  useDocumentTitle(visit.data ? `${title}: ${visit.data.site.name}` : title);
  if (visit.isPending) return <PageSpinner label="Loading the visit" />;
  if (visit.isError)
    return (
      <Alert tone="danger" title="The visit could not be loaded.">
        {errorMessage(visit.error)}
      </Alert>
    );
  return <>{children(visit.data)}</>;
}
