// The walls resource: request schemas, the list query and the responses, including a wall's
// cabinets as the wall map draws them (GET /api/walls/:id/cabinets).
import type { CabinetModel } from './cabinet-models.js';
import type { Controller } from './controllers.js';
import type { CabinetStatus, Mounting } from './enums.js';
import type { StoredPlanSettings, StoredWallRuns } from './wall-plan.js';
import { z } from 'zod';
import { nullableDate, optionalId, pageQuery, requiredText, sortDir, text } from './common.js';
import { mountings } from './enums.js';

// ---- requests ----
export const wallInput = z.object({
  siteId: z.uuid(),
  name: requiredText(120),
  cabinetModelId: z.uuid(),
  columns: z.number().int('Whole cabinets only.').min(1, 'At least one column.').max(500, 'At most 500 columns.'),
  rows: z.number().int('Whole cabinets only.').min(1, 'At least one row.').max(500, 'At most 500 rows.'),
  mounting: z.enum(mountings).default('wall_fixed'),
  installDate: nullableDate,
  warrantyEnd: nullableDate,
  calibrationDate: nullableDate,
  inputNotes: text(5000).optional(),
  internalNotes: text(5000).optional(),
});
export type WallInput = z.infer<typeof wallInput>;
export const wallPatch = wallInput.omit({ siteId: true }).partial().extend({ archived: z.boolean().optional() });
export type WallPatch = z.infer<typeof wallPatch>;
export const listWallsQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  clientId: optionalId,
  siteId: optionalId,
  cabinetModelId: optionalId,
  sort: z.enum(['name', 'createdAt']).default('name'),
  dir: sortDir,
});
export type ListWallsQuery = z.infer<typeof listWallsQuery>;

// ---- responses ----

export interface WallSummary {
  id: string;
  name: string;
  clientId: string;
  clientName: string;
  siteId: string;
  siteName: string;
  columns: number;
  rows: number;
  /** The wall's positions: columns × rows. */
  cabinetCount: number;
  /** Positions holding a cabinet. */
  installedCabinets: number;
  /** Positions without a cabinet (positions − installed). */
  freePositions: number;
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
  /** The supply and capacities the runs were planned with; null until a plan is saved. */
  planSettings: StoredPlanSettings | null;
  dataRuns: StoredWallRuns | null;
  powerRuns: StoredWallRuns | null;
  installedCabinets: number;
  openTicketCount: number;
  archived: boolean;
}

/** One cabinet on a wall, as the wall map needs it. */
export interface WallCabinet {
  id: string;
  serial: string;
  column: number;
  row: number;
  batch: string;
  status: CabinetStatus;
  installedOn: string | null;
  /** Open tickets that name this cell. */
  openTickets: number;
  /** Those tickets, the oldest first (`1041/26`). */
  openTicketRefs: { id: string; ref: string }[];
}
