import fc from 'fast-check';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import {
  CELL_GAP,
  clampViewBox,
  maxScaleFor,
  mirrorViewBox,
  revealRect,
  stepFrom,
  wallLayout,
  zoomAt,
} from '@/components/wall-map/wall-map-geometry';
import { cellName, WallMap } from '@/components/wall-map/wall-map';

// The rules checked here come from the product's description of the register
// (docs: "Grid positions are written C{column}·R{row} counting from the top-left as seen from
// the audience. Technicians work from the back, where left and right are mirrored … the label
// on each cell stays the same in both views").

const grid = fc.record({ columns: fc.integer({ min: 1, max: 60 }), rows: fc.integer({ min: 1, max: 40 }) });
const cellIn = (columns: number, rows: number) =>
  fc.record({ column: fc.integer({ min: 1, max: columns }), row: fc.integer({ min: 1, max: rows }) });

describe('wall layout', () => {
  it('puts C1·R1 at the top-left in the front view and at the top-right in the rear view', () => {
    const front = wallLayout(12, 6, 'front');
    const rear = wallLayout(12, 6, 'rear');
    const c1 = { column: 1, row: 1 };
    const c12 = { column: 12, row: 1 };
    expect(front.cellRect(c1).x).toBe(front.grid.x);
    expect(front.cellRect(c12).x + front.cellWidth).toBe(front.grid.x + front.grid.width);
    expect(rear.cellRect(c12).x).toBe(rear.grid.x);
    expect(rear.cellRect(c1).x + rear.cellWidth).toBe(rear.grid.x + rear.grid.width);
    // Rows do not change between the views.
    expect(rear.cellRect({ column: 3, row: 5 }).y).toBe(front.cellRect({ column: 3, row: 5 }).y);
  });

  it('mirrors every cell across the middle of the grid in the rear view', () => {
    fc.assert(
      fc.property(
        grid.chain((g) => fc.tuple(fc.constant(g), cellIn(g.columns, g.rows))),
        ([g, p]) => {
          const front = wallLayout(g.columns, g.rows, 'front');
          const rear = wallLayout(g.columns, g.rows, 'rear');
          const middle = front.grid.x + front.grid.width / 2;
          expect(front.center(p).x - middle).toBeCloseTo(middle - rear.center(p).x, 9);
          expect(front.center(p).y).toBe(rear.center(p).y);
        },
      ),
    );
  });

  it('finds the cell under any point of a cell (cellAt is the inverse of cellRect)', () => {
    fc.assert(
      fc.property(
        grid.chain((g) => fc.tuple(fc.constant(g), cellIn(g.columns, g.rows), fc.constantFrom<'front' | 'rear'>('front', 'rear'))),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        ([g, p, view], fx, fy) => {
          const layout = wallLayout(g.columns, g.rows, view, 1.5);
          const r = layout.cellRect(p);
          expect(layout.cellAt(r.x + fx * r.width, r.y + fy * r.height)).toEqual(p);
        },
      ),
    );
  });

  it('answers null in the gaps and outside the grid', () => {
    const layout = wallLayout(4, 3);
    const r = layout.cellRect({ column: 2, row: 2 });
    expect(layout.cellAt(r.x + r.width + CELL_GAP / 2, r.y + 10)).toBeNull();
    expect(layout.cellAt(layout.grid.x - 1, layout.grid.y + 5)).toBeNull();
    expect(layout.cellAt(layout.grid.x + layout.grid.width + 1, layout.grid.y + 5)).toBeNull();
  });

  it('draws cells as tall as the cabinet is (height ÷ width)', () => {
    const layout = wallLayout(2, 2, 'front', 2); // a 500 × 1000 mm cabinet
    expect(layout.cellRect({ column: 1, row: 1 }).height).toBe(2 * layout.cellRect({ column: 1, row: 1 }).width);
  });
});

describe('zoom and pan', () => {
  const content = wallLayout(20, 10).content;
  const max = maxScaleFor(20, 10);

  it('keeps the point under the pointer where it was while zooming', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 0.9 }),
        fc.double({ min: 0.1, max: 0.9 }),
        (f, fx, fy) => {
          const at = { x: content.x + fx * content.width, y: content.y + fy * content.height };
          const next = zoomAt(content, content, f, at, max);
          const relBefore = (at.x - content.x) / content.width;
          const relAfter = (at.x - next.x) / next.width;
          // Exact unless the window had to be pushed back inside the drawing.
          const inside = next.x > content.x && next.x + next.width < content.x + content.width;
          if (inside) expect(relAfter).toBeCloseTo(relBefore, 9);
          expect(next.width).toBeCloseTo(content.width / f, 6);
        },
      ),
    );
  });

  it('never zooms out past the whole wall nor in past the limit, and stays inside the drawing', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: -5000, max: 5000, noNaN: true }), (f, shift) => {
        const next = clampViewBox(zoomAt(content, content, f, { x: content.width / 2 + shift, y: 0 }, max), content, max);
        expect(next.width).toBeLessThanOrEqual(content.width + 1e-9);
        expect(next.width).toBeGreaterThanOrEqual(content.width / max - 1e-9);
        expect(next.x).toBeGreaterThanOrEqual(content.x - 1e-9);
        expect(next.x + next.width).toBeLessThanOrEqual(content.x + content.width + 1e-9);
        // The window keeps the drawing's proportions.
        expect(next.height / next.width).toBeCloseTo(content.height / content.width, 9);
      }),
    );
  });

  it('brings a cell that was off screen into view', () => {
    const layout = wallLayout(20, 10);
    const zoomed = zoomAt(layout.content, layout.content, 4, { x: 0, y: 0 }, max);
    const far = layout.cellRect({ column: 20, row: 10 });
    const next = revealRect(zoomed, layout.content, far, max);
    expect(far.x).toBeGreaterThanOrEqual(next.x);
    expect(far.x + far.width).toBeLessThanOrEqual(next.x + next.width);
    expect(far.y + far.height).toBeLessThanOrEqual(next.y + next.height);
  });

  it('keeps the same cabinets on screen when switching to the rear view', () => {
    const front = wallLayout(20, 10, 'front');
    const rear = wallLayout(20, 10, 'rear');
    const target = { column: 3, row: 4 };
    const zoomed = zoomAt(front.content, front.content, 4, front.center(target), max);
    const mirrored = mirrorViewBox(zoomed, front, rear, max);
    const c = rear.center(target);
    expect(c.x).toBeGreaterThan(mirrored.x);
    expect(c.x).toBeLessThan(mirrored.x + mirrored.width);
  });
});

describe('arrow keys', () => {
  it('move by what is seen: right is the next column in front, the previous one from the rear', () => {
    const p = { column: 5, row: 2 };
    expect(stepFrom(p, 'ArrowRight', 12, 6, 'front')).toEqual({ column: 6, row: 2 });
    expect(stepFrom(p, 'ArrowRight', 12, 6, 'rear')).toEqual({ column: 4, row: 2 });
    expect(stepFrom(p, 'ArrowDown', 12, 6, 'rear')).toEqual({ column: 5, row: 3 });
    expect(stepFrom(p, 'Home', 12, 6, 'rear')).toEqual({ column: 12, row: 2 });
    expect(stepFrom({ column: 12, row: 6 }, 'ArrowRight', 12, 6, 'front')).toEqual({ column: 12, row: 6 });
    expect(stepFrom(p, 'x', 12, 6, 'front')).toBeNull();
  });
});

describe('WallMap markup', () => {
  const cells = [
    { column: 4, row: 2, serial: 'ABC123' },
    { column: 1, row: 1, serial: 'ZZ-1', tone: 'open_ticket' as const },
  ];
  const render = (view: 'front' | 'rear') =>
    renderToStaticMarkup(<WallMap columns={6} rows={3} cells={cells} view={view} ariaLabel="Test wall" onCellActivate={() => undefined} />);
  const cellX = (html: string, c: number, r: number) => {
    const m = new RegExp(`<rect role="gridcell"[^>]*? aria-label="C${c}·R${r},[^"]*"[^>]*? x="([\\d.]+)"`).exec(html);
    return m ? Number(m[1]) : NaN;
  };

  it('names each cell by position, serial and state', () => {
    const html = render('front');
    expect(html).toContain('aria-label="C4·R2, serial ABC123, installed"');
    expect(html).toContain('aria-label="C1·R1, serial ZZ-1, open ticket"');
    expect(html).toContain('aria-label="C2·R3, empty"');
    expect(cellName({ column: 2, row: 1 }, { column: 2, row: 1, heat: 0.5 })).toBe('C2·R1, empty, repair heat 50 %');
  });

  it('has exactly one cell in the tab order', () => {
    const html = render('front');
    expect(html.match(/tabindex="0"/g)).toHaveLength(1);
    expect(html.match(/role="gridcell"/g)).toHaveLength(18);
  });

  it('labels the rear view and mirrors the cells while their labels stay', () => {
    const front = render('front');
    const rear = render('rear');
    expect(rear).toContain('Rear view (as seen by the technician behind the wall)');
    expect(rear).toContain('aria-label="C4·R2, serial ABC123, installed"');
    expect(cellX(front, 1, 1)).toBeLessThan(cellX(front, 6, 1));
    expect(cellX(rear, 1, 1)).toBeGreaterThan(cellX(rear, 6, 1));
    expect(cellX(rear, 1, 1)).toBe(cellX(front, 6, 1));
  });
});
