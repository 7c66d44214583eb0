// Viewing distances from pixel pitch.

/**
 * Distance at which one pixel subtends one arc-minute (the 20/20 acuity limit), per unit of
 * pitch: 1 ÷ tan(1′) = 3,437.75, used rounded to 3,438 (as in AVIXA DISCAS).
 */
export const ACUITY_FACTOR = 3438;

/** Pixel pitch in mm: the cabinet's width ÷ its pixels across (centre-to-centre spacing). */
export function pixelPitchMm(widthMm: number, pixels: number): number {
  return widthMm / pixels;
}

/** Rule-of-thumb closest comfortable viewing distance: 1 m per mm of pitch (common practice). */
export function minViewingDistanceM(pitchMm: number): number {
  return pitchMm * 1;
}

/**
 * Distance beyond which a viewer with 20/20 vision can no longer tell pixels apart:
 * pitch (mm) × 3,438 → mm, returned in metres. 2.5 mm → 8.595 m.
 */
export function acuityDistanceM(pitchMm: number): number {
  return (pitchMm * ACUITY_FACTOR) / 1000;
}

/**
 * Farthest viewer who can still resolve every line of an image (AVIXA DISCAS analytical
 * decision): image height × 3,438 ÷ vertical resolution, in the height's unit.
 * 1,500 mm and 1,080 lines → 4,775 mm.
 */
export function farthestAnalyticalViewer(imageHeight: number, verticalLines: number): number {
  return (imageHeight * ACUITY_FACTOR) / verticalLines;
}
