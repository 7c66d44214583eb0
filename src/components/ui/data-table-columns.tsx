import type { Column, ColumnDef, VisibilityState } from '@tanstack/react-table';
import clsx from 'clsx';
import { ChevronRight } from 'lucide-react';
import { useEffect, useState, type ReactNode } from 'react';

/** A column's name in the column chooser and the CSV header: its label, else its header text, else its id. */
export function columnLabel<T>(column: Column<T, unknown>): string {
  const header = column.columnDef.header;
  return column.columnDef.meta?.label ?? (typeof header === 'string' ? header : column.id);
}

/** The columns with, when rows open to show more, a first column of open/close buttons. */
export function withExpander<T>(
  columns: ColumnDef<T, unknown>[],
  renderExpanded: ((row: T) => ReactNode) | undefined,
  expandLabel: ((row: T) => string) | undefined,
): ColumnDef<T, unknown>[] {
  if (!renderExpanded) return columns;
  const expander: ColumnDef<T, unknown> = {
    id: '_expand',
    header: () => <span className="sr-only">Details</span>,
    meta: { noCsv: true, alwaysVisible: true, className: 'w-10 pr-0' },
    cell: ({ row }) => (
      <button
        type="button"
        onClick={row.getToggleExpandedHandler()}
        aria-expanded={row.getIsExpanded()}
        aria-label={expandLabel ? expandLabel(row.original) : 'Show details'}
        className="-my-1 flex h-8 w-8 items-center justify-center rounded text-stone-500 hover:bg-stone-100 hover:text-ink-900"
      >
        <ChevronRight className={clsx('h-4 w-4 transition-transform', row.getIsExpanded() && 'rotate-90')} aria-hidden="true" />
      </button>
    ),
  };
  return [expander, ...columns];
}

const hiddenStorageKey = (tableId: string) => `gridkeep:table:${tableId}:columns`;

function readVisibility<T>(tableId: string, columns: ColumnDef<T, unknown>[]): VisibilityState {
  const defaults: VisibilityState = {};
  for (const c of columns) {
    const id = c.id ?? ('accessorKey' in c ? String(c.accessorKey) : undefined);
    if (id && c.meta?.hiddenByDefault) defaults[id] = false;
  }
  try {
    const stored = localStorage.getItem(hiddenStorageKey(tableId));
    return stored ? { ...defaults, ...(JSON.parse(stored) as VisibilityState) } : defaults;
  } catch {
    return defaults;
  }
}

/** Which columns are shown: the columns' defaults, then the person's choice, remembered per table. */
export function useColumnVisibility<T>(tableId: string, columns: ColumnDef<T, unknown>[]) {
  const [columnVisibility, setColumnVisibility] = useState<VisibilityState>(() => readVisibility(tableId, columns));
  useEffect(() => {
    try {
      localStorage.setItem(hiddenStorageKey(tableId), JSON.stringify(columnVisibility));
    } catch {
      /* private mode: the choice lasts for this visit only */
    }
  }, [tableId, columnVisibility]);
  return [columnVisibility, setColumnVisibility] as const;
}
