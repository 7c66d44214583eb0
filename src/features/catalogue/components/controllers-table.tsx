import { createColumnHelper } from '@tanstack/react-table';
import { Cpu } from 'lucide-react';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import type { Controller } from '@shared/schemas/controllers';
import { DataTable, editColumn } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import type { SelectOption } from '@/components/ui/select-field';
import { paths } from '@/config/paths';
import { EditControllerDialog } from '@/features/catalogue/components/controller-form-dialog';
import { useQuery } from '@tanstack/react-query';
import { controllerQueries } from '@/resources/controllers';
import { TruncatedNote } from '@/components/ui/truncated-note';

const column = createColumnHelper<Controller>();

/** Every controller (processor / sending device) and the wall it drives. */
export function ControllersTable({ canEdit, wallOptions }: { canEdit: boolean; wallOptions: SelectOption[] }) {
  const query = useQuery(controllerQueries.list());
  const [editing, setEditing] = useState<Controller | null>(null);
  const rows = query.data?.items ?? [];

  const columns = useMemo(
    () => [
      column.accessor('serial', {
        header: 'Serial',
        meta: { alwaysVisible: true },
        cell: (c) => <span className="font-mono font-medium text-ink-950">{c.getValue()}</span>,
      }),
      column.accessor('model', { header: 'Model' }),
      column.accessor('wallName', {
        header: 'Drives',
        meta: { csv: (c) => c.wallName ?? '' },
        cell: (c) =>
          c.row.original.wallId ? (
            <Link to={paths.wall.getHref(c.row.original.wallId)} className="text-ink-800 hover:underline">
              {c.getValue()}
            </Link>
          ) : (
            <span className="text-stone-500">Not on a wall (spare)</span>
          ),
      }),
      column.accessor('firmware', { header: 'Firmware', cell: (c) => c.getValue() || '—' }),
      column.accessor((c) => `${c.outputsInUse} / ${c.outputs}`, { id: 'outputs', header: 'Outputs in use', meta: { align: 'right' } }),
      column.accessor('pixelsPerOutput', {
        header: 'Pixels per output',
        meta: { align: 'right' },
        cell: (c) => c.getValue().toLocaleString('en'),
      }),
      column.accessor('notes', { header: 'Notes', meta: { hiddenByDefault: true }, cell: (c) => c.getValue() || '—' }),
      ...(canEdit ? [editColumn<Controller>(setEditing, (r) => r.serial)] : []),
    ],
    [canEdit],
  );

  return (
    <>
      <TruncatedNote truncated={query.data?.truncated} className="mb-3">
        The first {rows.length} controllers by serial are shown. Archive the ones no longer in service.
      </TruncatedNote>
      <DataTable
        tableId="controllers"
        label="Controllers"
        columns={columns}
        data={rows}
        getRowId={(c) => c.id}
        isLoading={query.isPending}
        error={query.error}
        onRetry={() => query.refetch()}
        empty={
          <EmptyState icon={Cpu} title="No controllers yet" description="Record each processor: model, serial, firmware and outputs." />
        }
      />
      <EditControllerDialog controller={editing} wallOptions={wallOptions} onClose={() => setEditing(null)} />
    </>
  );
}
