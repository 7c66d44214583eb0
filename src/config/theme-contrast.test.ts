import { describe, expect, it } from 'vitest';
import { palette } from '../../tailwind.config';

// WCAG 2.2, definitions of "relative luminance" and "contrast ratio"
// (https://www.w3.org/TR/WCAG22/#dfn-relative-luminance, #dfn-contrast-ratio).
function luminance(hex: string): number {
  const channels = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const [r, g, b] = channels.map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

describe('the contrast formula', () => {
  it('gives 21:1 for black on white and 1:1 for a colour on itself (WCAG 2.2 definition: range 1 to 21)', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrast('#12343b', '#12343b')).toBeCloseTo(1, 5);
  });

  it('puts #767676 just above and #777777 just below 4.5:1 on white (WebAIM contrast checker: 4.54 and 4.48)', () => {
    expect(contrast('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    expect(contrast('#777777', '#ffffff')).toBeCloseTo(4.48, 2);
  });
});

// WCAG 2.2 SC 1.4.3 (AA): text needs 4.5:1 against its background; SC 1.4.11: the boundary of
// a control needs 3:1 against what surrounds it.
const text = 4.5;
const nonText = 3;
const { ink, amber, stone, danger, state } = palette;

describe('Gridkeep colour pairs meet WCAG 2.2 AA', () => {
  const pairs: [use: string, fg: string, bg: string, min: number][] = [
    ['body text on the page', stone[900], stone[50], text],
    ['secondary text on a card', stone[600], stone[0], text],
    ['secondary text on the page', stone[600], stone[50], text],
    ['meta text (times, counts) on a card', stone[500], stone[0], text],
    ['meta text on the page', stone[500], stone[50], text],
    ['input placeholder', stone[500], stone[0], text],
    ['input border against a card', stone[400], stone[0], nonText],
    ['links', ink[600], stone[0], text],
    ['section eyebrow on the page', ink[500], stone[50], text],
    ['primary button label on amber', ink[950], amber[400], text],
    ['primary button label on hover', ink[950], amber[300], text],
    ['danger button label', '#ffffff', danger[600], text],
    ['side and bottom navigation labels', ink[200], ink[900], text],
    ['navigation section heading', ink[300], ink[900], text],
    ['active bottom-navigation label', amber[300], ink[900], text],
    ['active side-navigation label', '#ffffff', ink[800], text],
    ['shell headings on ink', '#ffffff', ink[900], text],
    ['amber badge', amber[800], amber[50], text],
    ['safety note', amber[900], amber[50], text],
    ['ink badge', ink[800], ink[50], text],
    ['neutral badge', stone[700], stone[100], text],
    ['error text and alerts', danger[700], danger[50], text],
    ['error text under a field', danger[700], stone[0], text],
  ];
  // The dot beside a state's word is decoration (the word carries the meaning), so only the
  // word is held to the text rule.
  for (const [name, s] of Object.entries(state)) {
    pairs.push([`state "${name}" pill`, s.DEFAULT, s.bg, text]);
  }

  it.each(pairs)('%s (%s on %s) reaches %s:1', (_use, fg, bg, min) => {
    expect(contrast(fg, bg)).toBeGreaterThanOrEqual(min);
  });

  it('keeps the states apart from one another: no two pills share a colour (common practice)', () => {
    const fgs = Object.values(state).map((s) => s.DEFAULT.toLowerCase());
    const bgs = Object.values(state).map((s) => s.bg.toLowerCase());
    expect(new Set(fgs).size).toBe(fgs.length);
    expect(new Set(bgs).size).toBe(bgs.length);
  });
});
