import type { Row, Table } from '@tanstack/react-table';
import { Download } from 'lucide-react';
import { useCallback, useEffect, useState } from 'react';
import { Button } from '@/components/ui/button';
import { columnLabel } from '@/components/ui/data-table-columns';
import { downloadCsv, toCsv } from '@/lib/csv';

export type CsvValue = string | number | boolean | null | undefined;

/** The header and the lines of a CSV of the rows and columns on screen (columns marked `noCsv` left out). */
export function tableCsv<T>(table: Table<T>, rows: Row<T>[]): { header: string[]; body: CsvValue[][] } {
  const cols = table.getVisibleLeafColumns().filter((c) => !c.columnDef.meta?.noCsv);
  const header = cols.map((c) => columnLabel(c));
  const body = rows.map((row) =>
    cols.map((c) => {
      const meta = c.columnDef.meta;
      const value = row.getValue(c.id);
      if (meta?.csv) return meta.csv(row.original, value);
      return value === null || value === undefined || typeof value !== 'object' ? (value as CsvValue) : JSON.stringify(value);
    }),
  );
  return { header, body };
}

const today = () => new Date().toISOString().slice(0, 10);

interface CsvExportButtonProps<T> {
  table: Table<T>;
  rows: Row<T>[];
  tableId: string;
  /** More rows exist on the server than are loaded. */
  hasNextPage?: boolean;
  /** Loads the remaining pages first, so the file holds the whole result (up to a limit). */
  onLoadAll?: (maxPages: number) => Promise<void>;
}

/** The most pages an export loads: about ten thousand rows at the lists' page sizes. */
const EXPORT_MAX_PAGES = 100;

/**
 * "Export CSV": downloads `<tableId>-<date>.csv` of the shown columns and of every row of the
 * result: the remaining pages are loaded first (up to a limit; a longer list is narrowed first).
 */
export function CsvExportButton<T>({ table, rows, tableId, hasNextPage = false, onLoadAll }: CsvExportButtonProps<T>) {
  const [waiting, setWaiting] = useState(false);
  const save = useCallback(() => {
    const { header, body } = tableCsv(table, table.getRowModel().rows);
    downloadCsv(`${tableId}-${today()}.csv`, toCsv(header, body));
  }, [table, tableId]);
  // Once the remaining pages are in, the table has re-rendered with them: export then.
  useEffect(() => {
    if (waiting && rows.length > 0) {
      setWaiting(false);
      save();
    }
  }, [waiting, rows, save]);
  const exportCsv = async () => {
    if (hasNextPage && onLoadAll) {
      await onLoadAll(EXPORT_MAX_PAGES);
      // The query tells its screens about new pages on the next task: let the table take them in.
      await new Promise((resolve) => setTimeout(resolve, 0));
      await new Promise((resolve) => setTimeout(resolve, 0));
      setWaiting(true);
    } else save();
  };
  return (
    <Button
      size="sm"
      onClick={() => void exportCsv()}
      disabled={rows.length === 0 || waiting}
      icon={<Download className="h-4 w-4" aria-hidden="true" />}
      title="Download every row of the list, with the columns shown, as a CSV file"
    >
      Export CSV
    </Button>
  );
}
