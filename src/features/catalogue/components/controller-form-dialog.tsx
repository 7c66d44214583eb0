import { controllerInput, controllerPatch } from '@shared/schemas/controllers';
import type { Controller } from '@shared/schemas/controllers';
import { useEffect } from 'react';
import { useFormContext } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField, type SelectOption } from '@/components/ui/select-field';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useCreateController } from '@/features/catalogue/api/mutations';
import { useUpdateController } from '@/features/catalogue/api/mutations';

const asNumber = { valueAsNumber: true };
const nullIfEmpty = { setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) };

function WallSelect({ options }: { options: SelectOption[] }) {
  const { getValues, setValue } = useFormContext<{ wallId?: string | null }>();
  // The choices may arrive after the form: put the saved choice back on the select.
  useEffect(() => {
    const current = getValues('wallId');
    if (options.length && current) setValue('wallId', current);
  }, [options, getValues, setValue]);
  return (
    <SelectField name="wallId" label="Drives the wall" placeholder="No wall (a spare)" options={options} registerOptions={nullIfEmpty} />
  );
}

interface CreateControllerDialogProps {
  open: boolean;
  onClose: () => void;
  wallOptions: SelectOption[];
  /** From a wall's page: the controller drives this wall. */
  wallId?: string;
}

export function CreateControllerDialog({ open, onClose, wallOptions, wallId }: CreateControllerDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Add a controller"
      description="The processor or sending device that drives a wall."
      size="lg"
    >
      {open ? <CreateControllerForm wallOptions={wallOptions} wallId={wallId} onDone={onClose} /> : null}
    </Dialog>
  );
}

function CreateControllerForm({ wallOptions, wallId, onDone }: { wallOptions: SelectOption[]; wallId?: string; onDone: () => void }) {
  const create = useCreateController();
  const toast = useToast();
  const form = useZodForm(controllerInput, {
    defaultValues: { wallId: wallId ?? null, model: '', serial: '', firmware: '', outputsInUse: 0, pixelsPerOutput: 650_000, notes: '' },
  });
  return (
    <Form
      form={form}
      aria-label="Add a controller"
      onSubmit={async (values) => {
        const controller = await create.mutateAsync(values);
        toast(`${controller.model} ${controller.serial} is added.`);
        onDone();
      }}
    >
      {wallId ? null : <WallSelect options={wallOptions} />}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="model" label="Model" autoComplete="off" />
        <TextField name="serial" label="Serial" autoComplete="off" autoCapitalize="characters" spellCheck={false} />
        <TextField name="firmware" label="Firmware" autoComplete="off" hint="Optional, e.g. 4.2.1." />
      </div>
      <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
        <TextField name="outputs" label="Outputs" type="number" inputMode="numeric" min={1} registerOptions={asNumber} />
        <TextField name="outputsInUse" label="Outputs in use" type="number" inputMode="numeric" min={0} registerOptions={asNumber} />
        <TextField
          name="pixelsPerOutput"
          label="Pixels per output"
          type="number"
          inputMode="numeric"
          min={1}
          registerOptions={asNumber}
          hint="650,000 is common for a 1 Gb/s port."
        />
      </div>
      <TextAreaField name="notes" label="Notes" rows={3} />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add controller</SubmitButton>
      </DialogActions>
    </Form>
  );
}

export function EditControllerDialog({
  controller,
  wallOptions,
  onClose,
}: {
  controller: Controller | null;
  wallOptions: SelectOption[];
  onClose: () => void;
}) {
  return (
    <Dialog
      open={controller !== null}
      onClose={onClose}
      title={controller ? `Edit ${controller.model} ${controller.serial}` : 'Edit'}
      description="The model, serial and outputs are the unit's own and do not change."
    >
      {controller ? <EditControllerForm key={controller.id} controller={controller} wallOptions={wallOptions} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditControllerForm({
  controller,
  wallOptions,
  onDone,
}: {
  controller: Controller;
  wallOptions: SelectOption[];
  onDone: () => void;
}) {
  const update = useUpdateController();
  const toast = useToast();
  const form = useZodForm(controllerPatch, {
    defaultValues: {
      wallId: controller.wallId,
      firmware: controller.firmware,
      outputsInUse: controller.outputsInUse,
      notes: controller.notes,
      archived: controller.archived,
    },
  });
  return (
    <Form
      form={form}
      aria-label={`Edit ${controller.serial}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: controller.id, ...values });
        toast(`${saved.model} ${saved.serial} is saved.`);
        onDone();
      }}
    >
      <WallSelect options={wallOptions} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="firmware" label="Firmware" autoComplete="off" />
        <TextField
          name="outputsInUse"
          label="Outputs in use"
          type="number"
          inputMode="numeric"
          min={0}
          max={controller.outputs}
          registerOptions={asNumber}
          hint={`Of ${controller.outputs}.`}
        />
      </div>
      <TextAreaField name="notes" label="Notes" rows={3} />
      <Checkbox name="archived" label="Archived" hint="Taken out of service; its history stays." />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
