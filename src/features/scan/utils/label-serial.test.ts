import { describe, expect, it } from 'vitest';
import { serialFromLabel } from '@/features/scan/utils/label-serial';

// The label format is the product's own: `${origin}/c/${encodeURIComponent(serial)}`
// (labelUrl in src/features/cabinets/components/cabinet-labels-sheet.tsx). URL parsing and
// percent-decoding follow the WHATWG URL Standard and ECMAScript's decodeURIComponent.

describe('serialFromLabel', () => {
  it('takes the serial from a label address of this or any other origin', () => {
    expect(serialFromLabel('https://service.example.com/c/LX-000123')).toBe('LX-000123');
    expect(serialFromLabel('http://127.0.0.1:3000/c/LX-000123')).toBe('LX-000123');
    // Installed under a path prefix.
    expect(serialFromLabel('https://example.org/gridkeep/c/LX-000123')).toBe('LX-000123');
  });

  it('upper-cases the serial as the server stores it', () => {
    expect(serialFromLabel('https://example.org/c/lx-00a9')).toBe('LX-00A9');
  });

  it('decodes a serial with a slash, which the label writes as %2F', () => {
    // encodeURIComponent('B7/0001') === 'B7%2F0001'
    expect(serialFromLabel(`https://example.org/c/${encodeURIComponent('B7/0001')}`)).toBe('B7/0001');
  });

  it('ignores surrounding spaces, a trailing slash, a query and a fragment', () => {
    expect(serialFromLabel('  https://example.org/c/AB12/?from=label#top \n')).toBe('AB12');
  });

  it('refuses codes that are not cabinet labels', () => {
    expect(serialFromLabel('AB12')).toBeNull(); // a bare serial is not an address
    expect(serialFromLabel('WIFI:S:venue;T:WPA;P:secret;;')).toBeNull();
    expect(serialFromLabel('https://example.org/tickets/AB12')).toBeNull();
    expect(serialFromLabel('https://example.org/c/')).toBeNull();
    expect(serialFromLabel('https://example.org/c/AB12/history')).toBeNull();
    expect(serialFromLabel('ftp://example.org/c/AB12')).toBeNull();
    expect(serialFromLabel('javascript:alert(1)//c/AB12')).toBeNull();
  });

  it('refuses a serial the register could not hold', () => {
    expect(serialFromLabel('https://example.org/c/AB%2012')).toBeNull(); // a space
    expect(serialFromLabel('https://example.org/c/%E0%A4%A')).toBeNull(); // broken percent-encoding
    expect(serialFromLabel(`https://example.org/c/${'A'.repeat(65)}`)).toBeNull(); // over 64 characters
  });
});
