import type { SiteSummary } from '@shared/schemas/sites';
import type { WallSummary } from '@shared/schemas/walls';
import { useQuery } from '@tanstack/react-query';
import { Building2, Grid3x3, MapPin } from 'lucide-react';
import { useFormContext } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { FieldErrorText } from '@/components/ui/field';
import { SelectField } from '@/components/ui/select-field';
import { Spinner } from '@/components/ui/spinner';
import { ChoiceCard, Step, type NewTicketValues } from '@/features/tickets/components/new-ticket-step';
import { errorMessage } from '@/lib/errors';
import { wallQueries } from '@/resources/walls';

/** Where a ticket is: on one wall, or somewhere else at the site ('' until chosen). */
export type TicketPlace = 'wall' | 'site' | '';

/** The walls at a site, by name: the choices of step 1 (none before a site is chosen). */
export const wallChoices = (siteId: string | null | undefined) => ({
  ...wallQueries.page({ siteId: siteId || undefined }),
  enabled: Boolean(siteId),
});

interface WhereStepProps {
  sites: SiteSummary[];
  forClient: boolean;
  place: TicketPlace;
  onPlaceChange: (place: TicketPlace) => void;
}

/** Step 1, "Where is the problem?": the site (when there is a choice), then a wall or the site itself. */
export function WhereStep({ sites, forClient, place, onPlaceChange }: WhereStepProps) {
  const form = useFormContext<NewTicketValues>();
  const siteId = form.watch('siteId');
  const wallId = form.watch('wallId');
  const walls = useQuery(wallChoices(siteId));
  const siteError = form.formState.errors.siteId?.message;
  const wallError = form.formState.errors.wallId?.message;

  const chooseWall = (w: WallSummary | null) => {
    form.setValue('wallId', w?.id ?? null, { shouldValidate: form.formState.isSubmitted });
    form.setValue('cells', []);
    form.setValue('scope', w ? 'cells' : 'site');
    form.clearErrors(['wallId', 'cells']);
    onPlaceChange(w ? 'wall' : 'site');
  };

  return (
    <Step number={1} title="Where is the problem?">
      {sites.length > 1 ? (
        <SelectField
          name="siteId"
          label="Site"
          placeholder="Choose the site…"
          options={sites.map((s) => ({
            value: s.id,
            label: forClient ? `${s.name}${s.city ? ` · ${s.city}` : ''}` : `${s.name} (${s.clientName})`,
          }))}
        />
      ) : (
        <p className="flex items-center gap-2 text-base text-stone-800">
          <MapPin className="h-4 w-4 text-ink-600" aria-hidden="true" />
          {sites[0].name}
          {sites[0].city ? <span className="text-stone-600">· {sites[0].city}</span> : null}
        </p>
      )}
      {siteError && sites.length === 1 ? <FieldErrorText id="site-error" message={siteError} /> : null}

      {siteId ? (
        <fieldset className="space-y-2" aria-describedby={wallError ? 'wall-error' : undefined}>
          <legend className="mb-2 text-sm font-medium text-stone-800">Which wall?</legend>
          {walls.isPending ? (
            <p className="flex items-center gap-2 text-sm text-stone-600">
              <Spinner label="" /> Loading the walls…
            </p>
          ) : walls.isError ? (
            <Alert tone="danger">{errorMessage(walls.error)}</Alert>
          ) : (
            <div className="grid gap-2 sm:grid-cols-2">
              {walls.data.items.map((w) => (
                <ChoiceCard
                  key={w.id}
                  name="wall-choice"
                  checked={place === 'wall' && wallId === w.id}
                  onChange={() => chooseWall(w)}
                  icon={Grid3x3}
                  title={w.name}
                  detail={`${w.columns} × ${w.rows} cabinets${w.openTicketCount ? ` · ${w.openTicketCount} open ticket${w.openTicketCount === 1 ? '' : 's'}` : ''}`}
                />
              ))}
              <ChoiceCard
                name="wall-choice"
                checked={place === 'site'}
                onChange={() => chooseWall(null)}
                icon={Building2}
                title="Something else at the site"
                detail="Not one wall: a question, a cable run, the spare kit…"
              />
            </div>
          )}
          {wallError ? <FieldErrorText id="wall-error" message={wallError} /> : null}
        </fieldset>
      ) : null}
    </Step>
  );
}
