import { describe, expect, it } from 'vitest';
import { createFilterWriter, withFilters } from '@/lib/list-filters';

describe('a list’s filters in the address', () => {
  it('writes the filters given, leaving out empty values and the defaults, and keeps the others', () => {
    const next = withFilters(new URLSearchParams('status=planned&q=hall&siteId=s1'), { q: '', dir: 'desc', siteId: 's2' }, { dir: 'desc' });
    expect(next.get('status')).toBe('planned');
    expect(next.get('siteId')).toBe('s2');
    expect(next.has('q')).toBe(false);
    expect(next.has('dir')).toBe(false);
  });

  it('keeps a first change when a second comes before the list shows the first', () => {
    const write = createFilterWriter();
    const shown = new URLSearchParams('dir=asc');
    // A technician, then a status, both chosen on the screen drawn from `shown`.
    write(shown, { technicianId: 't1' });
    const second = write(shown, { status: 'cancelled' });
    expect(second.get('technicianId')).toBe('t1');
    expect(second.get('status')).toBe('cancelled');
    expect(second.get('dir')).toBe('asc');
  });

  it('builds on the address once the router shows a new one (the back button, a link)', () => {
    const write = createFilterWriter();
    write(new URLSearchParams(), { technicianId: 't1' });
    const elsewhere = new URLSearchParams('status=planned');
    const next = write(elsewhere, { dir: 'asc' });
    expect(next.toString()).toBe('status=planned&dir=asc');
  });
});
