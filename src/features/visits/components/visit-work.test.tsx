import type { VisitDetail } from '@shared/schemas/visits';
import { renderToStaticMarkup } from 'react-dom/server';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { VisitWork } from '@/features/visits/components/visit-work';

const wallId = '00000000-0000-4000-8000-000000000002';
const visitId = '00000000-0000-4000-8000-000000000001';

const visit = (work: boolean) =>
  ({
    id: visitId,
    wall: { id: wallId, name: 'Main hall centre wall', columns: 12, rows: 6 },
    ticket: {
      id: 't1',
      ref: 'T-1042',
      title: 'Dark modules top left',
      priority: 'high',
      status: 'scheduled',
      cells: [{ column: 3, row: 2 }],
    },
    can: { edit: false, work },
  }) as unknown as VisitDetail;

const html = (v: VisitDetail) => {
  const router = createMemoryRouter([{ path: '/', element: <VisitWork visit={v} /> }]);
  return renderToStaticMarkup(<RouterProvider router={router} />);
};

describe('the visit’s wall and ticket', () => {
  it('for the visit’s technicians, a reported cell opens the repair form on that cabinet', () => {
    const out = html(visit(true));
    expect(out).toContain('C3·R2');
    expect(out).toContain(`href="/repairs/new?visitId=${visitId}&amp;wallId=${wallId}&amp;col=3&amp;row=2"`);
  });

  it('for anyone else, the same cell opens on the wall map', () => {
    const out = html(visit(false));
    expect(out).toContain(`href="/walls/${wallId}?col=3&amp;row=2"`);
    expect(out).not.toContain('/repairs/new');
  });
});
