import type { Mounting } from '@shared/schemas/enums';
import type { CabinetModel, Controller } from '@shared/schemas/register';

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

/** A controller as the wall page lists it (the catalogue's controller, fewer fields). */
export type WallController = Pick<Controller, 'id' | 'model' | 'serial' | 'firmware' | 'outputs' | 'outputsInUse' | 'pixelsPerOutput'>;

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
  /** The catalogue figures of the wall's cabinet model. */
  cabinetModel: CabinetModel;
  controllers: WallController[];
  planSettings: unknown;
  dataRuns: unknown;
  powerRuns: unknown;
  installedCabinets: number;
  openTicketCount: number;
  archived: boolean;
}
