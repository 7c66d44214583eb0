import { movementEnds, stockMovementInput, type StockMovementInput } from '@shared/schemas/stock';
import type { StockMovementKind } from '@shared/schemas/enums';
import { useQuery } from '@tanstack/react-query';
import { useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, FormError, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useRecordMovement } from '@/features/stock/api/mutations';
import { stockQueries } from '@/resources/stock';

/** What each kind of movement is called on the form. */
export const movementKindLabels: Record<StockMovementKind, string> = {
  receipt: 'Receive from a supplier',
  transfer: 'Transfer between locations',
  consumption: 'Use in a repair',
  return_from_wall: 'Return from a wall',
  sent_to_vendor: 'Send to the maker',
  back_from_vendor: 'Back from the maker',
  adjustment: 'Correct a count',
};

/** The kinds the office records by hand here (repairs and returns record their own). */
const formKinds: StockMovementKind[] = ['receipt', 'transfer', 'adjustment', 'consumption'];
const optionalId = { setValueAs: (v: string) => v || undefined };
const asNumber = { valueAsNumber: true };

interface MovementDialogProps {
  open: boolean;
  onClose: () => void;
  /** Fields filled in already, e.g. the location and part of a row. */
  start?: Partial<StockMovementInput>;
  /** The kinds offered; the office gets all of the form's, a technician a transfer or a use. */
  kinds?: StockMovementKind[];
}

/** Receive, transfer, use or correct stock: one movement of the ledger, checked with the shared schema. */
export function MovementDialog({ open, onClose, start, kinds = formKinds }: MovementDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Record a stock movement"
      description="Every change of stock is kept in the ledger."
      size="lg"
    >
      {open ? <MovementForm start={start} kinds={kinds} onDone={onClose} /> : null}
    </Dialog>
  );
}

function MovementForm({ start, kinds, onDone }: { start?: Partial<StockMovementInput>; kinds: StockMovementKind[]; onDone: () => void }) {
  const record = useRecordMovement();
  const toast = useToast();
  const parts = useQuery(stockQueries.parts());
  const locations = useQuery(stockQueries.locations());
  const form = useZodForm(stockMovementInput, { defaultValues: { kind: kinds[0], batch: '', quantity: 1, ...start } });
  const kind = useWatch({ control: form.control, name: 'kind' }) ?? kinds[0];
  const ends = movementEnds[kind];
  const locationOptions = (locations.data?.items ?? []).map((l) => ({ value: l.id, label: l.name }));
  const partOptions = (parts.data?.items ?? []).map((p) => ({ value: p.id, label: `${p.name} · ${p.sku}` }));
  return (
    <Form
      form={form}
      aria-label="Record a stock movement"
      onSubmit={async (values) => {
        const movement = await record.mutateAsync(values);
        toast(`${movement.quantity} × ${movement.partName} recorded.`);
        onDone();
      }}
    >
      <FormError />
      <SelectField
        name="kind"
        label="What happened"
        options={kinds.map((k) => ({ value: k, label: movementKindLabels[k] }))}
        registerOptions={{
          // A location the new kind does not name is cleared, so a hidden field never holds a value.
          onChange: (e: { target: { value: StockMovementKind } }) => {
            const next = movementEnds[e.target.value];
            if (next.from === 'none') form.setValue('fromLocationId', undefined);
            if (next.to === 'none') form.setValue('toLocationId', undefined);
          },
        }}
      />
      <SelectField name="partId" label="Part" placeholder="Choose a part" options={partOptions} registerOptions={optionalId} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="batch" label="Batch / bin" autoComplete="off" hint="As printed on the module; empty for parts without batches." />
        <TextField name="quantity" label="Quantity" type="number" inputMode="numeric" min={1} step={1} registerOptions={asNumber} />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        {ends.from !== 'none' ? (
          <SelectField
            name="fromLocationId"
            label={kind === 'adjustment' ? 'Take off (count too high)' : 'From'}
            placeholder={kind === 'adjustment' ? '—' : 'Choose a location'}
            options={locationOptions}
            registerOptions={optionalId}
          />
        ) : null}
        {ends.to !== 'none' ? (
          <SelectField
            name="toLocationId"
            label={kind === 'adjustment' ? 'Add to (count too low)' : 'To'}
            placeholder={kind === 'adjustment' ? '—' : 'Choose a location'}
            options={locationOptions}
            registerOptions={optionalId}
          />
        ) : null}
      </div>
      <TextField
        name="reason"
        label={kind === 'adjustment' ? 'Reason' : 'Note'}
        autoComplete="off"
        hint={kind === 'adjustment' ? 'Why the count is corrected.' : 'Optional.'}
      />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Record</SubmitButton>
      </DialogActions>
    </Form>
  );
}
