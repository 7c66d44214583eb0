// Response shapes of the catalogue API (server/services/catalogue.ts).

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
  voltageMin: number;
  voltageMax: number;
  environment: 'indoor' | 'outdoor';
  archived: boolean;
}

export interface Controller {
  id: string;
  wallId: string | null;
  wallName: string | null;
  model: string;
  serial: string;
  firmware: string;
  outputs: number;
  outputsInUse: number;
  pixelsPerOutput: number;
  notes: string;
  archived: boolean;
}
