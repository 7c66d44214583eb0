// Run colours from the design tokens (tailwind.config.ts), distinct next to each other and in
// greyscale print (the run number is always written beside the colour). Class names are written
// out in full so Tailwind finds them.

interface RunColour {
  stroke: string;
  fill: string;
  /** HTML swatch in the legend. */
  swatch: string;
}

const colours: RunColour[] = [
  { stroke: 'stroke-ink-700', fill: 'fill-ink-700', swatch: 'bg-ink-700' },
  { stroke: 'stroke-amber-600', fill: 'fill-amber-600', swatch: 'bg-amber-600' },
  { stroke: 'stroke-state-spare-dot', fill: 'fill-state-spare-dot', swatch: 'bg-state-spare-dot' },
  { stroke: 'stroke-state-open-ticket-dot', fill: 'fill-state-open-ticket-dot', swatch: 'bg-state-open-ticket-dot' },
  { stroke: 'stroke-state-on-track', fill: 'fill-state-on-track', swatch: 'bg-state-on-track' },
  { stroke: 'stroke-state-at-bench-dot', fill: 'fill-state-at-bench-dot', swatch: 'bg-state-at-bench-dot' },
];

/** The colour of the run at `position` in its list (by position, so renumbering keeps colours). */
export const runColour = (position: number): RunColour => colours[((position % colours.length) + colours.length) % colours.length];
