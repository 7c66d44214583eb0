// Unit conversions used by the wall plan. Exact factors are exact by definition; the BTU factor
// is the published conversion (NIST SP 811, Appendix B).

/** 1 ft = 0.3048 m exactly, so 304.8 mm (international foot, NIST Handbook 44, Appendix C). */
export const MM_PER_FOOT = 304.8;
/** 1 in = 25.4 mm exactly (NIST Handbook 44, Appendix C). */
export const MM_PER_INCH = 25.4;
/** 1 lb = 0.45359237 kg exactly (avoirdupois pound, NIST Handbook 44, Appendix C). */
export const KG_PER_POUND = 0.45359237;
/** 1 W = 3.412142 BTU/h (NIST SP 811, Appendix B, British thermal unit (IT) per hour). */
export const BTU_PER_HOUR_PER_WATT = 3.412142;

/** Millimetres → feet: ft = mm ÷ 304.8. */
export function mmToFeet(mm: number): number {
  return mm / MM_PER_FOOT;
}

/** Feet → millimetres: mm = ft × 304.8. */
export function feetToMm(feet: number): number {
  return feet * MM_PER_FOOT;
}

/** Kilograms → pounds: lb = kg ÷ 0.45359237. */
export function kgToPounds(kg: number): number {
  return kg / KG_PER_POUND;
}

/** Watts of electrical load → heat in BTU per hour: BTU/h = W × 3.412142 (all power ends as heat). */
export function wattsToBtuPerHour(watts: number): number {
  return watts * BTU_PER_HOUR_PER_WATT;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * A length in millimetres as feet-and-inches text the crew reads off a tape, rounded to the
 * nearest 1/`denominator` inch (1/8 by default) and reduced: 6013.45 mm → `19' 8-3/4"`,
 * 6096 mm → `20' 0"`, 12.7 mm → `0' 0-1/2"`. Negative lengths get a leading minus.
 */
export function formatFeetInches(mm: number, denominator = 8): string {
  if (!Number.isFinite(mm)) throw new RangeError('Length must be a finite number.');
  if (!Number.isInteger(denominator) || denominator < 1) throw new RangeError('Denominator must be a positive integer.');
  const sign = mm < 0 ? '-' : '';
  // Count whole fractions of an inch so that carries (11-63/64" → 1' 0") come out exact.
  const totalParts = Math.round((Math.abs(mm) / MM_PER_INCH) * denominator);
  const partsPerFoot = 12 * denominator;
  const feet = Math.floor(totalParts / partsPerFoot);
  const restParts = totalParts - feet * partsPerFoot;
  const inches = Math.floor(restParts / denominator);
  const parts = restParts - inches * denominator;
  if (parts === 0) return `${sign}${feet}' ${inches}"`;
  const d = gcd(parts, denominator);
  return `${sign}${feet}' ${inches}-${parts / d}/${denominator / d}"`;
}
