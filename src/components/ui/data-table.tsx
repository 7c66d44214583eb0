import {
  flexRender,
  getCoreRowModel,
  getExpandedRowModel,
  useReactTable,
  type ColumnDef,
  type ExpandedState,
  type Row,
  type RowData,
  type SortingState,
  type VisibilityState,
} from '@tanstack/react-table';
import clsx from 'clsx';
import { ArrowDown, ArrowUp, ArrowUpDown, ChevronRight, Columns3, Download } from 'lucide-react';
import { Fragment, useEffect, useMemo, useState, type ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Popover } from '@/components/ui/popover';
import { Spinner } from '@/components/ui/spinner';
import { downloadCsv, toCsv } from '@/lib/csv';
import { errorMessage } from '@/lib/errors';

type CsvValue = string | number | boolean | null | undefined;

declare module '@tanstack/react-table' {
  interface ColumnMeta<TData extends RowData, TValue> {
    /** The column's name in the column chooser and the CSV header (default: the header text). */
    label?: string;
    /** The CSV value of a row (default: the column's accessor value). */
    csv?: (row: TData) => CsvValue;
    /** Leave the column out of the CSV export (actions, buttons). */
    noCsv?: boolean;
    /** The column cannot be hidden with the column chooser. */
    alwaysVisible?: boolean;
    /** Hidden until the person chooses to show it. */
    hiddenByDefault?: boolean;
    align?: 'left' | 'right';
    /** Extra classes for the column's cells (width, wrapping). */
    className?: string;
  }
}

/** What a DataTable needs of an infinite query (TanStack Query's result has all of it). */
interface PagedQuery {
  isPending: boolean;
  error: unknown;
  refetch: () => unknown;
  hasNextPage: boolean;
  fetchNextPage: () => unknown;
  isFetchingNextPage: boolean;
}

/** The loading, error and "load more" props of a DataTable fed by a keyset-paged infinite query. */
export function pagedQueryProps(query: PagedQuery) {
  return {
    isLoading: query.isPending,
    error: query.error,
    onRetry: () => void query.refetch(),
    hasNextPage: query.hasNextPage,
    onLoadMore: () => void query.fetchNextPage(),
    isLoadingMore: query.isFetchingNextPage,
  };
}

/** A last column with an "Edit" button on each row, named after the row for screen readers. */
export function editColumn<T>(onEdit: (row: T) => void, nameOf: (row: T) => string): ColumnDef<T, unknown> {
  return {
    id: 'actions',
    header: () => <span className="sr-only">Actions</span>,
    meta: { noCsv: true, alwaysVisible: true, align: 'right', className: 'w-px whitespace-nowrap' },
    cell: ({ row }) => (
      <Button size="sm" variant="ghost" onClick={() => onEdit(row.original)} aria-label={`Edit ${nameOf(row.original)}`}>
        Edit
      </Button>
    ),
  };
}

export interface DataTableProps<T> {
  /** Names the remembered column choice and the CSV file. */
  tableId: string;
  /** What the table lists, for screen readers. */
  label: string;
  columns: ColumnDef<T, any>[];
  data: T[];
  getRowId: (row: T) => string;
  isLoading?: boolean;
  error?: unknown;
  onRetry?: () => void;
  /**
   * Server-side sort: the table shows the order and asks for a new one; the caller puts it in
   * the query. Only columns with `enableSorting: true` can be sorted.
   */
  sorting?: SortingState;
  onSortingChange?: (sorting: SortingState) => void;
  /** Keyset pagination: another page exists after the rows shown. */
  hasNextPage?: boolean;
  onLoadMore?: () => void;
  isLoadingMore?: boolean;
  /** Rows that open to show more (e.g. an audit event's changes). */
  renderExpanded?: (row: T) => ReactNode;
  expandLabel?: (row: T) => string;
  /** Filters, left of the column chooser and export. */
  toolbar?: ReactNode;
  /** Shown when there are no rows. */
  empty?: ReactNode;
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

const today = () => new Date().toISOString().slice(0, 10);

/**
 * The one table of the app (TanStack Table): server-side sort, "load more" over keyset pages,
 * a column chooser that is remembered per table, expandable rows, and CSV export of the rows
 * and columns on screen.
 */
export function DataTable<T>({
  tableId,
  label,
  columns,
  data,
  getRowId,
  isLoading = false,
  error,
  onRetry,
  sorting,
  onSortingChange,
  hasNextPage = false,
  onLoadMore,
  isLoadingMore = false,
  renderExpanded,
  expandLabel,
  toolbar,
  empty,
}: DataTableProps<T>) {
  const allColumns = useMemo<ColumnDef<T, unknown>[]>(() => {
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
  }, [columns, renderExpanded, expandLabel]);

  const [columnVisibility, setColumnVisibility] = useState<VisibilityState>(() => readVisibility(tableId, allColumns));
  const [expanded, setExpanded] = useState<ExpandedState>({});

  useEffect(() => {
    try {
      localStorage.setItem(hiddenStorageKey(tableId), JSON.stringify(columnVisibility));
    } catch {
      /* private mode: the choice lasts for this visit only */
    }
  }, [tableId, columnVisibility]);

  const table = useReactTable<T>({
    data,
    columns: allColumns,
    getRowId: (row) => getRowId(row),
    state: { columnVisibility, expanded, sorting: sorting ?? [] },
    onColumnVisibilityChange: setColumnVisibility,
    onExpandedChange: setExpanded,
    manualSorting: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    enableSorting: Boolean(onSortingChange),
    defaultColumn: { enableSorting: false },
    onSortingChange: (updater) => onSortingChange?.(typeof updater === 'function' ? updater(sorting ?? []) : updater),
    getRowCanExpand: () => Boolean(renderExpanded),
    getCoreRowModel: getCoreRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
  });

  const rows = table.getRowModel().rows;
  const visibleColumns = table.getVisibleLeafColumns();

  const columnLabel = (columnId: string) => {
    const column = table.getColumn(columnId);
    const header = column?.columnDef.header;
    return column?.columnDef.meta?.label ?? (typeof header === 'string' ? header : columnId);
  };

  const exportCsv = () => {
    const cols = visibleColumns.filter((c) => !c.columnDef.meta?.noCsv);
    const header = cols.map((c) => columnLabel(c.id));
    const body = rows.map((row) =>
      cols.map((c) => {
        const meta = c.columnDef.meta;
        if (meta?.csv) return meta.csv(row.original);
        const value = row.getValue(c.id);
        return value === null || value === undefined || typeof value !== 'object' ? (value as CsvValue) : JSON.stringify(value);
      }),
    );
    downloadCsv(`${tableId}-${today()}.csv`, toCsv(header, body));
  };

  const hideable = table.getAllLeafColumns().filter((c) => !c.columnDef.meta?.alwaysVisible);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex w-full min-w-0 flex-wrap items-end gap-3 sm:w-auto sm:flex-1">{toolbar}</div>
        <div className="flex items-center gap-2">
          {hideable.length > 0 ? (
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
                    <span className="text-base">{columnLabel(column.id)}</span>
                  </label>
                ))}
              </fieldset>
            </Popover>
          ) : null}
          <Button
            size="sm"
            onClick={exportCsv}
            disabled={rows.length === 0}
            icon={<Download className="h-4 w-4" aria-hidden="true" />}
            title="Download the rows and columns shown as a CSV file"
          >
            Export CSV
          </Button>
        </div>
      </div>

      {error && rows.length === 0 ? (
        <Alert tone="danger" title="The list could not be loaded.">
          <p>{errorMessage(error)}</p>
          {onRetry ? (
            <Button size="sm" className="mt-2" onClick={onRetry}>
              Try again
            </Button>
          ) : null}
        </Alert>
      ) : (
        <div className="overflow-x-auto rounded-md border border-stone-200 bg-white shadow-card">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">{label}</caption>
            <thead className="sticky top-0 z-10 bg-stone-50">
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id} className="border-b border-stone-200">
                  {group.headers.map((header) => {
                    const meta = header.column.columnDef.meta;
                    const sorted = header.column.getIsSorted();
                    const canSort = header.column.getCanSort();
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                        className={clsx(
                          'whitespace-nowrap px-3 py-2 text-xs font-semibold text-stone-600',
                          meta?.align === 'right' && 'text-right',
                          meta?.className,
                        )}
                      >
                        {header.isPlaceholder ? null : canSort ? (
                          <button
                            type="button"
                            onClick={header.column.getToggleSortingHandler()}
                            className="-mx-1 inline-flex items-center gap-1 rounded px-1 py-0.5 hover:bg-stone-200/60 hover:text-ink-950"
                          >
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            {sorted === 'asc' ? (
                              <ArrowUp className="h-3.5 w-3.5" aria-hidden="true" />
                            ) : sorted === 'desc' ? (
                              <ArrowDown className="h-3.5 w-3.5" aria-hidden="true" />
                            ) : (
                              <ArrowUpDown className="h-3.5 w-3.5 text-stone-400" aria-hidden="true" />
                            )}
                          </button>
                        ) : (
                          flexRender(header.column.columnDef.header, header.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {isLoading && rows.length === 0 ? (
                <tr>
                  <td colSpan={visibleColumns.length} className="px-3 py-10 text-center text-stone-500">
                    <Spinner className="mr-2" label="" /> Loading…
                  </td>
                </tr>
              ) : rows.length === 0 ? (
                <tr>
                  <td colSpan={visibleColumns.length} className="px-3 py-2">
                    {empty ?? <p className="py-8 text-center text-stone-600">Nothing to show.</p>}
                  </td>
                </tr>
              ) : (
                rows.map((row) => <DataRow key={row.id} row={row} renderExpanded={renderExpanded} span={visibleColumns.length} />)
              )}
            </tbody>
          </table>
        </div>
      )}

      {rows.length > 0 ? (
        <div className="flex flex-wrap items-center justify-between gap-3 text-sm text-stone-600">
          <p aria-live="polite">
            {rows.length === 1 ? '1 row shown' : `${rows.length} rows shown`}
            {hasNextPage ? ', more available' : ''}
          </p>
          {hasNextPage && onLoadMore ? (
            <Button size="sm" onClick={onLoadMore} loading={isLoadingMore}>
              Load more
            </Button>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}

function DataRow<T>({ row, renderExpanded, span }: { row: Row<T>; renderExpanded?: (row: T) => ReactNode; span: number }) {
  return (
    <Fragment>
      <tr className={clsx('border-b border-stone-100 last:border-b-0 hover:bg-stone-50', row.getIsExpanded() && 'bg-ink-50/40')}>
        {row.getVisibleCells().map((cell) => {
          const meta = cell.column.columnDef.meta;
          return (
            <td key={cell.id} className={clsx('px-3 py-2 align-middle', meta?.align === 'right' && 'text-right tabular-nums', meta?.className)}>
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
