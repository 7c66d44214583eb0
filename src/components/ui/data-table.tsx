import {
  getCoreRowModel,
  getExpandedRowModel,
  useReactTable,
  type ColumnDef,
  type ExpandedState,
  type RowData,
  type SortingState,
  type TableOptions,
} from '@tanstack/react-table';
import { useMemo, useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { DataTableBody } from '@/components/ui/data-table-body';
import { CardSort, DataTableCards } from '@/components/ui/data-table-cards';
import { LoadError } from '@/components/ui/load-error';
import { ColumnChooser } from '@/components/ui/data-table-column-chooser';
import { useColumnVisibility, withExpander } from '@/components/ui/data-table-columns';
import { CsvExportButton, type CsvValue } from '@/components/ui/data-table-csv';
import { DataTableHead } from '@/components/ui/data-table-head';
import { FilterBar } from '@/components/ui/filters';
import { Pager } from '@/components/ui/data-table-pager';
import { useMediaQuery } from '@/lib/use-media-query';

declare module '@tanstack/react-table' {
  interface ColumnMeta<TData extends RowData, TValue> {
    /** The column's name in the column chooser and the CSV header (default: the header text). */
    label?: string;
    /** The CSV value of a row, given the row and the column's value (default: that value). */
    csv?: (row: TData, value: TValue) => CsvValue;
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
  fetchNextPage: () => Promise<{ hasNextPage: boolean }>;
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
    /** Loads the remaining pages (up to `maxPages` more), so an export holds the whole result. */
    onLoadAll: async (maxPages: number) => {
      let more = query.hasNextPage;
      for (let i = 0; more && i < maxPages; i++) more = (await query.fetchNextPage()).hasNextPage;
    },
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
  /** What TanStack Table takes: columns of any value type (a string column, a number column…). */
  columns: TableOptions<T>['columns'];
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
  /** Loads the remaining pages before an export (keyset lists); without it the export holds the rows loaded. */
  onLoadAll?: (maxPages: number) => Promise<void>;
  /** Rows that open to show more (e.g. an audit event's changes). */
  renderExpanded?: (row: T) => ReactNode;
  expandLabel?: (row: T) => string;
  /** Filters, left of the column chooser and export. */
  toolbar?: ReactNode;
  /** Shown when there are no rows. */
  empty?: ReactNode;
}

/** Below Tailwind's `sm` (640 px) a list is read on a phone: cards, not a squeezed table. */
const phoneQuery = '(max-width: 639.98px)';

/**
 * The one table of the app (TanStack Table): server-side sort, "load more" over keyset pages,
 * a column chooser that is remembered per table, expandable rows, and CSV export of the rows
 * and columns on screen. On a phone the same rows are cards with large targets, sorted from a
 * select; choosing columns and exporting are desk work and stay on the wide screen.
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
  onLoadAll,
  onLoadMore,
  isLoadingMore = false,
  renderExpanded,
  expandLabel,
  toolbar,
  empty,
}: DataTableProps<T>) {
  const allColumns = useMemo(() => withExpander<T>(columns, renderExpanded, expandLabel), [columns, renderExpanded, expandLabel]);
  const [columnVisibility, setColumnVisibility] = useColumnVisibility(tableId, allColumns);
  const [expanded, setExpanded] = useState<ExpandedState>({});

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
  const span = table.getVisibleLeafColumns().length;
  const onPhone = useMediaQuery(phoneQuery);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex w-full min-w-0 flex-wrap items-end gap-3 sm:w-auto sm:flex-1">
          <FilterBar>
            {toolbar}
            {onPhone && onSortingChange ? <CardSort table={table} /> : null}
          </FilterBar>
        </div>
        {onPhone ? null : (
          <div className="flex items-center gap-2">
            <ColumnChooser table={table} />
            <CsvExportButton table={table} rows={rows} tableId={tableId} hasNextPage={hasNextPage} onLoadAll={onLoadAll} />
          </div>
        )}
      </div>

      {error && rows.length === 0 ? (
        <LoadError title="The list could not be loaded." error={error} onRetry={onRetry} />
      ) : onPhone ? (
        <DataTableCards
          rows={rows}
          label={label}
          isLoading={isLoading}
          empty={empty}
          renderExpanded={renderExpanded}
          expandLabel={expandLabel}
        />
      ) : (
        // A box no taller than the screen below the top bar: its sideways scrollbar and sticky
        // header stay in sight, so a wide table scrolls inside it and never off the page.
        <div
          data-table-box=""
          className="max-h-[calc(100dvh-theme(spacing.topbar)-1.5rem)] overflow-auto rounded-md border border-stone-200 bg-white shadow-card"
        >
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">{label}</caption>
            <DataTableHead table={table} />
            <DataTableBody rows={rows} span={span} isLoading={isLoading} empty={empty} renderExpanded={renderExpanded} />
          </table>
        </div>
      )}

      {rows.length > 0 ? (
        <Pager shown={rows.length} hasNextPage={hasNextPage} onLoadMore={onLoadMore} isLoadingMore={isLoadingMore} />
      ) : null}
    </div>
  );
}
