import type { VisitDetail } from '@shared/schemas/visits';
import { CircleCheckBig, Play, Wrench } from 'lucide-react';
import { useState } from 'react';
import { Button, ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useUpdateVisit } from '@/features/visits/api/mutations';
import { errorMessage } from '@/lib/errors';

/**
 * The technician's next step, where the thumb is: start the visit on arrival; then log repairs
 * and close it. Nothing for a visit that is over, or for someone not working it.
 */
export function VisitActions({ visit }: { visit: VisitDetail }) {
  const update = useUpdateVisit();
  const [error, setError] = useState<unknown>(null);
  if (!visit.can.work || visit.status === 'completed' || visit.status === 'cancelled') return null;
  const start = async () => {
    setError(null);
    try {
      await update.mutateAsync({ id: visit.id, status: 'in_progress' });
    } catch (e) {
      setError(e);
    }
  };
  return (
    <div className="space-y-3">
      {visit.status === 'planned' ? (
        <Button
          variant="primary"
          size="lg"
          className="w-full"
          loading={update.isPending}
          onClick={start}
          icon={<Play className="h-5 w-5" aria-hidden="true" />}
        >
          Start visit
        </Button>
      ) : null}
      {error ? (
        <p role="alert" className="text-base font-medium text-danger-700">
          {errorMessage(error)}
        </p>
      ) : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <ButtonLink
          to={paths.logRepair.getHref({ visitId: visit.id })}
          variant={visit.status === 'in_progress' ? 'primary' : 'secondary'}
          size="lg"
          className="w-full"
          icon={<Wrench className="h-5 w-5" aria-hidden="true" />}
        >
          Log a repair
        </ButtonLink>
        {visit.status === 'in_progress' ? (
          <ButtonLink
            to={paths.closeVisit.getHref(visit.id)}
            size="lg"
            className="w-full"
            icon={<CircleCheckBig className="h-5 w-5" aria-hidden="true" />}
          >
            Close visit
          </ButtonLink>
        ) : null}
      </div>
    </div>
  );
}
