import { vendorReturnInput, vendorReturnPatch, type VendorReturn } from '@shared/schemas/stock';
import type { VendorReturnOutcome } from '@shared/schemas/enums';
import { useQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { Undo2 } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useWatch } from 'react-hook-form';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Form, FormError, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useOpenReturn, useUpdateReturn } from '@/features/stock/api/mutations';
import { formatDate } from '@/lib/format';
import { returnQueries, stockQueries } from '@/resources/stock';

const column = createColumnHelper<VendorReturn>();
const optionalId = { setValueAs: (v: string) => v || undefined };
const optionalDate = { setValueAs: (v: string) => v || undefined };

export const outcomeLabels: Record<VendorReturnOutcome, string> = {
  pending: 'With the maker',
  repaired: 'Repaired',
  replaced: 'Replaced',
  refused: 'Refused',
};

/** The returns, overdue first; the office records what the maker did. */
export function VendorReturnsTable({ canEdit }: { canEdit: boolean }) {
  const returns = useQuery(returnQueries.list());
  const [outcomeOf, setOutcomeOf] = useState<VendorReturn | null>(null);
  const columns = useMemo(
    () => [
      column.accessor((r) => r.part.name, {
        id: 'part',
        header: 'Part',
        meta: { alwaysVisible: true },
        cell: (c) => (
          <span>
            <span className="font-medium text-ink-950">{c.getValue()}</span>
            <span className="block font-mono text-xs text-stone-600">
              {[c.row.original.serial, c.row.original.batch].filter(Boolean).join(' · ') || c.row.original.part.sku}
            </span>
          </span>
        ),
      }),
      column.accessor('fault', { header: 'Fault' }),
      column.accessor('rmaReference', { header: 'Maker’s reference', cell: (c) => c.getValue() || '—' }),
      column.accessor('sentOn', { header: 'Sent', cell: (c) => formatDate(c.getValue()) }),
      column.accessor('expectedBackOn', {
        header: 'Expected back',
        cell: (c) => (
          <span className="inline-flex items-center gap-2">
            {formatDate(c.getValue())}
            {c.row.original.overdue ? <Badge tone="danger">Overdue</Badge> : null}
          </span>
        ),
      }),
      column.accessor('outcome', {
        header: 'Outcome',
        meta: { csv: (r) => r.outcome },
        cell: (c) => (
          <span>
            {outcomeLabels[c.getValue()]}
            {c.row.original.backTo ? <span className="block text-sm text-stone-600">Back in {c.row.original.backTo.name}</span> : null}
          </span>
        ),
      }),
      ...(canEdit
        ? [
            column.display({
              id: 'actions',
              header: () => <span className="sr-only">Actions</span>,
              meta: { noCsv: true, alwaysVisible: true, align: 'right' },
              cell: (c) =>
                c.row.original.backTo ? null : (
                  <Button
                    size="sm"
                    variant="ghost"
                    onClick={() => setOutcomeOf(c.row.original)}
                    aria-label={`Record the outcome of ${c.row.original.part.name} ${c.row.original.serial}`}
                  >
                    Outcome
                  </Button>
                ),
            }),
          ]
        : []),
    ],
    [canEdit],
  );
  return (
    <>
      <DataTable
        tableId="vendor-returns"
        label="Vendor returns"
        columns={columns}
        data={returns.data?.items ?? []}
        getRowId={(r) => r.id}
        isLoading={returns.isPending}
        error={returns.error}
        onRetry={() => void returns.refetch()}
        empty={
          <EmptyState icon={Undo2} title="No returns" description="A failed part sent back to its maker under warranty is followed here." />
        }
      />
      <OutcomeDialog item={outcomeOf} onClose={() => setOutcomeOf(null)} />
    </>
  );
}

function OutcomeDialog({ item, onClose }: { item: VendorReturn | null; onClose: () => void }) {
  return (
    <Dialog
      open={item !== null}
      onClose={onClose}
      title="Record what the maker did"
      description={item ? `${item.part.name} ${item.serial}` : undefined}
    >
      {item ? <OutcomeForm item={item} onDone={onClose} /> : null}
    </Dialog>
  );
}

function OutcomeForm({ item, onDone }: { item: VendorReturn; onDone: () => void }) {
  const update = useUpdateReturn();
  const toast = useToast();
  const locations = useQuery(stockQueries.locations());
  const form = useZodForm(vendorReturnPatch, { defaultValues: { outcome: item.outcome === 'pending' ? 'repaired' : item.outcome } });
  const outcome = useWatch({ control: form.control, name: 'outcome' });
  return (
    <Form
      form={form}
      aria-label="Record what the maker did"
      onSubmit={async (values) => {
        await update.mutateAsync({ id: item.id, ...values });
        toast('Return updated.');
        onDone();
      }}
    >
      <FormError />
      <SelectField name="outcome" label="Outcome" options={Object.entries(outcomeLabels).map(([value, label]) => ({ value, label }))} />
      {outcome === 'repaired' || outcome === 'replaced' ? (
        <SelectField
          name="backToLocationId"
          label="Back into stock at"
          placeholder="Not back yet"
          options={(locations.data?.items ?? []).map((l) => ({ value: l.id, label: l.name }))}
          registerOptions={optionalId}
        />
      ) : null}
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save</SubmitButton>
      </DialogActions>
    </Form>
  );
}

/** Opens a return by hand: the part, what is wrong, where it leaves from, the maker's reference. */
export function OpenReturnDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Send a part to its maker" description="A failed part under warranty (RMA)." size="lg">
      {open ? <OpenReturnForm onDone={onClose} /> : null}
    </Dialog>
  );
}

function OpenReturnForm({ onDone }: { onDone: () => void }) {
  const open = useOpenReturn();
  const toast = useToast();
  const parts = useQuery(stockQueries.parts());
  const locations = useQuery(stockQueries.locations());
  const form = useZodForm(vendorReturnInput, { defaultValues: { serial: '', batch: '', quantity: 1, fault: '', rmaReference: '' } });
  return (
    <Form
      form={form}
      aria-label="Send a part to its maker"
      onSubmit={async (values) => {
        const item = await open.mutateAsync(values);
        toast(`${item.part.name} is on its way back to the maker.`);
        onDone();
      }}
    >
      <FormError />
      <SelectField
        name="partId"
        label="Part"
        placeholder="Choose a part"
        options={(parts.data?.items ?? []).map((p) => ({ value: p.id, label: `${p.name} · ${p.sku}` }))}
        registerOptions={optionalId}
      />
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField name="serial" label="Serial" autoComplete="off" />
        <TextField name="batch" label="Batch" autoComplete="off" />
        <TextField name="quantity" label="Quantity" type="number" inputMode="numeric" min={1} registerOptions={{ valueAsNumber: true }} />
      </div>
      <TextField name="fault" label="Fault" autoComplete="off" />
      <SelectField
        name="fromLocationId"
        label="Leaves from"
        placeholder="Not from a shelf (e.g. straight off a wall)"
        options={(locations.data?.items ?? []).map((l) => ({ value: l.id, label: l.name }))}
        registerOptions={optionalId}
      />
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField name="rmaReference" label="Maker’s reference" autoComplete="off" />
        <TextField name="sentOn" label="Sent on" type="date" registerOptions={optionalDate} />
        <TextField name="expectedBackOn" label="Expected back" type="date" registerOptions={optionalDate} />
      </div>
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Send</SubmitButton>
      </DialogActions>
    </Form>
  );
}
