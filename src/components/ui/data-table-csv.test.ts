import { createColumnHelper, createTable, getCoreRowModel } from '@tanstack/react-table';
import { describe, expect, it } from 'vitest';
import { tableCsv } from '@/components/ui/data-table-csv';

interface Item {
  id: string;
  serial: string;
  count: number;
  status: 'installed' | 'spare';
  place: { wall: string } | null;
}

const column = createColumnHelper<Item>();
const columns = [
  column.accessor('serial', { header: 'Serial' }),
  column.accessor('count', { header: () => 'Count', meta: { label: 'How many' } }),
  column.accessor('status', { header: 'Status', meta: { csv: (row, value) => `${value.toUpperCase()} (${row.serial})` } }),
  column.accessor('place', { header: 'Place' }),
  column.display({ id: 'actions', header: 'Actions', meta: { noCsv: true } }),
];
const data: Item[] = [
  { id: 'a', serial: 'GK-1', count: 2, status: 'installed', place: { wall: 'Main' } },
  { id: 'b', serial: 'GK-2', count: 0, status: 'spare', place: null },
];

function tableOf(hidden: Record<string, boolean> = {}) {
  const table = createTable<Item>({
    data,
    columns,
    getRowId: (r) => r.id,
    getCoreRowModel: getCoreRowModel(),
    state: { columnVisibility: hidden },
    onStateChange: () => {},
    renderFallbackValue: null,
  });
  return { table, rows: table.getRowModel().rows };
}

describe('CSV export of a data table', () => {
  it('names each column by its label, else its header text, and leaves out noCsv columns', () => {
    const { table, rows } = tableOf();
    expect(tableCsv(table, rows).header).toEqual(['Serial', 'How many', 'Status', 'Place']);
  });

  it('writes the accessor value, a column’s own CSV value (given the row and the value), and objects as JSON', () => {
    const { table, rows } = tableOf();
    expect(tableCsv(table, rows).body).toEqual([
      ['GK-1', 2, 'INSTALLED (GK-1)', '{"wall":"Main"}'],
      ['GK-2', 0, 'SPARE (GK-2)', null],
    ]);
  });

  it('exports only the columns shown', () => {
    const { table, rows } = tableOf({ count: false, place: false });
    expect(tableCsv(table, rows)).toEqual({
      header: ['Serial', 'Status'],
      body: [
        ['GK-1', 'INSTALLED (GK-1)'],
        ['GK-2', 'SPARE (GK-2)'],
      ],
    });
  });
});
