/**
 * CSV text for a table (RFC 4180: comma separated, CRLF line ends, fields with a comma, quote or
 * line break wrapped in double quotes with inner quotes doubled).
 *
 * Cells that a spreadsheet would run as a formula (starting with =, +, -, @, tab or carriage
 * return) get a leading apostrophe, as OWASP's "CSV Injection" page advises.
 */
export function toCsv(header: string[], rows: (string | number | boolean | null | undefined)[][]): string {
  return [header, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

export function csvCell(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  let text = String(value);
  if (typeof value === 'string' && /^[=+\-@\t\r]/.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Offers `text` to the browser as a download. A UTF-8 byte-order mark lets spreadsheets read accents. */
export function downloadCsv(filename: string, text: string) {
  const blob = new Blob(['\uFEFF', text], { type: 'text/csv;charset=utf-8' });
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
