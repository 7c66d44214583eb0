// The ticket reference both ways: how ticketRef writes it, and which queries ticketNumberIn reads
// as a ticket's number. The forms are Gridkeep's own (docs/look.md, "The ticket reference").
import { describe, expect, it } from 'vitest';
import { ticketNumberIn } from './search';
import { ticketRef } from './tickets';

describe('ticketRef', () => {
  it('is the number, a slash and the two-digit year the ticket was opened', () => {
    expect(ticketRef(1041, new Date('2026-03-14T09:00:00Z'))).toBe('1041/26');
    expect(ticketRef(7, '2026-03-14T09:00:00.000Z')).toBe('7/26');
  });

  it('takes the year in UTC, whatever the time zone of the server', () => {
    // 31 Dec 23:30 UTC is already 1 January in Berlin and still 31 December in Chicago: the UTC year counts.
    expect(ticketRef(1041, new Date('2025-12-31T23:30:00Z'))).toBe('1041/25');
    expect(ticketRef(1041, '2025-12-31T17:30:00-06:00')).toBe('1041/25');
    // 1 Jan 00:10 UTC is still 31 December in Chicago: UTC says the new year.
    expect(ticketRef(1042, new Date('2026-01-01T00:10:00Z'))).toBe('1042/26');
    expect(ticketRef(1042, '2025-12-31T18:10:00-06:00')).toBe('1042/26');
  });

  it('keeps two digits for the first years of a century', () => {
    expect(ticketRef(1001, new Date('2000-06-01T00:00:00Z'))).toBe('1001/00');
    expect(ticketRef(1001, new Date('2009-06-01T00:00:00Z'))).toBe('1001/09');
    expect(ticketRef(1001, new Date('2100-06-01T00:00:00Z'))).toBe('1001/00');
  });

  it('refuses a time that is not one, or a number no ticket has', () => {
    expect(() => ticketRef(1041, 'not a date')).toThrow(RangeError);
    expect(() => ticketRef(0, new Date('2026-01-01T00:00:00Z'))).toThrow(RangeError);
    expect(() => ticketRef(10.5, new Date('2026-01-01T00:00:00Z'))).toThrow(RangeError);
  });

  it('is read back as its number', () => {
    for (const [n, at] of [
      [1041, '2026-03-14T09:00:00Z'],
      [3, '2025-12-31T23:30:00Z'],
      [123456789, '2001-01-01T00:10:00Z'],
    ] as const)
      expect(ticketNumberIn(ticketRef(n, at))).toBe(n);
  });
});

describe('ticketNumberIn', () => {
  it.each([
    ['1041/26', 1041],
    ['1041 / 26', 1041],
    ['  1041/26  ', 1041],
    ['1041/2026', 1041],
    ['1041/25', 1041],
    ['#1041/26', 1041],
    ['1041-26', 1041],
    ['7/26', 7],
    ['1041', 1041],
    ['#1041', 1041],
    ['0042', 42],
    // References written before the year was part of them, as in e-mails sent then.
    ['GK-1041', 1041],
    ['gk-1041', 1041],
    ['gk1041', 1041],
    ['GK 1041', 1041],
    ['GK-0042', 42],
  ])('reads %j as ticket %i', (q, n) => {
    expect(ticketNumberIn(q)).toBe(n);
  });

  it.each([
    // Year first, or a year no ticket of this product was opened in.
    '26/1041',
    '2026/1041',
    '1041/1999',
    '1041/226',
    // Dates: a one-digit part, a zero-padded day, a whole date.
    '12/5',
    '1/5',
    '05/12',
    '12/05/2026',
    '2026-12-05',
    // No number, or none a ticket has.
    '0',
    '0/26',
    '#',
    '/26',
    '1041/',
    'GK-',
    'GK-1041/26',
    '1234567890',
    'Dark row',
    'row 1041',
    '1041 26',
    '1041//26',
  ])('does not read %j as a ticket number', (q) => {
    expect(ticketNumberIn(q)).toBeNull();
  });

  it('reads a day and month such as 12/05 as ticket 12 of 2005: a young database has ticket 12', () => {
    // The documented choice in search.ts: the words are searched as well, so the date still finds its tickets.
    expect(ticketNumberIn('12/05')).toBe(12);
  });
});
