import type { Row, Table } from '@tanstack/react-table';
import { Download } from 'lucide-react';
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

/** "Export CSV": downloads `<tableId>-<date>.csv` of what the table shows. */
export function CsvExportButton<T>({ table, rows, tableId }: { table: Table<T>; rows: Row<T>[]; tableId: string }) {
  const exportCsv = () => {
    const { header, body } = tableCsv(table, rows);
    downloadCsv(`${tableId}-${today()}.csv`, toCsv(header, body));
  };
  return (
    <Button
      size="sm"
      onClick={exportCsv}
      disabled={rows.length === 0}
      icon={<Download className="h-4 w-4" aria-hidden="true" />}
      title="Download the rows and columns shown as a CSV file"
    >
      Export CSV
    </Button>
  );
}
