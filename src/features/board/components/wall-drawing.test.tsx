import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { drawingLabel, reportedCells, WallDrawing } from '@/features/board/components/wall-drawing';

describe('the drawing of a wall’s grid', () => {
  it('is an image named by its size in cabinets (columns × rows) and how many are reported', () => {
    const html = renderToStaticMarkup(
      <WallDrawing
        columns={6}
        rows={4}
        cells={[
          { column: 2, row: 1 },
          { column: 6, row: 4 },
        ]}
      />,
    );
    expect(html).toContain('role="img"');
    expect(html).toContain('aria-label="6 × 4 cabinets, 2 reported"');
  });

  it('marks each reported cabinet once, where it is seen from the audience (C1·R1 top left)', () => {
    const html = renderToStaticMarkup(
      <WallDrawing
        columns={6}
        rows={4}
        cells={[
          { column: 2, row: 1 },
          { column: 2, row: 1 },
          { column: 6, row: 4 },
        ]}
      />,
    );
    const marks = [...html.matchAll(/<rect x="([\d.]+)" y="([\d.]+)" width="([\d.]+)"[^>]*fill-state-open-ticket-dot/g)];
    expect(marks).toHaveLength(2);
    const pitch = Number(marks[0][3]);
    expect(marks.map((m) => [Number(m[1]) / pitch, Number(m[2]) / pitch])).toEqual([
      [1, 0],
      [5, 3],
    ]);
  });

  it('ignores cells outside the grid and counts the distinct ones', () => {
    expect(
      reportedCells(4, 2, [
        { column: 1, row: 1 },
        { column: 1, row: 1 },
        { column: 5, row: 1 },
        { column: 2, row: 3 },
      ]),
    ).toEqual([{ column: 1, row: 1 }]);
  });

  it('says so when the whole wall is reported, or no cabinet is named', () => {
    expect(drawingLabel(12, 6, 0, true)).toBe('12 × 6 cabinets, the whole wall reported');
    expect(drawingLabel(12, 6, 0, false)).toBe('12 × 6 cabinets, no cabinet named');
    expect(drawingLabel(3, 2, 1, false)).toBe('3 × 2 cabinets, 1 reported');
  });

  it('stays small for a large wall: the outline alone when grid lines would merge', () => {
    const html = renderToStaticMarkup(<WallDrawing columns={200} rows={50} cells={[]} />);
    const width = Number(html.match(/<svg[^>]*width="([\d.]+)"/)![1]);
    expect(width).toBeLessThan(115);
    expect(html).not.toContain('<path');
  });
});
