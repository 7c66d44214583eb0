// Colours and words of the wall map's cell tones, from the design tokens in tailwind.config.ts.
// Class names are written out in full so Tailwind finds them.

export type CellTone = 'installed' | 'spare' | 'at_bench' | 'returned_to_vendor' | 'retired' | 'open_ticket' | 'empty';

export const cellTones: readonly CellTone[] = ['installed', 'open_ticket', 'spare', 'at_bench', 'returned_to_vendor', 'retired', 'empty'];

interface ToneStyle {
  label: string;
  /** Cell fill and outline. */
  fill: string;
  stroke: string;
  /** The class of the cell's outline: `fill`, `stroke` and the line (width, dashes). */
  shape: string;
  /** Text drawn on the cell. */
  text: string;
  /** The legend's swatch (HTML). */
  swatch: string;
}

export const toneStyles: Record<CellTone, ToneStyle> = {
  installed: {
    label: 'Installed',
    fill: 'fill-state-installed-bg',
    stroke: 'stroke-state-installed-dot',
    shape: 'fill-state-installed-bg stroke-state-installed-dot stroke-[2.5]',
    text: 'fill-state-installed',
    swatch: 'bg-state-installed-bg border-state-installed-dot',
  },
  open_ticket: {
    label: 'Open ticket',
    fill: 'fill-state-open-ticket-bg',
    stroke: 'stroke-state-open-ticket-dot',
    shape: 'fill-state-open-ticket-bg stroke-state-open-ticket-dot stroke-[2.5]',
    text: 'fill-state-open-ticket',
    swatch: 'bg-state-open-ticket-bg border-state-open-ticket-dot',
  },
  spare: {
    label: 'Spare',
    fill: 'fill-state-spare-bg',
    stroke: 'stroke-state-spare-dot',
    shape: 'fill-state-spare-bg stroke-state-spare-dot stroke-[2.5]',
    text: 'fill-state-spare',
    swatch: 'bg-state-spare-bg border-state-spare-dot',
  },
  at_bench: {
    label: 'At bench',
    fill: 'fill-state-at-bench-bg',
    stroke: 'stroke-state-at-bench-dot',
    shape: 'fill-state-at-bench-bg stroke-state-at-bench-dot stroke-[2.5]',
    text: 'fill-state-at-bench',
    swatch: 'bg-state-at-bench-bg border-state-at-bench-dot',
  },
  returned_to_vendor: {
    label: 'Returned to vendor',
    fill: 'fill-state-returned-bg',
    stroke: 'stroke-state-returned-dot',
    shape: 'fill-state-returned-bg stroke-state-returned-dot stroke-[2.5]',
    text: 'fill-state-returned',
    swatch: 'bg-state-returned-bg border-state-returned-dot',
  },
  retired: {
    label: 'Retired',
    fill: 'fill-state-retired-bg',
    stroke: 'stroke-state-retired-dot',
    shape: 'fill-state-retired-bg stroke-state-retired-dot stroke-[2.5]',
    text: 'fill-state-retired',
    swatch: 'bg-state-retired-bg border-state-retired-dot',
  },
  empty: {
    label: 'Empty position',
    fill: 'fill-white',
    stroke: 'stroke-stone-400',
    shape: 'fill-white stroke-stone-400 stroke-2 [stroke-dasharray:7_5]',
    text: 'fill-stone-600',
    swatch: 'bg-white border-stone-400 border-dashed',
  },
};
