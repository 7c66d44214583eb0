import { describe, expect, it } from 'vitest';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS, fitInput, GIGABIT_USABLE_BPS, INPUT_FORMATS, pixelsPerOutput } from './video-signal.js';

describe('output capacity', () => {
  it('carries about 650,000 pixels per 1 Gbit/s output: 936 Mbit/s ÷ (24 bit × 60 Hz) (common practice)', () => {
    expect(GIGABIT_USABLE_BPS).toBe(936e6);
    expect(pixelsPerOutput(936e6, 24, 60)).toBe(650_000);
    expect(DEFAULT_OUTPUT_CAPACITY_PIXELS).toBe(650_000);
  });

  it('halves at twice the source frame rate and drops at deeper colour (same formula)', () => {
    expect(pixelsPerOutput(936e6, 24, 120)).toBe(325_000);
    expect(pixelsPerOutput(936e6, 30, 60)).toBe(520_000);
  });
});

describe('input formats', () => {
  it('knows HD as 1920 × 1080 (SMPTE ST 274) and UHD as 3840 × 2160 (SMPTE ST 2036-1), both 16:9', () => {
    expect(INPUT_FORMATS.hd).toEqual({ width: 1920, height: 1080 });
    expect(INPUT_FORMATS.uhd).toEqual({ width: 3840, height: 2160 });
    expect(INPUT_FORMATS.hd.width / INPUT_FORMATS.hd.height).toBeCloseTo(16 / 9, 12);
    expect(INPUT_FORMATS.uhd.width / INPUT_FORMATS.uhd.height).toBeCloseTo(16 / 9, 12);
  });
});

describe('fitInput', () => {
  // Expected values worked by hand: scale = min(wall w ÷ input w, wall h ÷ input h).
  it('pillarboxes 1920 × 1080 (SMPTE ST 274) on a 2:1 wall of 2304 × 1152: scale 1152/1080, 2048 × 1152', () => {
    const fit = fitInput(INPUT_FORMATS.hd, { width: 2304, height: 1152 });
    expect(fit.scaleX).toBeCloseTo(1152 / 1080, 12);
    expect(fit.scaleY).toBeCloseTo(1152 / 1080, 12);
    expect(fit.scaledWidth).toBe(2048);
    expect(fit.scaledHeight).toBe(1152);
    expect(fit.bars).toBe('left-right');
  });

  it('scales 3840 × 2160 (SMPTE ST 2036-1) down to the same 2048 × 1152 on that wall', () => {
    const fit = fitInput(INPUT_FORMATS.uhd, { width: 2304, height: 1152 });
    expect(fit.scaleX).toBeCloseTo(1152 / 2160, 12);
    expect([fit.scaledWidth, fit.scaledHeight, fit.bars]).toEqual([2048, 1152, 'left-right']);
  });

  it('fills a 3840 × 2160 wall with HD at scale 2 and UHD at scale 1, without bars', () => {
    expect(fitInput(INPUT_FORMATS.hd, { width: 3840, height: 2160 })).toEqual({
      scaleX: 2,
      scaleY: 2,
      scaledWidth: 3840,
      scaledHeight: 2160,
      bars: 'none',
    });
    expect(fitInput(INPUT_FORMATS.uhd, { width: 3840, height: 2160 })).toEqual({
      scaleX: 1,
      scaleY: 1,
      scaledWidth: 3840,
      scaledHeight: 2160,
      bars: 'none',
    });
  });

  it('letterboxes HD on a square wall: 1920 × 1920 → 1920 × 1080, bars top and bottom', () => {
    expect(fitInput(INPUT_FORMATS.hd, { width: 1920, height: 1920 })).toEqual({
      scaleX: 1,
      scaleY: 1,
      scaledWidth: 1920,
      scaledHeight: 1080,
      bars: 'top-bottom',
    });
  });

  it('counts a leftover of a whole pixel as bars, and less than that as none', () => {
    // 1920 × 1080 on 1921 × 1080: 1 px to spare. 1280 × 720 on 1366 × 768: height is the
    // tighter side, scale 768/720 = 1.0667, 1365.33 px wide, 0.67 px to spare → none.
    expect(fitInput(INPUT_FORMATS.hd, { width: 1921, height: 1080 }).bars).toBe('left-right');
    expect(fitInput({ width: 1280, height: 720 }, { width: 1366, height: 768 }).bars).toBe('none');
  });

  it("keeps the picture's shape on a wall of non-square pixels: both pitches count (worked by hand)", () => {
    // 12 × 6 cabinets of 500 × 500 mm with 192 × 96 pixels: 2.604 mm across, 5.208 mm down, a
    // 6,000 × 3,000 mm wall of 2304 × 576 pixels. 16:9 on a 2:1 wall takes the full 3,000 mm
    // height (576 px) and 16/9 × 3,000 = 5,333.3 mm of width = 5,333.3 ÷ (500/192) = 2,048 px.
    const fit = fitInput(INPUT_FORMATS.hd, { width: 2304, height: 576 }, { xMm: 500 / 192, yMm: 500 / 96 });
    expect([fit.scaledWidth, fit.scaledHeight, fit.bars]).toEqual([2048, 576, 'left-right']);
    expect(fit.scaleX).toBeCloseTo(2048 / 1920, 12);
    expect(fit.scaleY).toBeCloseTo(576 / 1080, 12);
    // Taken as square pixels the picture would come out 1,024 px (2,667 mm) wide: squeezed to half.
    expect(fitInput(INPUT_FORMATS.hd, { width: 2304, height: 576 }).scaledWidth).toBe(1024);
  });

  it('refuses empty sizes', () => {
    expect(() => fitInput({ width: 0, height: 1080 }, { width: 100, height: 100 })).toThrow(RangeError);
  });
});
