import type { VisitDetail } from '@shared/schemas/visits';
import { FileText, MailCheck, PenLine } from 'lucide-react';
import { buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { formatSiteTime } from '@/lib/site-time';
import { visitReportHref } from '@/resources/visits';

/**
 * A completed visit: what the client was told, who signed, and the report (`mailed`: it went to
 * the client's contacts; `forClient` words that for the client reading it).
 */
export function VisitOutcome({ visit, mailed, forClient = false }: { visit: VisitDetail; mailed: boolean; forClient?: boolean }) {
  const tz = visit.site.timeZone;
  return (
    <Card
      title={
        <span className="inline-flex items-center gap-2">
          <FileText className="h-4 w-4 text-ink-600" aria-hidden="true" />
          Visit report
        </span>
      }
      description={visit.completedAt ? `Completed ${formatSiteTime(visit.completedAt, tz)}` : undefined}
    >
      <div className="space-y-4">
        {visit.summary ? <p className="whitespace-pre-line text-base text-stone-900">{visit.summary}</p> : null}
        <p className="flex items-start gap-2 text-base text-stone-800">
          <PenLine className="mt-0.5 h-5 w-5 shrink-0 text-ink-600" aria-hidden="true" />
          {visit.signedByName ? (
            <span>
              Signed by <span className="font-semibold">{visit.signedByName}</span>
              {visit.signedAt ? `, ${formatSiteTime(visit.signedAt, tz)}` : ''}
            </span>
          ) : (
            <span>Not signed{visit.unsignedReason ? `: ${visit.unsignedReason}` : ''}</span>
          )}
        </p>
        {mailed ? (
          <p className="flex items-start gap-2 text-base text-state-on-track" role="status">
            <MailCheck className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true" />
            {forClient ? 'The report was e-mailed to your contacts.' : 'Report e-mailed to the client’s contacts'}
          </p>
        ) : null}
        {visit.status === 'completed' ? (
          <a
            href={visit.reportUrl ?? visitReportHref(visit.id)}
            className={buttonClasses('secondary', 'lg', 'w-full')}
            target="_blank"
            rel="noreferrer"
          >
            <FileText className="h-5 w-5" aria-hidden="true" />
            Report (PDF)
          </a>
        ) : null}
      </div>
    </Card>
  );
}
