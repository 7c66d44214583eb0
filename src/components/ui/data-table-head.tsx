import { flexRender, type Header, type Table } from '@tanstack/react-table';
import clsx from 'clsx';
import { ArrowDown, ArrowUp, ArrowUpDown } from 'lucide-react';

/** The column headers; a sortable column's header is a button that asks for the other order. */
export function DataTableHead<T>({ table }: { table: Table<T> }) {
  return (
    <thead className="sticky top-0 z-10 bg-stone-50">
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id} className="border-b border-stone-200">
          {group.headers.map((header) => (
            <HeaderCell key={header.id} header={header} />
          ))}
        </tr>
      ))}
    </thead>
  );
}

function HeaderCell<T>({ header }: { header: Header<T, unknown> }) {
  const meta = header.column.columnDef.meta;
  const sorted = header.column.getIsSorted();
  return (
    <th
      scope="col"
      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
      className={clsx(
        'whitespace-nowrap px-3 py-2 text-xs font-semibold text-stone-600',
        meta?.align === 'right' && 'text-right',
        meta?.className,
      )}
    >
      {header.isPlaceholder ? null : header.column.getCanSort() ? (
        <button
          type="button"
          onClick={header.column.getToggleSortingHandler()}
          className="-mx-1 inline-flex items-center gap-1 rounded px-1 py-0.5 hover:bg-stone-200/60 hover:text-ink-950"
        >
          {flexRender(header.column.columnDef.header, header.getContext())}
          <SortIcon sorted={sorted} />
        </button>
      ) : (
        flexRender(header.column.columnDef.header, header.getContext())
      )}
    </th>
  );
}

function SortIcon({ sorted }: { sorted: false | 'asc' | 'desc' }) {
  if (sorted === 'asc') return <ArrowUp className="h-3.5 w-3.5" aria-hidden="true" />;
  if (sorted === 'desc') return <ArrowDown className="h-3.5 w-3.5" aria-hidden="true" />;
  return <ArrowUpDown className="h-3.5 w-3.5 text-stone-400" aria-hidden="true" />;
}
