import { formatFeetInches } from '@shared/calc/units';
import { wallInput, wallPatch } from '@shared/schemas/walls';
import { useEffect } from 'react';
import { useFormContext } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField, type SelectOption } from '@/components/ui/select-field';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useCreateWall } from '@/features/walls/api/mutations';
import type { WallDetail } from '@shared/schemas/walls';
import { useUpdateWall } from '@/features/walls/api/mutations';
import { mountingOptions } from '@/features/walls/components/wall-labels';

/** What the form needs of a catalogue model to show the wall's size as it is typed. */
export interface ModelChoice {
  id: string;
  name: string;
  widthMm: number;
  heightMm: number;
  pixelsWide: number;
  pixelsHigh: number;
}

// The shared rules, with words for an empty box (the shared schema only says "expected number").
const count = (what: string) => z.number({ error: `Enter the number of ${what}.` });
const choice = (what: string) => z.string({ error: `Choose the ${what}.` }).min(1, `Choose the ${what}.`);
const createSchema = wallInput.extend({
  siteId: choice('site').pipe(wallInput.shape.siteId),
  cabinetModelId: choice('cabinet model').pipe(wallInput.shape.cabinetModelId),
  columns: count('columns').pipe(wallInput.shape.columns),
  rows: count('rows').pipe(wallInput.shape.rows),
});
const editSchema = wallPatch.extend({
  columns: count('columns').pipe(wallInput.shape.columns).optional(),
  rows: count('rows').pipe(wallInput.shape.rows).optional(),
});

const nullIfEmpty = { setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) };
const asNumber = { valueAsNumber: true };

/** "72 cabinets · 6.00 × 3.00 m (19' 8-1/4" × 9' 10-1/8") · 1,536 × 768 px", live. */
function SizePreview({ models }: { models: ModelChoice[] }) {
  const { watch } = useFormContext<{ columns?: number; rows?: number; cabinetModelId?: string }>();
  const [columns, rows, modelId] = watch(['columns', 'rows', 'cabinetModelId']);
  const model = models.find((m) => m.id === modelId);
  if (!model || !Number.isInteger(columns) || !Number.isInteger(rows) || !columns || !rows || columns < 1 || rows < 1) return null;
  const w = columns * model.widthMm;
  const h = rows * model.heightMm;
  return (
    <p className="rounded bg-ink-50 px-3 py-2 text-sm text-ink-900" aria-live="polite">
      {(columns * rows).toLocaleString('en')} cabinets · {(w / 1000).toFixed(2)} × {(h / 1000).toFixed(2)} m ({formatFeetInches(w)} ×{' '}
      {formatFeetInches(h)}) · {(columns * model.pixelsWide).toLocaleString('en')} × {(rows * model.pixelsHigh).toLocaleString('en')} px
    </p>
  );
}

function ModelSelect({ models }: { models: ModelChoice[] }) {
  const { getValues, setValue } = useFormContext<{ cabinetModelId?: string }>();
  // The choices may arrive after the form: put the saved choice back on the select.
  useEffect(() => {
    const current = getValues('cabinetModelId');
    if (models.length && current) setValue('cabinetModelId', current);
  }, [models, getValues, setValue]);
  return (
    <SelectField
      name="cabinetModelId"
      label="Cabinet model"
      placeholder="Choose the model…"
      options={models.map((m) => ({ value: m.id, label: m.name }))}
      hint={models.length === 0 ? 'The catalogue has no cabinet models yet: add one under Catalogue first.' : undefined}
    />
  );
}

function WallFields({ models, sites }: { models: ModelChoice[]; sites?: SelectOption[] }) {
  return (
    <>
      {sites ? <SelectField name="siteId" label="Site" placeholder="Choose the site…" options={sites} /> : null}
      <TextField name="name" label="Wall name" autoComplete="off" hint="As people on site call it, e.g. Main hall centre wall." />
      <ModelSelect models={models} />
      <div className="grid grid-cols-2 gap-4">
        <TextField name="columns" label="Columns" type="number" inputMode="numeric" min={1} max={500} registerOptions={asNumber} />
        <TextField name="rows" label="Rows" type="number" inputMode="numeric" min={1} max={500} registerOptions={asNumber} />
      </div>
      <SizePreview models={models} />
      <SelectField name="mounting" label="Mounting" options={mountingOptions} />
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField name="installDate" label="Installed on" type="date" registerOptions={nullIfEmpty} />
        <TextField name="warrantyEnd" label="Warranty ends" type="date" registerOptions={nullIfEmpty} />
        <TextField name="calibrationDate" label="Last calibrated" type="date" registerOptions={nullIfEmpty} />
      </div>
      <TextAreaField
        name="inputNotes"
        label="Input signal notes"
        hint="Sources, resolution and frame rate the controller receives. The client sees these."
      />
      <TextAreaField name="internalNotes" label="Internal notes" hint="Only staff see these." />
    </>
  );
}

interface CreateWallDialogProps {
  open: boolean;
  onClose: () => void;
  models: ModelChoice[];
  /** A fixed site (from the site's page), or the sites to choose from. */
  siteId?: string;
  sites?: SelectOption[];
  description?: string;
}

export function CreateWallDialog({ open, onClose, models, siteId, sites, description }: CreateWallDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title="Add a wall" description={description} size="lg">
      {open ? <CreateWallForm models={models} siteId={siteId} sites={sites} onDone={onClose} /> : null}
    </Dialog>
  );
}

function CreateWallForm({ models, siteId, sites, onDone }: Omit<CreateWallDialogProps, 'open' | 'onClose'> & { onDone: () => void }) {
  const create = useCreateWall();
  const toast = useToast();
  const navigate = useNavigate();
  const form = useZodForm(createSchema, {
    defaultValues: {
      siteId: siteId ?? '',
      name: '',
      cabinetModelId: '',
      mounting: 'wall_fixed',
      installDate: null,
      warrantyEnd: null,
      calibrationDate: null,
      inputNotes: '',
      internalNotes: '',
    },
  });
  return (
    <Form
      form={form}
      aria-label="Add a wall"
      onSubmit={async (values) => {
        const wall = await create.mutateAsync(values);
        toast(`${wall.name} is added.`);
        onDone();
        navigate(paths.wall.getHref(wall.id));
      }}
    >
      <WallFields models={models} sites={siteId ? undefined : sites} />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add wall</SubmitButton>
      </DialogActions>
    </Form>
  );
}

export function EditWallDialog({
  wall,
  models,
  open,
  onClose,
}: {
  wall: WallDetail;
  models: ModelChoice[];
  open: boolean;
  onClose: () => void;
}) {
  return (
    <Dialog open={open} onClose={onClose} title={`Edit ${wall.name}`} size="lg">
      {open ? <EditWallForm wall={wall} models={models} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditWallForm({ wall, models, onDone }: { wall: WallDetail; models: ModelChoice[]; onDone: () => void }) {
  const update = useUpdateWall();
  const toast = useToast();
  // The wall's own model stays a choice even when it was archived in the catalogue.
  const choices = models.some((m) => m.id === wall.cabinetModel.id) ? models : [wall.cabinetModel, ...models];
  const form = useZodForm(editSchema, {
    defaultValues: {
      name: wall.name,
      cabinetModelId: wall.cabinetModel.id,
      columns: wall.columns,
      rows: wall.rows,
      mounting: wall.mounting,
      installDate: wall.installDate,
      warrantyEnd: wall.warrantyEnd,
      calibrationDate: wall.calibrationDate,
      inputNotes: wall.inputNotes,
      internalNotes: wall.internalNotes ?? '',
      archived: wall.archived,
    },
  });
  const [columns, rows] = form.watch(['columns', 'rows']);
  const shrinking = (columns ?? wall.columns) < wall.columns || (rows ?? wall.rows) < wall.rows;
  return (
    <Form
      form={form}
      aria-label={`Edit ${wall.name}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: wall.id, ...values });
        toast(`${saved.name} is saved.`);
        onDone();
      }}
    >
      <WallFields models={choices} />
      {shrinking && wall.installedCabinets > 0 ? (
        <Alert tone="info">A smaller grid leaves cabinets registered outside it: move them first, or the map will not show them.</Alert>
      ) : null}
      <Checkbox name="archived" label="Archived" hint="An archived wall drops out of lists; its cabinets and history stay." />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
