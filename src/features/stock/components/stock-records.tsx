import {
  partInput,
  partPatch,
  reorderPointInput,
  stockLocationInput,
  type Part,
  type StockBalance,
  type StockLocation,
} from '@shared/schemas/stock';
import { useQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { Boxes, MapPinned } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Form, FormError, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useCreateLocation, useCreatePart, useSetReorderPoint, useUpdateLocation, useUpdatePart } from '@/features/stock/api/mutations';
import { locationKindLabels, partKindLabels } from '@/features/stock/components/stock-table';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { siteQueries } from '@/resources/sites';
import { stockQueries } from '@/resources/stock';
import { userQueries } from '@/resources/users';

const partColumn = createColumnHelper<Part>();
const locationColumn = createColumnHelper<StockLocation>();
const optionalId = { setValueAs: (v: string) => v || undefined };
const asNumber = { valueAsNumber: true };

/** Archives a record of the stock (it leaves the lists; its history stays) and says so. */
function ArchiveButton({ name, onArchive }: { name: string; onArchive: () => Promise<unknown> }) {
  const toast = useToast();
  return (
    <Button
      size="sm"
      variant="ghost"
      aria-label={`Archive ${name}`}
      onClick={() => void onArchive().then(() => toast(`${name} is archived.`))}
    >
      Archive
    </Button>
  );
}

/** The parts spares are counted in: SKU, kind, the cabinet model they fit, the restock lead time. */
export function PartsTable() {
  const parts = useQuery(stockQueries.parts());
  const archive = useUpdatePart();
  const [editing, setEditing] = useState<Part | null>(null);
  const columns = useMemo(
    () => [
      partColumn.accessor('name', {
        header: 'Part',
        meta: { alwaysVisible: true },
        cell: (c) => <span className="font-medium text-ink-950">{c.getValue()}</span>,
      }),
      partColumn.accessor('sku', { header: 'SKU', cell: (c) => <span className="font-mono text-sm">{c.getValue()}</span> }),
      partColumn.accessor('kind', { header: 'Kind', cell: (c) => partKindLabels[c.getValue()] }),
      partColumn.accessor((p) => p.cabinetModel?.name ?? '', { id: 'model', header: 'Fits', cell: (c) => c.getValue() || '—' }),
      partColumn.accessor('leadTimeDays', { header: 'Lead time (days)', meta: { align: 'right' } }),
      partColumn.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { noCsv: true, alwaysVisible: true, align: 'right' },
        cell: (c) => (
          <span className="inline-flex gap-1">
            <Button size="sm" variant="ghost" aria-label={`Edit ${c.row.original.name}`} onClick={() => setEditing(c.row.original)}>
              Edit
            </Button>
            <ArchiveButton name={c.row.original.name} onArchive={() => archive.mutateAsync({ id: c.row.original.id, archived: true })} />
          </span>
        ),
      }),
    ],
    [archive],
  );
  return (
    <>
      <EditPartDialog part={editing} onClose={() => setEditing(null)} />
      <DataTable
        tableId="parts"
        label="Parts"
        columns={columns}
        data={parts.data?.items ?? []}
        getRowId={(p) => p.id}
        isLoading={parts.isPending}
        error={parts.error}
        onRetry={() => void parts.refetch()}
        empty={<EmptyState icon={Boxes} title="No parts yet" description="Add the modules, power supplies and cards you keep as spares." />}
      />
    </>
  );
}

/** A part's name, the cabinet model it fits and its restock lead time (its SKU and kind stay). */
function EditPartDialog({ part, onClose }: { part: Part | null; onClose: () => void }) {
  return (
    <Dialog open={part !== null} onClose={onClose} title={part ? `Edit ${part.name}` : 'Edit'}>
      {part ? <EditPartForm key={part.id} part={part} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditPartForm({ part, onDone }: { part: Part; onDone: () => void }) {
  const update = useUpdatePart();
  const toast = useToast();
  const models = useQuery(cabinetModelQueries.list());
  const form = useZodForm(partPatch, {
    defaultValues: { name: part.name, cabinetModelId: part.cabinetModel?.id ?? null, leadTimeDays: part.leadTimeDays },
  });
  return (
    <Form
      form={form}
      aria-label={`Edit ${part.name}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: part.id, ...values });
        toast(`${saved.name} is saved.`);
        onDone();
      }}
    >
      <FormError />
      <TextField name="name" label="Name" autoComplete="off" />
      <SelectField
        name="cabinetModelId"
        label="Fits"
        placeholder="Any cabinet"
        options={(models.data?.items ?? []).map((m) => ({ value: m.id, label: m.name }))}
        registerOptions={{ setValueAs: (v: string) => v || null }}
      />
      <TextField name="leadTimeDays" label="Lead time (days)" type="number" inputMode="numeric" min={0} registerOptions={asNumber} />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}

/** Where spares are kept: the warehouse, each technician's van, each site's on-site kit. */
export function LocationsTable() {
  const locations = useQuery(stockQueries.locations());
  const archive = useUpdateLocation();
  const columns = useMemo(
    () => [
      locationColumn.accessor('name', {
        header: 'Location',
        meta: { alwaysVisible: true },
        cell: (c) => <span className="font-medium text-ink-950">{c.getValue()}</span>,
      }),
      locationColumn.accessor('kind', { header: 'Kind', cell: (c) => locationKindLabels[c.getValue()] }),
      locationColumn.accessor((l) => l.holder?.name ?? l.site?.name ?? '', {
        id: 'where',
        header: 'Held by / kept at',
        cell: (c) => (c.row.original.site ? `${c.row.original.site.name} (${c.row.original.site.clientName})` : c.getValue() || '—'),
      }),
      locationColumn.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { noCsv: true, alwaysVisible: true, align: 'right' },
        cell: (c) => (
          <ArchiveButton name={c.row.original.name} onArchive={() => archive.mutateAsync({ id: c.row.original.id, archived: true })} />
        ),
      }),
    ],
    [archive],
  );
  return (
    <DataTable
      tableId="stock-locations"
      label="Stock locations"
      columns={columns}
      data={locations.data?.items ?? []}
      getRowId={(l) => l.id}
      isLoading={locations.isPending}
      error={locations.error}
      onRetry={() => void locations.refetch()}
      empty={<EmptyState icon={MapPinned} title="No locations yet" description="Add the warehouse, the vans and the site kits." />}
    />
  );
}

export function AddPartDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Add a part" description="A kind of spare you keep and count.">
      {open ? <AddPartForm onDone={onClose} /> : null}
    </Dialog>
  );
}

function AddPartForm({ onDone }: { onDone: () => void }) {
  const create = useCreatePart();
  const toast = useToast();
  const models = useQuery(cabinetModelQueries.list());
  const form = useZodForm(partInput, { defaultValues: { sku: '', name: '', kind: 'module', leadTimeDays: 30 } });
  return (
    <Form
      form={form}
      aria-label="Add a part"
      onSubmit={async (values) => {
        const part = await create.mutateAsync(values);
        toast(`${part.name} is added.`);
        onDone();
      }}
    >
      <FormError />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="name" label="Name" autoComplete="off" />
        <TextField name="sku" label="SKU" autoComplete="off" />
        <SelectField name="kind" label="Kind" options={Object.entries(partKindLabels).map(([value, label]) => ({ value, label }))} />
        <SelectField
          name="cabinetModelId"
          label="Fits"
          placeholder="Any cabinet"
          options={(models.data?.items ?? []).map((m) => ({ value: m.id, label: m.name }))}
          registerOptions={optionalId}
        />
        <TextField
          name="leadTimeDays"
          label="Lead time (days)"
          type="number"
          inputMode="numeric"
          min={0}
          registerOptions={asNumber}
          hint="Ordering to on the shelf."
        />
      </div>
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add part</SubmitButton>
      </DialogActions>
    </Form>
  );
}

export function AddLocationDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Add a stock location"
      description="The warehouse, a technician's van or a site's on-site kit."
    >
      {open ? <AddLocationForm onDone={onClose} /> : null}
    </Dialog>
  );
}

function AddLocationForm({ onDone }: { onDone: () => void }) {
  const create = useCreateLocation();
  const toast = useToast();
  const staff = useQuery(userQueries.staff());
  const sites = useQuery(siteQueries.options());
  const form = useZodForm(stockLocationInput, { defaultValues: { name: '', kind: 'warehouse' } });
  const kind = useWatch({ control: form.control, name: 'kind' });
  return (
    <Form
      form={form}
      aria-label="Add a stock location"
      onSubmit={async (values) => {
        const location = await create.mutateAsync(values);
        toast(`${location.name} is added.`);
        onDone();
      }}
    >
      <FormError />
      <TextField name="name" label="Name" autoComplete="off" />
      <SelectField name="kind" label="Kind" options={Object.entries(locationKindLabels).map(([value, label]) => ({ value, label }))} />
      {kind === 'van' ? (
        <SelectField
          name="holderId"
          label="Held by"
          placeholder="Choose a technician"
          options={(staff.data?.items ?? []).filter((u) => u.role === 'technician').map((u) => ({ value: u.id, label: u.name }))}
          registerOptions={optionalId}
        />
      ) : null}
      {kind === 'site_kit' ? (
        <SelectField
          name="siteId"
          label="Kept at"
          placeholder="Choose a site"
          options={(sites.data?.items ?? []).map((s) => ({ value: s.id, label: `${s.name} (${s.clientName})` }))}
          registerOptions={optionalId}
        />
      ) : null}
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add location</SubmitButton>
      </DialogActions>
    </Form>
  );
}

/** Sets when a part running low at a location mails the office, and how many to reorder. */
export function ReorderPointDialog({ row, onClose }: { row: StockBalance | null; onClose: () => void }) {
  return (
    <Dialog
      open={row !== null}
      onClose={onClose}
      title="Reorder point"
      description={row ? `${row.partName} at ${row.locationName}` : undefined}
    >
      {row ? <ReorderPointForm row={row} onDone={onClose} /> : null}
    </Dialog>
  );
}

function ReorderPointForm({ row, onDone }: { row: StockBalance; onDone: () => void }) {
  const set = useSetReorderPoint();
  const toast = useToast();
  const form = useZodForm(reorderPointInput, {
    defaultValues: { partId: row.partId, locationId: row.locationId, minQuantity: row.reorderAt ?? 1, reorderQuantity: 5 },
  });
  return (
    <Form
      form={form}
      aria-label="Reorder point"
      onSubmit={async (values) => {
        await set.mutateAsync(values);
        toast('Reorder point saved.');
        onDone();
      }}
    >
      <FormError />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          name="minQuantity"
          label="Alert at or below"
          type="number"
          inputMode="numeric"
          min={0}
          registerOptions={asNumber}
          hint="All batches together."
        />
        <TextField name="reorderQuantity" label="Reorder" type="number" inputMode="numeric" min={1} registerOptions={asNumber} />
      </div>
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save</SubmitButton>
      </DialogActions>
    </Form>
  );
}
