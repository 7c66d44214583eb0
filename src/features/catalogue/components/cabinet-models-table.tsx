import { createColumnHelper } from '@tanstack/react-table';
import { LayoutGrid } from 'lucide-react';
import { useMemo, useState } from 'react';
import type { CabinetModel } from '@shared/schemas/cabinet-models';
import { Badge } from '@/components/ui/badge';
import { DataTable, editColumn } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { EditCabinetModelDialog } from '@/features/catalogue/components/cabinet-model-form-dialog';
import { useQuery } from '@tanstack/react-query';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { TruncatedNote } from '@/components/ui/truncated-note';

const column = createColumnHelper<CabinetModel>();
const n = (v: number) => v.toLocaleString('en');

/** The cabinet models in the catalogue with their whole spec. */
export function CabinetModelsTable({ canEdit }: { canEdit: boolean }) {
  const query = useQuery(cabinetModelQueries.list());
  const [editing, setEditing] = useState<CabinetModel | null>(null);
  const rows = query.data?.items ?? [];

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Model',
        meta: { alwaysVisible: true, className: 'min-w-[10rem]' },
        cell: (c) => <span className="font-medium text-ink-950">{c.getValue()}</span>,
      }),
      column.accessor('maker', { header: 'Maker', cell: (c) => c.getValue() || <span className="text-stone-400">—</span> }),
      column.accessor('pixelPitchMm', { header: 'Pitch', meta: { align: 'right' }, cell: (c) => `${c.getValue()} mm` }),
      column.accessor((m) => `${n(m.widthMm)} × ${n(m.heightMm)}`, { id: 'size', header: 'Size (mm)', meta: { align: 'right' } }),
      column.accessor((m) => `${m.pixelsWide} × ${m.pixelsHigh}`, { id: 'pixels', header: 'Pixels', meta: { align: 'right' } }),
      column.accessor((m) => `${m.modulesWide} × ${m.modulesHigh}`, { id: 'modules', header: 'Modules', meta: { align: 'right' } }),
      column.accessor((m) => `${n(m.maxPowerW)} / ${n(m.typicalPowerW)}`, {
        id: 'power',
        header: 'Power max / typ. (W)',
        meta: { align: 'right' },
      }),
      column.accessor('weightKg', { header: 'Weight', meta: { align: 'right' }, cell: (c) => `${c.getValue()} kg` }),
      column.accessor('brightnessNits', {
        header: 'Brightness',
        meta: { align: 'right', hiddenByDefault: true },
        cell: (c) => `${n(c.getValue())} nits`,
      }),
      column.accessor((m) => `${m.inputVoltageMinV}–${m.inputVoltageMaxV} V`, {
        id: 'voltage',
        header: 'Power input',
        meta: { hiddenByDefault: true },
      }),
      column.accessor((m) => m.passThroughAmps, {
        id: 'connector',
        header: 'Connector',
        meta: { align: 'right' },
        cell: (c) => (c.getValue() === null ? <span className="text-stone-500">not given</span> : `${n(c.getValue() ?? 0)} A`),
      }),
      column.accessor((m) => m.maxPerChain, {
        id: 'perChain',
        header: 'Per chain',
        meta: { align: 'right', hiddenByDefault: true },
        cell: (c) => (c.getValue() === null ? <span className="text-stone-500">—</span> : n(c.getValue() ?? 0)),
      }),
      column.accessor('environment', {
        header: 'Use',
        cell: (c) => (
          <Badge tone={c.getValue() === 'outdoor' ? 'amber' : 'neutral'}>{c.getValue() === 'outdoor' ? 'Outdoor' : 'Indoor'}</Badge>
        ),
      }),
      ...(canEdit ? [editColumn<CabinetModel>(setEditing, (r) => r.name)] : []),
    ],
    [canEdit],
  );

  return (
    <>
      <TruncatedNote truncated={query.data?.truncated} className="mb-3">
        The first {rows.length} models by name are shown. Archive the ones no longer installed.
      </TruncatedNote>
      <DataTable
        tableId="cabinet-models"
        label="Cabinet models"
        columns={columns}
        data={rows}
        getRowId={(m) => m.id}
        isLoading={query.isPending}
        error={query.error}
        onRetry={() => query.refetch()}
        empty={
          <EmptyState
            icon={LayoutGrid}
            title="No cabinet models yet"
            description="Add the models you install: walls are built from them."
          />
        }
      />
      <EditCabinetModelDialog model={editing} onClose={() => setEditing(null)} />
    </>
  );
}
