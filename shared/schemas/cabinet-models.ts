// The cabinet-models resource (the catalogue): request schemas and the response, with the
// datasheet's power input that the wall plan uses.
import { z } from 'zod';
import { positive, positiveInt, requiredText, text } from './common.js';
import { environments } from './enums.js';

// ---- requests ----
/** An optional datasheet figure: an empty box (NaN or '') is "not known", stored as null. */
const optionalFigure = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (v === '' || (typeof v === 'number' && Number.isNaN(v)) ? null : v), schema.nullable().optional());
export const vaBelowWatts = 'Volt-amperes cannot be less than the maximum watts (the power factor is at most 1).';

/**
 * The datasheet's power connection, which may be filled in after a model is in use: it only
 * makes plans safer. Connector rating in amperes, the maker's most cabinets per chain, VA at
 * maximum power.
 */
const powerConnectionFields = {
  passThroughAmps: optionalFigure(positive('Connector rating').max(1000, 'Connector rating must be at most 1,000 A.')),
  maxPerChain: optionalFigure(positiveInt('Cabinets per chain').max(10_000, 'At most 10,000 cabinets per chain.')),
  maxPowerVA: optionalFigure(positive('Maximum volt-amperes').max(100_000, 'At most 100,000 VA.')),
};

export const cabinetModelInput = z
  .object({
    name: requiredText(120),
    maker: text(120).optional(),
    widthMm: positive('Width'),
    heightMm: positive('Height'),
    pixelPitchMm: positive('Pixel pitch'),
    pixelsWide: positiveInt('Pixels wide'),
    pixelsHigh: positiveInt('Pixels high'),
    modulesWide: positiveInt('Modules wide'),
    modulesHigh: positiveInt('Modules high'),
    maxPowerW: positive('Maximum power'),
    typicalPowerW: positive('Typical power'),
    weightKg: positive('Weight'),
    brightnessNits: positiveInt('Brightness'),
    inputVoltageMinV: positiveInt('Lowest input voltage').default(100),
    inputVoltageMaxV: positiveInt('Highest input voltage').default(240),
    ...powerConnectionFields,
    environment: z.enum(environments).default('indoor'),
  })
  .refine((m) => m.typicalPowerW <= m.maxPowerW, { path: ['typicalPowerW'], message: 'Typical power cannot exceed maximum power.' })
  .refine((m) => m.inputVoltageMinV <= m.inputVoltageMaxV, {
    path: ['inputVoltageMinV'],
    message: 'The lowest voltage cannot exceed the highest.',
  })
  .refine((m) => m.maxPowerVA == null || m.maxPowerVA >= m.maxPowerW, { path: ['maxPowerVA'], message: vaBelowWatts });
export type CabinetModelInput = z.infer<typeof cabinetModelInput>;
export const cabinetModelPatch = z.object({
  name: requiredText(120).optional(),
  maker: text(120).optional(),
  ...powerConnectionFields,
  archived: z.boolean().optional(),
});
export type CabinetModelPatch = z.infer<typeof cabinetModelPatch>;

// ---- responses ----

/** A catalogue entry, manufacturer-neutral, with the datasheet's power input. */
export interface CabinetModel {
  id: string;
  name: string;
  maker: string;
  widthMm: number;
  heightMm: number;
  pixelPitchMm: number;
  pixelsWide: number;
  pixelsHigh: number;
  modulesWide: number;
  modulesHigh: number;
  maxPowerW: number;
  typicalPowerW: number;
  weightKg: number;
  brightnessNits: number;
  inputVoltageMinV: number;
  inputVoltageMaxV: number;
  /** The power connector's rating, amperes; null when the datasheet is not at hand. */
  passThroughAmps: number | null;
  maxPerChain: number | null;
  maxPowerVA: number | null;
  environment: (typeof environments)[number];
  archived: boolean;
}
