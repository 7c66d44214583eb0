import type { Mounting } from '@shared/schemas/enums';

// Response shapes of the walls API (server/services/walls.ts).

export interface WallSummary {
  id: string;
  name: string;
  clientId: string;
  clientName: string;
  siteId: string;
  siteName: string;
  columns: number;
  rows: number;
  cabinetCount: number;
  mounting: Mounting;
  installDate: string | null;
  warrantyEnd: string | null;
  cabinetModel: { id: string; name: string; pixelPitchMm: number };
  openTicketCount: number;
}

/** The catalogue figures of the wall's cabinet model. */
export interface WallCabinetModel {
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

export interface WallController {
  id: string;
  model: string;
  serial: string;
  firmware: string;
  outputs: number;
  outputsInUse: number;
  pixelsPerOutput: number;
}

export interface WallDetail {
  id: string;
  name: string;
  clientId: string;
  clientName: string;
  siteId: string;
  siteName: string;
  siteTimeZone: string;
  columns: number;
  rows: number;
  mounting: Mounting;
  installDate: string | null;
  warrantyEnd: string | null;
  calibrationDate: string | null;
  inputNotes: string;
  /** Staff only. */
  internalNotes?: string;
  cabinetModel: WallCabinetModel;
  controllers: WallController[];
  planSettings: unknown;
  dataRuns: unknown;
  powerRuns: unknown;
  installedCabinets: number;
  openTicketCount: number;
  archived: boolean;
}
