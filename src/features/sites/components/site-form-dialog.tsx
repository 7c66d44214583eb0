import { siteInput, sitePatch } from '@shared/schemas/sites';
import { useMemo } from 'react';
import { useFormContext } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useCreateSite, useUpdateSite } from '@/features/sites/api/mutations';
import type { SiteDetail } from '@shared/schemas/sites';
import { formatSiteTime } from '@/lib/site-time';

/** Every IANA time zone the browser knows, plus UTC (the server accepts the same list). */
function timeZoneOptions() {
  const zones = new Set(Intl.supportedValuesOf('timeZone'));
  zones.add('UTC');
  return [...zones].sort().map((z) => ({ value: z, label: z.replace(/_/g, ' ') }));
}

function TimeZoneSelect() {
  const options = useMemo(timeZoneOptions, []);
  const { watch } = useFormContext<{ timeZone?: string }>();
  const zone = watch('timeZone');
  return (
    <SelectField
      name="timeZone"
      label="Time zone"
      options={options}
      hint={
        zone
          ? `Local time there now: ${formatSiteTime(new Date(), zone)}. Service-plan clocks count in this zone.`
          : 'Service-plan clocks count in this zone.'
      }
    />
  );
}

function SiteFields() {
  return (
    <>
      <TextField name="name" label="Site name" autoComplete="off" hint="E.g. Main Campus, Arena." />
      <TextField name="address" label="Street address" autoComplete="off" />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="city" label="City" autoComplete="off" />
        <TextField name="region" label="State or region" autoComplete="off" />
        <TextField name="postalCode" label="Postal code" autoComplete="off" />
        <TextField name="country" label="Country" autoComplete="off" />
      </div>
      <TimeZoneSelect />
      <TextAreaField
        name="accessNotes"
        label="Access notes"
        rows={5}
        hint="For the technician on the way: loading dock, who holds the keys, parking, service-entry hours. The client sees these too."
      />
      <TextAreaField name="internalNotes" label="Internal notes" hint="Only staff see these." />
    </>
  );
}

/** The browser's own zone is the best first guess for a new site. */
const guessZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

export function CreateSiteDialog({
  clientId,
  clientName,
  open,
  onClose,
}: {
  clientId: string;
  clientName: string;
  open: boolean;
  onClose: () => void;
}) {
  return (
    <Dialog open={open} onClose={onClose} title="Add a site" description={`A location of ${clientName}.`} size="lg">
      {open ? <CreateSiteForm clientId={clientId} onDone={onClose} /> : null}
    </Dialog>
  );
}

function CreateSiteForm({ clientId, onDone }: { clientId: string; onDone: () => void }) {
  const create = useCreateSite();
  const toast = useToast();
  const navigate = useNavigate();
  const form = useZodForm(siteInput, {
    defaultValues: {
      clientId,
      name: '',
      address: '',
      city: '',
      region: '',
      postalCode: '',
      country: '',
      timeZone: guessZone(),
      accessNotes: '',
      internalNotes: '',
    },
  });
  return (
    <Form
      form={form}
      aria-label="Add a site"
      onSubmit={async (values) => {
        const site = await create.mutateAsync(values);
        toast(`${site.name} is added.`);
        onDone();
        navigate(paths.site.getHref(site.id));
      }}
    >
      <SiteFields />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add site</SubmitButton>
      </DialogActions>
    </Form>
  );
}

export function EditSiteDialog({ site, open, onClose }: { site: SiteDetail; open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title={`Edit ${site.name}`} size="lg">
      {open ? <EditSiteForm site={site} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditSiteForm({ site, onDone }: { site: SiteDetail; onDone: () => void }) {
  const update = useUpdateSite();
  const toast = useToast();
  const form = useZodForm(sitePatch, {
    defaultValues: {
      name: site.name,
      address: site.address,
      city: site.city,
      region: site.region,
      postalCode: site.postalCode,
      country: site.country,
      timeZone: site.timeZone,
      accessNotes: site.accessNotes,
      internalNotes: site.internalNotes ?? '',
      archived: site.archived,
    },
  });
  return (
    <Form
      form={form}
      aria-label={`Edit ${site.name}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: site.id, ...values });
        toast(`${saved.name} is saved.`);
        onDone();
      }}
    >
      <SiteFields />
      <Checkbox name="archived" label="Archived" hint="An archived site drops out of lists; its walls and history stay." />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
