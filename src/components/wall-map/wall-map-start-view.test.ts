import { describe, expect, it } from 'vitest';
import { clampViewBox, maxScaleFor, MIN_TAP_PX, startViewBox, wallLayout, type Rect } from '@/components/wall-map/wall-map-geometry';

// The 44 × 44 px minimum touch target is the product's phone rule (DEVELOPERS.md, "Phone first":
// targets at least 44 × 44 px); it matches WCAG 2.2 SC 2.5.5 "Target Size (Enhanced)", 44 by 44 CSS pixels.

/** A cell's size on screen (CSS px) when `vb` is drawn into a `size` box with "meet". */
function cellPx(layout: ReturnType<typeof wallLayout>, vb: Rect, size: { width: number; height: number }) {
  const pxPerUnit = Math.min(size.width / vb.width, size.height / vb.height);
  return Math.min(layout.cellWidth, layout.cellHeight) * pxPerUnit;
}

/** The map's box on a 390 px phone: the page's padding leaves about 350 px; the height follows the drawing. */
function phoneBox(layout: ReturnType<typeof wallLayout>, width = 350) {
  return { width, height: width * (layout.content.height / layout.content.width) };
}

const centreOf = (r: Rect) => ({ x: r.x + r.width / 2, y: r.y + r.height / 2 });

describe('the start view of the wall map', () => {
  it('shows the whole wall when its cells are already big enough to tap', () => {
    const layout = wallLayout(4, 3);
    const size = { width: 1000, height: 1000 * (layout.content.height / layout.content.width) };
    expect(cellPx(layout, layout.content, size)).toBeGreaterThanOrEqual(MIN_TAP_PX);
    expect(startViewBox(layout, size, maxScaleFor(4, 3))).toEqual(layout.content);
  });

  it('shows the whole wall until the size on screen is known', () => {
    const layout = wallLayout(12, 6);
    expect(startViewBox(layout, { width: 0, height: 0 }, maxScaleFor(12, 6))).toEqual(layout.content);
  });

  it('zooms a 12-column wall on a phone until a cell is at least 44 px, starting at the top-left with the rulers', () => {
    const layout = wallLayout(12, 6);
    const size = phoneBox(layout);
    // Whole, a cell is too small to tap (about 25 px).
    expect(cellPx(layout, layout.content, size)).toBeLessThan(30);
    const vb = startViewBox(layout, size, maxScaleFor(12, 6));
    expect(cellPx(layout, vb, size)).toBeGreaterThanOrEqual(MIN_TAP_PX);
    // Only just: no more zoom than needed, so as much of the wall as possible stays in view.
    expect(cellPx(layout, vb, size)).toBeLessThan(MIN_TAP_PX * 1.1);
    expect(vb.x).toBe(0);
    expect(vb.y).toBe(0);
    // The window keeps the drawing's proportions and stays inside it.
    expect(vb.width / vb.height).toBeCloseTo(layout.content.width / layout.content.height, 9);
    expect(clampViewBox(vb, layout.content, maxScaleFor(12, 6))).toEqual(vb);
  });

  it('centres on the reported cell, in the rear view where C1 is drawn on the right', () => {
    for (const view of ['front', 'rear'] as const) {
      const layout = wallLayout(16, 9, view);
      const size = phoneBox(layout);
      const cell = { column: 8, row: 5 };
      const vb = startViewBox(layout, size, maxScaleFor(16, 9), [cell]);
      const centre = centreOf(vb);
      const target = layout.center(cell);
      expect(centre.x).toBeCloseTo(target.x, 6);
      expect(centre.y).toBeCloseTo(target.y, 6);
      expect(cellPx(layout, vb, size)).toBeGreaterThanOrEqual(MIN_TAP_PX);
    }
  });

  it('keeps a reported cell near an edge on screen, the window pushed back inside the drawing', () => {
    const layout = wallLayout(12, 6, 'rear');
    const size = phoneBox(layout);
    const cell = { column: 1, row: 6 }; // drawn at the bottom-right in the rear view
    const vb = startViewBox(layout, size, maxScaleFor(12, 6), [cell]);
    const r = layout.cellRect(cell);
    expect(vb.x + vb.width).toBeCloseTo(layout.content.x + layout.content.width, 6);
    expect(vb.y + vb.height).toBeCloseTo(layout.content.y + layout.content.height, 6);
    expect(r.x).toBeGreaterThanOrEqual(vb.x);
    expect(r.x + r.width).toBeLessThanOrEqual(vb.x + vb.width);
    expect(r.y + r.height).toBeLessThanOrEqual(vb.y + vb.height);
  });

  it('centres on the middle of several reported cells', () => {
    const layout = wallLayout(20, 10);
    const size = phoneBox(layout);
    const vb = startViewBox(layout, size, maxScaleFor(20, 10), [
      { column: 9, row: 4 },
      { column: 11, row: 6 },
    ]);
    const expected = layout.center({ column: 10, row: 5 });
    expect(centreOf(vb).x).toBeCloseTo(expected.x, 6);
    expect(centreOf(vb).y).toBeCloseTo(expected.y, 6);
  });

  it('never zooms past the map’s limit, and ignores cells outside the grid', () => {
    const layout = wallLayout(60, 30);
    const maxScale = maxScaleFor(60, 30);
    const vb = startViewBox(layout, { width: 80, height: 40 }, maxScale, [{ column: 99, row: 99 }]);
    expect(layout.content.width / vb.width).toBeCloseTo(maxScale, 9);
    expect(vb.x).toBe(0);
    expect(vb.y).toBe(0);
  });
});
