import { renderToStaticMarkup } from 'react-dom/server';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import type { TicketRepair } from '@shared/schemas/tickets';
import { repairHeadline, TicketRepairs } from '@/features/tickets/components/ticket-repairs';

const base: TicketRepair = {
  id: 'r1',
  column: 7,
  row: 4,
  position: 'C7·R4',
  module: { column: 1, row: 2 },
  component: 'module',
  fault: 'dead_module',
  action: 'replaced',
  cabinetSerial: 'HX26-0001',
  technicianName: 'Jonah Ellery',
  performedAt: '2026-10-04T15:00:00Z',
};

const html = (repairs: TicketRepair[]) => {
  const router = createMemoryRouter([{ path: '/', element: <TicketRepairs repairs={repairs} timeZone="America/Chicago" /> }]);
  return renderToStaticMarkup(<RouterProvider router={router} />);
};

describe('ticket repairs', () => {
  it('says what was done, to which module, where', () => {
    expect(repairHeadline(base)).toBe('Replaced module 1,2 at C7·R4');
    expect(repairHeadline({ ...base, component: 'receiving_card', action: 'reseated', module: null })).toBe(
      'Reseated receiving card at C7·R4',
    );
    expect(repairHeadline({ ...base, component: 'whole_cabinet', action: 'cabinet_swapped', module: null })).toBe(
      'Swapped the cabinet for a spare at C7·R4',
    );
  });

  it('shows the time in the site’s zone, links the cabinet, and shows stock and notes only when the server sent them', () => {
    const client = html([base]);
    // 15:00 UTC on 4 October 2026 is 10:00 in Chicago (CDT, UTC−5).
    expect(client).toContain('Sun 4 Oct, 10:00 CDT');
    expect(client).toContain('href="/c/HX26-0001"');
    expect(client).not.toContain('Spare:');
    const staff = html([{ ...base, notes: 'From the site kit', part: { name: 'HX module', batch: 'B7' }, removedPartFate: 'to_bench' }]);
    expect(staff).toContain('Spare: HX module, batch B7 · removed part to the bench');
    expect(staff).toContain('From the site kit');
  });

  it('draws nothing when no repair is linked', () => {
    expect(html([])).toBe('');
  });
});
