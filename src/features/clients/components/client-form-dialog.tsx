import { clientInput, clientPatch } from '@shared/schemas/clients';
import { useEffect } from 'react';
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
import { useCreateClient } from '@/features/clients/api/mutations';
import type { ClientDetail } from '@shared/schemas/clients';
import { useUpdateClient } from '@/features/clients/api/mutations';
import { useQuery } from '@tanstack/react-query';
import { clientQueries } from '@/resources/clients';

const nullIfEmpty = { setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) };

function ServicePlanSelect() {
  const plans = useQuery(clientQueries.servicePlans());
  const { getValues, setValue } = useFormContext<{ servicePlanId?: string | null }>();
  // The choices arrive after the form: put the saved choice back on the select once they do.
  useEffect(() => {
    const current = getValues('servicePlanId');
    if (plans.data && current) setValue('servicePlanId', current);
  }, [plans.data, getValues, setValue]);
  const options = (plans.data?.items ?? []).map((p) => ({
    value: p.id,
    label: `${p.name} (${p.clockMode === 'round_the_clock' ? 'round the clock' : `business hours ${p.dayStart}–${p.dayEnd}`})`,
  }));
  return (
    <SelectField
      name="servicePlanId"
      label="Service plan"
      placeholder={plans.isPending ? 'Loading plans…' : 'No service plan'}
      options={options}
      hint="Sets the response and resolution targets of this client's tickets."
      registerOptions={nullIfEmpty}
    />
  );
}

/** Adds a client organisation, then opens its page. */
export function CreateClientDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Add a client" description="An organisation whose walls you install or look after.">
      <CreateClientForm onDone={onClose} />
    </Dialog>
  );
}

function CreateClientForm({ onDone }: { onDone: () => void }) {
  const create = useCreateClient();
  const toast = useToast();
  const navigate = useNavigate();
  const form = useZodForm(clientInput, { defaultValues: { name: '', servicePlanId: null, notes: '' } });
  return (
    <Form
      form={form}
      aria-label="Add a client"
      onSubmit={async (values) => {
        const client = await create.mutateAsync(values);
        toast(`${client.name} is added.`);
        onDone();
        navigate(paths.client.getHref(client.id));
      }}
    >
      <TextField name="name" label="Name" autoComplete="organization" autoFocus />
      <ServicePlanSelect />
      <TextAreaField name="notes" label="Internal notes" hint="Only staff see these: billing rules, who approves work, blackout times." />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add client</SubmitButton>
      </DialogActions>
    </Form>
  );
}

export function EditClientDialog({ client, open, onClose }: { client: ClientDetail; open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title={`Edit ${client.name}`}>
      {open ? <EditClientForm client={client} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditClientForm({ client, onDone }: { client: ClientDetail; onDone: () => void }) {
  const update = useUpdateClient();
  const toast = useToast();
  const form = useZodForm(clientPatch, {
    defaultValues: {
      name: client.name,
      servicePlanId: client.servicePlan?.id ?? null,
      notes: client.notes ?? '',
      archived: client.archived,
    },
  });
  return (
    <Form
      form={form}
      aria-label={`Edit ${client.name}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: client.id, ...values });
        toast(`${saved.name} is saved.`);
        onDone();
      }}
    >
      <TextField name="name" label="Name" autoComplete="organization" />
      <ServicePlanSelect />
      <TextAreaField name="notes" label="Internal notes" hint="Only staff see these." />
      <Checkbox
        name="archived"
        label="Archived"
        hint="An archived client drops out of lists and pickers; its sites, walls and history stay."
      />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
