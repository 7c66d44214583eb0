import { ticketPriorities, ticketStatuses } from '@shared/schemas/enums';
import { describe, expect, it } from 'vitest';
import { palette } from '../../tailwind.config';
import { priorityTones, statusTones } from '@/features/tickets/components/ticket-status';

// WCAG 2.2, "relative luminance" and "contrast ratio" definitions (w3.org/TR/WCAG22/#dfn-relative-luminance).
function luminance(hex: string) {
  const n = hex.replace('#', '');
  const [r, g, b] = [0, 2, 4]
    .map((i) => parseInt(n.slice(i, i + 2), 16) / 255)
    .map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
function contrast(a: string, b: string) {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** The hex value behind a Tailwind colour class of this project ("bg-state-spare-bg", "text-amber-900"). */
function colourOf(classes: string, prefix: 'bg' | 'text'): string {
  const cls = classes.split(/\s+/).find((c) => c.startsWith(`${prefix}-`));
  if (!cls) throw new Error(`no ${prefix} class in "${classes}"`);
  const name = cls.slice(prefix.length + 1);
  if (name === 'white') return '#ffffff';
  const table = palette as unknown as Record<string, Record<string, string | Record<string, string>>>;
  const stateMatch = name.match(/^state-(.+?)(?:-(bg|dot))?$/);
  if (stateMatch) {
    const entry = table.state[stateMatch[1]] as Record<string, string>;
    return entry[stateMatch[2] ?? 'DEFAULT'];
  }
  const [family, shade] = [name.slice(0, name.lastIndexOf('-')), name.slice(name.lastIndexOf('-') + 1)];
  const value = table[family]?.[shade];
  if (typeof value !== 'string') throw new Error(`unknown colour ${cls}`);
  return value;
}

describe('contrast of the ticket pills', () => {
  it('computes contrast as WCAG defines it', () => {
    // Black on white is 21:1 (WCAG 2.2 Understanding SC 1.4.3).
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
    // #767676 on white is about 4.54:1, the lightest grey that passes AA for body text (common practice).
    expect(contrast('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    expect(contrast('#ffffff', '#ffffff')).toBe(1);
  });

  it.each(ticketStatuses)('the "%s" status pill text meets AA (4.5:1) on its background', (status) => {
    const { className } = statusTones[status];
    expect(contrast(colourOf(className, 'text'), colourOf(className, 'bg'))).toBeGreaterThanOrEqual(4.5);
  });

  it.each(ticketPriorities)('the "%s" priority pill text meets AA (4.5:1) on its background', (priority) => {
    const { className } = priorityTones[priority];
    expect(contrast(colourOf(className, 'text'), colourOf(className, 'bg'))).toBeGreaterThanOrEqual(4.5);
  });

  it('gives every status its own icon, so colour is never the only signal', () => {
    const icons = new Set(ticketStatuses.map((s) => statusTones[s].icon));
    expect(icons.size).toBe(ticketStatuses.length);
  });
});
