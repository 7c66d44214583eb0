import { cabinetModelInput, cabinetModelPatch } from '@shared/schemas/cabinet-models';
import type { CabinetModel } from '@shared/schemas/cabinet-models';
import { useFormContext } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useCreateCabinetModel } from '@/features/catalogue/api/mutations';
import { useUpdateCabinetModel } from '@/features/catalogue/api/mutations';

const asNumber = { valueAsNumber: true };
const environmentOptions = [
  { value: 'indoor', label: 'Indoor' },
  { value: 'outdoor', label: 'Outdoor' },
];

function NumberField({
  name,
  label,
  unit,
  step = 'any',
  hint,
}: {
  name: string;
  label: string;
  unit?: string;
  step?: string;
  hint?: string;
}) {
  return (
    <TextField
      name={name}
      label={unit ? `${label} (${unit})` : label}
      type="number"
      inputMode="decimal"
      step={step}
      min={0}
      hint={hint}
      registerOptions={asNumber}
    />
  );
}

/** The pitch the width and pixel count imply, to catch a typo in either. */
function PitchCheck() {
  const { watch } = useFormContext<{ widthMm?: number; pixelsWide?: number; pixelPitchMm?: number }>();
  const [width, pixels, pitch] = watch(['widthMm', 'pixelsWide', 'pixelPitchMm']);
  if (!width || !pixels || !Number.isFinite(width) || !Number.isFinite(pixels)) return null;
  const implied = width / pixels;
  const off = pitch && Number.isFinite(pitch) ? Math.abs(implied - pitch) / implied > 0.02 : false;
  return (
    <p className={off ? 'text-sm font-medium text-danger-700' : 'text-sm text-stone-600'} aria-live="polite">
      Width ÷ pixels wide = {implied.toFixed(3)} mm{off ? ': this does not match the pitch typed.' : '.'}
    </p>
  );
}

export function CreateCabinetModelDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Add a cabinet model"
      description="The manufacturer's data sheet figures, per cabinet."
      size="lg"
    >
      {open ? <CreateCabinetModelForm onDone={onClose} /> : null}
    </Dialog>
  );
}

function CreateCabinetModelForm({ onDone }: { onDone: () => void }) {
  const create = useCreateCabinetModel();
  const toast = useToast();
  const form = useZodForm(cabinetModelInput, {
    defaultValues: { name: '', maker: '', inputVoltageMinV: 100, inputVoltageMaxV: 240, environment: 'indoor' },
  });
  return (
    <Form
      form={form}
      aria-label="Add a cabinet model"
      onSubmit={async (values) => {
        const model = await create.mutateAsync(values);
        toast(`${model.name} is in the catalogue.`);
        onDone();
      }}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="name" label="Model name" autoComplete="off" />
        <TextField name="maker" label="Maker" autoComplete="off" hint="Optional." />
      </div>
      <fieldset className="space-y-4">
        <legend className="mb-2 text-sm font-semibold text-ink-900">Size and pixels</legend>
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          <NumberField name="widthMm" label="Width" unit="mm" />
          <NumberField name="heightMm" label="Height" unit="mm" />
          <NumberField name="pixelPitchMm" label="Pixel pitch" unit="mm" />
          <NumberField name="pixelsWide" label="Pixels wide" step="1" />
          <NumberField name="pixelsHigh" label="Pixels high" step="1" />
        </div>
        <PitchCheck />
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          <NumberField name="modulesWide" label="Modules wide" step="1" />
          <NumberField name="modulesHigh" label="Modules high" step="1" />
        </div>
      </fieldset>
      <fieldset className="space-y-4">
        <legend className="mb-2 text-sm font-semibold text-ink-900">Power, weight, light</legend>
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          <NumberField name="maxPowerW" label="Maximum power" unit="W" hint="Full white, full brightness." />
          <NumberField name="typicalPowerW" label="Typical power" unit="W" hint="Ordinary video content." />
          <NumberField name="weightKg" label="Weight" unit="kg" />
          <NumberField name="brightnessNits" label="Peak brightness" unit="nits" step="1" />
        </div>
        <SelectField name="environment" label="Use" options={environmentOptions} />
      </fieldset>
      <PowerInputFields withRange />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add model</SubmitButton>
      </DialogActions>
    </Form>
  );
}

/**
 * The datasheet's power input: the voltage range (fixed once a model exists), the connector's
 * rating, the maker's most cabinets per chain and the VA at maximum power. Left empty, the planner
 * assumes and says so; filled in later, plans only get safer.
 */
function PowerInputFields({ withRange = false }: { withRange?: boolean }) {
  return (
    <fieldset className="space-y-4">
      <legend className="mb-2 text-sm font-semibold text-ink-900">Power input (from the datasheet)</legend>
      <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
        {withRange ? (
          <>
            <NumberField name="inputVoltageMinV" label="Lowest input" unit="V" step="1" />
            <NumberField name="inputVoltageMaxV" label="Highest input" unit="V" step="1" />
          </>
        ) : null}
        <NumberField name="passThroughAmps" label="Connector rating" unit="A" hint="Power in / pass-through. Empty: not known." />
        <NumberField name="maxPerChain" label="Most per chain" step="1" hint="The maker's limit. Empty: none given." />
        <NumberField name="maxPowerVA" label="Maximum" unit="VA" hint="Gives the power factor. Empty: 0.95 assumed." />
      </div>
    </fieldset>
  );
}

/** The name, the maker and the power input's datasheet figures change: walls already built keep their physical spec. */
export function EditCabinetModelDialog({ model, onClose }: { model: CabinetModel | null; onClose: () => void }) {
  return (
    <Dialog
      open={model !== null}
      onClose={onClose}
      title={model ? `Edit ${model.name}` : 'Edit'}
      description="The size, pixels and power of a model cannot change: walls already built depend on them. The power input's datasheet figures can be added or corrected."
    >
      {model ? <EditCabinetModelForm key={model.id} model={model} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditCabinetModelForm({ model, onDone }: { model: CabinetModel; onDone: () => void }) {
  const update = useUpdateCabinetModel();
  const toast = useToast();
  const form = useZodForm(cabinetModelPatch, {
    defaultValues: {
      name: model.name,
      maker: model.maker,
      passThroughAmps: model.passThroughAmps ?? undefined,
      maxPerChain: model.maxPerChain ?? undefined,
      maxPowerVA: model.maxPowerVA ?? undefined,
      archived: model.archived,
    },
  });
  return (
    <Form
      form={form}
      aria-label={`Edit ${model.name}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: model.id, ...values });
        toast(`${saved.name} is saved.`);
        onDone();
      }}
    >
      <TextField name="name" label="Model name" autoComplete="off" />
      <TextField name="maker" label="Maker" autoComplete="off" />
      <PowerInputFields />
      <Checkbox name="archived" label="Archived" hint="No longer offered for new walls; existing walls keep it." />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
