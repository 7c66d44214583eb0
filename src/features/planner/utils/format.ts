// Figures as people read them: grouped thousands, sensible decimals, metric and imperial.
import { formatFeetInches, kgToPounds, MM_PER_FOOT, MM_PER_INCH } from '@shared/calc/units';

const formatters = new Map<number, Intl.NumberFormat>();
/** A number with thousands separators and at most `digits` decimals (exactly `digits` when `fixed`). */
export function num(value: number, digits = 0, fixed = false): string {
  const key = fixed ? -1 - digits : digits;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { maximumFractionDigits: digits, minimumFractionDigits: fixed ? digits : 0 });
    formatters.set(key, f);
  }
  return f.format(value);
}

/** 1 ft² = 0.09290304 m² exactly (0.3048² m², NIST Handbook 44, Appendix C). */
export const M2_PER_SQUARE_FOOT = 0.09290304;

export const metres = (mm: number) => `${num(mm / 1000, 2, true)} m`;
export const feetInches = (mm: number) => formatFeetInches(mm);
export const feetDecimal = (m: number) => `${num((m * 1000) / MM_PER_FOOT, 1, true)} ft`;
export const inches = (mm: number) => `${num(mm / MM_PER_INCH, 3)} in`;
export const squareMetres = (m2: number) => `${num(m2, 2, true)} m²`;
export const squareFeet = (m2: number) => `${num(m2 / M2_PER_SQUARE_FOOT, 1, true)} ft²`;
export const kilograms = (kg: number) => `${num(kg, 1)} kg`;
export const pounds = (kg: number) => `${num(kgToPounds(kg), 0)} lb`;
export const watts = (w: number) => `${num(w, 0)} W`;
export const amps = (a: number) => `${num(a, 1, true)} A`;
export const pixels = (px: number) => `${num(px, 0)} px`;

/** "6.00 m × 3.00 m" */
export const sizeMetric = (widthMm: number, heightMm: number) => `${metres(widthMm)} × ${metres(heightMm)}`;
/** `19' 8-1/4" × 9' 10-1/8"` */
export const sizeImperial = (widthMm: number, heightMm: number) => `${feetInches(widthMm)} × ${feetInches(heightMm)}`;

/** A signed difference in mm as words: "96 mm narrower", "48 mm taller", "exact". */
export function difference(mm: number, bigger: string, smaller: string): string {
  if (Math.abs(mm) < 0.5) return 'exact';
  return `${num(Math.abs(mm), 0)} mm ${mm > 0 ? bigger : smaller}`;
}
