// From a cell's element to its position and back, by where the element sits: the cell layer
// holds one group per row (row 1 first), and a row group holds its cells in column order
// (column 1 first), then the layer of marks. Two attributes fewer on each of 2,000 cells.
import type { GridPosition } from '@/components/wall-map/wall-map-geometry';

/** The position of a cell element of the layer, or null for anything else (a mark, the layer…). */
export function positionOfCell(el: Element | null, layer: SVGGElement | null): GridPosition | null {
  const rowEl = el?.parentNode as Element | null | undefined;
  if (!el || !rowEl || !layer || el.getAttribute('role') !== 'gridcell' || rowEl.parentNode !== layer) return null;
  return { column: Array.prototype.indexOf.call(rowEl.children, el) + 1, row: Array.prototype.indexOf.call(layer.children, rowEl) + 1 };
}

/** The element of the cell at a position, or null when it is not drawn. */
export function cellElement(layer: SVGGElement | null, p: GridPosition): SVGElement | null {
  const el = layer?.children[p.row - 1]?.children[p.column - 1];
  return el instanceof SVGElement && el.getAttribute('role') === 'gridcell' ? el : null;
}
