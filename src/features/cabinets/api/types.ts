import type { CabinetEventKind, CabinetStatus } from '@shared/schemas/enums';

// Response shapes of the cabinets API (server/services/cabinets.ts and walls.ts wallCabinets).

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
}

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
