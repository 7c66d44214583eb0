import { flexRender, type Cell, type Row, type Table } from '@tanstack/react-table';
import clsx from 'clsx';
import { ChevronRight } from 'lucide-react';
import { useId, type ReactNode } from 'react';
import { columnLabel } from '@/components/ui/data-table-columns';
import { SelectBox } from '@/components/ui/select-field';
import { Spinner } from '@/components/ui/spinner';

interface DataTableCardsProps<T> {
  rows: Row<T>[];
  /** What the list holds, for screen readers. */
  label: string;
  isLoading: boolean;
  empty?: ReactNode;
  renderExpanded?: (row: T) => ReactNode;
  expandLabel?: (row: T) => string;
}

/**
 * Links and buttons inside a card are at least 44 × 44 CSS px (WCAG 2.5.5): a thumb on a phone
 * behind a wall misses a 20 px line of text.
 */
const touchTargets =
  '[&_a]:inline-flex [&_a]:min-h-touch [&_a]:min-w-touch [&_a]:items-center [&_button]:min-h-touch [&_button]:min-w-touch';

/** A cell as the table would draw it. */
const render = <T,>(cell: Cell<T, unknown>) => flexRender(cell.column.columnDef.cell, cell.getContext());

/**
 * The table's rows as cards, for a phone: the columns that always show (the record's name, a
 * link) head the card, the other shown columns follow as label and value, and a row's buttons
 * (edit, record an outcome) close it. Columns the person hid on a wide screen stay hidden.
 */
export function DataTableCards<T>({ rows, label, isLoading, empty, renderExpanded, expandLabel }: DataTableCardsProps<T>) {
  if (isLoading && rows.length === 0) {
    return (
      <p className="flex items-center justify-center gap-2 rounded-md border border-stone-200 bg-white py-10 text-stone-500 shadow-card">
        <Spinner label="" /> Loading…
      </p>
    );
  }
  if (rows.length === 0) {
    return (
      <div className="rounded-md border border-stone-200 bg-white px-3 py-2 shadow-card">
        {empty ?? <p className="py-8 text-center text-stone-600">Nothing to show.</p>}
      </div>
    );
  }
  return (
    <ul aria-label={label} className="space-y-2">
      {rows.map((row) => (
        <DataCard key={row.id} row={row} renderExpanded={renderExpanded} expandLabel={expandLabel} />
      ))}
    </ul>
  );
}

function DataCard<T>({
  row,
  renderExpanded,
  expandLabel,
}: {
  row: Row<T>;
  renderExpanded?: (row: T) => ReactNode;
  expandLabel?: (row: T) => string;
}) {
  const cells = row.getVisibleCells().filter((c) => c.column.id !== '_expand');
  const heading = cells.filter((c) => c.column.columnDef.meta?.alwaysVisible && !c.column.columnDef.meta.noCsv);
  const actions = cells.filter((c) => c.column.columnDef.meta?.alwaysVisible && c.column.columnDef.meta.noCsv);
  const fields = cells.filter((c) => !c.column.columnDef.meta?.alwaysVisible);
  const expanded = row.getIsExpanded();

  return (
    <li className={clsx('rounded-md border border-stone-200 bg-white px-4 py-2 shadow-card', touchTargets)}>
      <div className="flex flex-wrap items-center gap-x-3 text-md font-medium">
        {heading.map((cell) => (
          <div key={cell.id} className="min-w-0 break-words">
            {render(cell)}
          </div>
        ))}
      </div>
      {fields.length > 0 ? (
        <dl className="grid grid-cols-[minmax(0,7rem)_minmax(0,1fr)] gap-x-3 gap-y-1 pb-1 text-sm">
          {fields.map((cell) => (
            <div key={cell.id} className="contents">
              <dt className="flex min-h-7 items-center text-stone-600">{columnLabel(cell.column)}</dt>
              <dd className="flex min-h-7 min-w-0 flex-wrap items-center gap-1 break-words text-stone-900">{render(cell)}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {actions.length > 0 || renderExpanded ? (
        <div className="flex flex-wrap items-center justify-end gap-2 border-t border-stone-100 pt-1">
          {renderExpanded ? (
            <button
              type="button"
              onClick={row.getToggleExpandedHandler()}
              aria-expanded={expanded}
              aria-label={expandLabel ? expandLabel(row.original) : 'Show details'}
              className="mr-auto inline-flex items-center gap-1 rounded px-2 text-sm font-medium text-ink-700 hover:bg-stone-100"
            >
              <ChevronRight className={clsx('h-4 w-4 transition-transform', expanded && 'rotate-90')} aria-hidden="true" />
              Details
            </button>
          ) : null}
          {actions.map((cell) => (
            <div key={cell.id}>{render(cell)}</div>
          ))}
        </div>
      ) : null}
      {expanded && renderExpanded ? <div className="border-t border-stone-100 py-3">{renderExpanded(row.original)}</div> : null}
    </li>
  );
}

/** The cards' order, for want of column headers to tap: each sortable column, either way. */
export function CardSort<T>({ table }: { table: Table<T> }) {
  const id = useId();
  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort());
  if (sortable.length === 0) return null;
  const [current] = table.getState().sorting;
  const value = current ? `${current.id}:${current.desc ? 'desc' : 'asc'}` : '';
  return (
    <div className="w-full">
      <label htmlFor={id} className="mb-1 block text-xs font-semibold text-stone-600">
        Order
      </label>
      <SelectBox
        id={id}
        value={value}
        onChange={(e) => {
          const [columnId, dir] = e.target.value.split(':');
          if (columnId) table.setSorting([{ id: columnId, desc: dir === 'desc' }]);
        }}
      >
        {sortable.flatMap((c) => [
          <option key={`${c.id}:asc`} value={`${c.id}:asc`}>
            {`${columnLabel(c)}, ascending`}
          </option>,
          <option key={`${c.id}:desc`} value={`${c.id}:desc`}>
            {`${columnLabel(c)}, descending`}
          </option>,
        ])}
      </SelectBox>
    </div>
  );
}
