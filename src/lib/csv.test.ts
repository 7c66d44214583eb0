import { describe, expect, it } from 'vitest';
import { csvCell, toCsv } from '@/lib/csv';

describe('toCsv (RFC 4180)', () => {
  it('separates fields with commas and ends every record with CRLF (RFC 4180 §2, rules 1 and 4)', () => {
    expect(toCsv(['Serial', 'Position'], [['GK-1', 'C1·R1']])).toBe('Serial,Position\r\nGK-1,C1·R1\r\n');
  });

  it('quotes fields holding a comma, a quote or a line break, doubling inner quotes (RFC 4180 §2, rules 6 and 7)', () => {
    expect(csvCell('Hall, north')).toBe('"Hall, north"');
    expect(csvCell('the "main" wall')).toBe('"the ""main"" wall"');
    expect(csvCell('line one\nline two')).toBe('"line one\nline two"');
  });

  it('writes empty values as empty fields and numbers as they are', () => {
    expect(toCsv(['a', 'b', 'c'], [[null, undefined, 2.5]])).toBe('a,b,c\r\n,,2.5\r\n');
  });
});

describe('csvCell against formula injection (OWASP "CSV Injection")', () => {
  it.each(['=1+2', '+1', '-1+2', '@SUM(A1)', '\tx', '\rx'])('prefixes %j with an apostrophe', (value) => {
    expect(csvCell(value).replace(/^"/, '')).toMatch(/^'/);
  });

  it('leaves ordinary text and real negative numbers alone', () => {
    expect(csvCell('Main hall')).toBe('Main hall');
    expect(csvCell(-3)).toBe('-3');
  });
});
