// The cabinet-models resource (the catalogue): what GET /api/cabinet-models answers with. Its
// request schemas are in register.ts until the register's contracts are split per resource.
import type { environments } from './enums.js';

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
