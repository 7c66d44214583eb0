import type { Table } from '@tanstack/react-table';
import { Columns3 } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { columnLabel } from '@/components/ui/data-table-columns';
import { Popover } from '@/components/ui/popover';

/** "Columns": a checkbox for each column that may be hidden (none when every column must show). */
export function ColumnChooser<T>({ table }: { table: Table<T> }) {
  const hideable = table.getAllLeafColumns().filter((c) => !c.columnDef.meta?.alwaysVisible);
  if (hideable.length === 0) return null;
  return (
    <Popover
      label="Choose columns"
      trigger={(props) => (
        <Button {...props} size="sm" icon={<Columns3 className="h-4 w-4" aria-hidden="true" />}>
          Columns
        </Button>
      )}
    >
      <fieldset className="px-1 py-1">
        <legend className="px-2 pb-1 text-xs font-semibold text-stone-600">Show columns</legend>
        {hideable.map((column) => (
          <label key={column.id} className="flex min-h-9 cursor-pointer items-center gap-2.5 rounded px-2 hover:bg-stone-100">
            <input
              type="checkbox"
              className="h-4 w-4 accent-ink-700"
              checked={column.getIsVisible()}
              onChange={column.getToggleVisibilityHandler()}
            />
            <span className="text-base">{columnLabel(column)}</span>
          </label>
        ))}
      </fieldset>
    </Popover>
  );
}
