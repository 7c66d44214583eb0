import { describe, expect, it } from 'vitest';
import { cellKeyAction } from '@/components/wall-map/wall-map-keys';

// The keys the map's own hint and the design name: Enter or Space open a cell, + and − zoom,
// 0 shows the whole wall, arrow keys move by what is seen (mirrored in the rear view).
describe('keys on a cell of the wall map', () => {
  const at = { column: 5, row: 2 };

  it('activates with Enter or Space, zooms with + (or =) and −, shows the whole wall with 0', () => {
    expect(cellKeyAction('Enter', at, 12, 6, 'front', false)).toEqual({ kind: 'activate' });
    expect(cellKeyAction(' ', at, 12, 6, 'front', false)).toEqual({ kind: 'activate' });
    expect(cellKeyAction('+', at, 12, 6, 'front', false)).toEqual({ kind: 'zoom', factor: 1.5 });
    expect(cellKeyAction('=', at, 12, 6, 'front', false)).toEqual({ kind: 'zoom', factor: 1.5 });
    expect(cellKeyAction('-', at, 12, 6, 'front', false)).toEqual({ kind: 'zoom', factor: 1 / 1.5 });
    expect(cellKeyAction('0', at, 12, 6, 'front', false)).toEqual({ kind: 'whole' });
  });

  it('moves by what is seen, and leaves other keys to the page', () => {
    expect(cellKeyAction('ArrowRight', at, 12, 6, 'front', false)).toEqual({ kind: 'move', to: { column: 6, row: 2 } });
    expect(cellKeyAction('ArrowRight', at, 12, 6, 'rear', false)).toEqual({ kind: 'move', to: { column: 4, row: 2 } });
    expect(cellKeyAction('End', at, 12, 6, 'front', true)).toEqual({ kind: 'move', to: { column: 12, row: 6 } });
    expect(cellKeyAction('Tab', at, 12, 6, 'front', false)).toBeNull();
    expect(cellKeyAction('a', at, 12, 6, 'front', false)).toBeNull();
  });
});
