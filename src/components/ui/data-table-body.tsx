import { flexRender, type Row } from '@tanstack/react-table';
import clsx from 'clsx';
import { Fragment, type ReactNode } from 'react';
import { Spinner } from '@/components/ui/spinner';

interface DataTableBodyProps<T> {
  rows: Row<T>[];
  /** The number of columns shown. */
  span: number;
  isLoading: boolean;
  empty?: ReactNode;
  renderExpanded?: (row: T) => ReactNode;
}

/** The rows, or a loading line, or what to say when there are none. */
export function DataTableBody<T>({ rows, span, isLoading, empty, renderExpanded }: DataTableBodyProps<T>) {
  return (
    <tbody>
      {isLoading && rows.length === 0 ? (
        <tr>
          <td colSpan={span} className="px-3 py-10 text-center text-stone-500">
            <Spinner className="mr-2" label="" /> Loading…
          </td>
        </tr>
      ) : rows.length === 0 ? (
        <tr>
          <td colSpan={span} className="px-3 py-2">
            {empty ?? <p className="py-8 text-center text-stone-600">Nothing to show.</p>}
          </td>
        </tr>
      ) : (
        rows.map((row) => <DataRow key={row.id} row={row} renderExpanded={renderExpanded} span={span} />)
      )}
    </tbody>
  );
}

function DataRow<T>({ row, renderExpanded, span }: { row: Row<T>; renderExpanded?: (row: T) => ReactNode; span: number }) {
  return (
    <Fragment>
      <tr className={clsx('border-b border-stone-100 last:border-b-0 hover:bg-stone-50', row.getIsExpanded() && 'bg-ink-50/40')}>
        {row.getVisibleCells().map((cell) => {
          const meta = cell.column.columnDef.meta;
          return (
            <td
              key={cell.id}
              className={clsx('px-3 py-2 align-middle', meta?.align === 'right' && 'text-right tabular-nums', meta?.className)}
            >
              {flexRender(cell.column.columnDef.cell, cell.getContext())}
            </td>
          );
        })}
      </tr>
      {row.getIsExpanded() && renderExpanded ? (
        <tr className="border-b border-stone-200 bg-stone-50">
          <td colSpan={span} className="px-3 py-3 sm:pl-12">
            {renderExpanded(row.original)}
          </td>
        </tr>
      ) : null}
    </Fragment>
  );
}
