// How a controller's outputs and a video input relate to the wall's pixels.

/**
 * Pixels one output carries: usable bit rate ÷ (bits per pixel × the source's frame rate), since
 * every frame of the source crosses the cable once. A 1 Gbit/s output with about 936 Mbit/s
 * usable, at 24 bits and 60 frames a second: 936e6 ÷ 1,440 = 650,000.
 */
export function pixelsPerOutput(usableBitsPerSecond: number, bitsPerPixel = 24, sourceFrameRateHz = 60): number {
  return Math.floor(usableBitsPerSecond / (bitsPerPixel * sourceFrameRateHz));
}

/** Usable payload of a 1 Gbit/s output link, bits per second (common practice). */
export const GIGABIT_USABLE_BPS = 936_000_000;

/** The default pixel capacity of one output: 650,000 pixels (1 Gbit/s, 24 bit, 60 Hz). */
export const DEFAULT_OUTPUT_CAPACITY_PIXELS = pixelsPerOutput(GIGABIT_USABLE_BPS);

/** Input formats people ask about: HD (SMPTE ST 274) and UHD (SMPTE ST 2036-1). */
export const INPUT_FORMATS = {
  hd: { width: 1920, height: 1080 },
  uhd: { width: 3840, height: 2160 },
} as const;

/** Where the unused part of the wall is when a picture keeps its shape. */
export type Bars = 'none' | 'top-bottom' | 'left-right';

export interface InputFit {
  /** Wall pixels per input pixel across and down; they differ when the wall's pixels are not square. */
  scaleX: number;
  scaleY: number;
  /** The picture's size on the wall in wall pixels, rounded to whole pixels. */
  scaledWidth: number;
  scaledHeight: number;
  /** `top-bottom` is a letterbox (wall taller than the picture), `left-right` a pillarbox. */
  bars: Bars;
}

/**
 * Fits an input onto the wall keeping its shape as people see it (no cropping, no stretching).
 * The input's pixels are square; the wall's are `pitchXMm` wide and `pitchYMm` tall, so the fit
 * is made in millimetres: the picture takes the wall's full height when the wall is wider than
 * the picture's shape, else its full width, and the side with room left gets the bars.
 * 1920 × 1080 on a 2304 × 1152 wall of square pixels: scale 1152/1080 both ways, 2048 × 1152,
 * bars left and right. A leftover under one pixel counts as none.
 */
export function fitInput(
  input: { width: number; height: number },
  wall: { width: number; height: number },
  pitch: { xMm: number; yMm: number } = { xMm: 1, yMm: 1 },
): InputFit {
  if (!(input.width > 0 && input.height > 0 && wall.width > 0 && wall.height > 0 && pitch.xMm > 0 && pitch.yMm > 0)) {
    throw new RangeError('Input and wall sizes must be positive.');
  }
  const inputAspect = input.width / input.height;
  const wallAspect = (wall.width * pitch.xMm) / (wall.height * pitch.yMm);
  // Compared in millimetres; the same shape within rounding fills the wall.
  const fullHeight = wallAspect >= inputAspect;
  const exactWidth = fullHeight ? (inputAspect * wall.height * pitch.yMm) / pitch.xMm : wall.width;
  const exactHeight = fullHeight ? wall.height : (wall.width * pitch.xMm) / (inputAspect * pitch.yMm);
  let bars: Bars = 'none';
  if (wall.width - exactWidth >= 1) bars = 'left-right';
  else if (wall.height - exactHeight >= 1) bars = 'top-bottom';
  return {
    scaleX: exactWidth / input.width,
    scaleY: exactHeight / input.height,
    scaledWidth: Math.round(exactWidth),
    scaledHeight: Math.round(exactHeight),
    bars,
  };
}
