// The cabinets resource: what the API answers with (a wall's cabinets are in walls.ts).
import type { CabinetEventKind, CabinetStatus } from './enums.js';

/** One row of the cabinets list: where the cabinet is, whether on a wall or in stock. */
export interface CabinetSummary {
  id: string;
  serial: string;
  status: CabinetStatus;
  batch: string;
  installedOn: string | null;
  /** The wall, site and client: null for a cabinet off any wall. */
  wallId: string | null;
  wallName: string | null;
  column: number | null;
  row: number | null;
  siteId: string | null;
  siteName: string | null;
  clientId: string | null;
  clientName: string | null;
  modelId: string;
  modelName: string;
  /** The stock location of a spare; always null for client users. */
  locationName: string | null;
}

export interface CabinetEvent {
  id: string;
  kind: CabinetEventKind;
  fromWallId: string | null;
  fromWallName: string | null;
  fromColumn: number | null;
  fromRow: number | null;
  toWallId: string | null;
  toWallName: string | null;
  toColumn: number | null;
  toRow: number | null;
  /** The other cabinet of a swap. */
  otherSerial: string | null;
  repairId: string | null;
  fromStatus: CabinetStatus | null;
  toStatus: CabinetStatus | null;
  note: string;
  /** null for client users (they see what happened, not who did it). */
  actorName: string | null;
  createdAt: string;
}

export interface CabinetDetail {
  id: string;
  serial: string;
  status: CabinetStatus;
  batch: string;
  installedOn: string | null;
  /** Staff only. */
  notes?: string;
  model: { id: string; name: string; pixelPitchMm: number; modulesWide: number; modulesHigh: number };
  wall: { id: string; name: string; columns: number; rows: number; siteId: string; siteName: string; clientName: string } | null;
  column: number | null;
  row: number | null;
  /** `C{col}·R{row}`, or null off a wall. */
  position: string | null;
  stockLocation: { id: string; name: string } | null;
  /** Newest first. */
  history: CabinetEvent[];
}
