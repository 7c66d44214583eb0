// The cabinets resource: serials and positions, the writes (place, move, swap, edit, CSV import),
// the list query and the responses (a wall's cabinets are in walls.ts).
import type { CabinetEventKind, CabinetStatus } from './enums.js';
import { z } from 'zod';
import { nullableDate, optionalId, pageQuery, PG_INT_MAX, sortDir, text } from './common.js';
import { cabinetStatuses } from './enums.js';

// ---- requests ----
/** Serials are stored trimmed and upper-cased, so a scan and a typed serial match. */
export const serial = z
  .string()
  .trim()
  .min(1, 'Required.')
  .max(64, 'At most 64 characters.')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._\-/]*$/, 'Letters, digits and . _ - / only.')
  .transform((s) => s.toUpperCase());
export const position = z.object({
  column: z.number().int('Whole positions only.').min(1, 'Columns count from 1.').max(PG_INT_MAX, 'Too large.'),
  row: z.number().int('Whole positions only.').min(1, 'Rows count from 1.').max(PG_INT_MAX, 'Too large.'),
});
export type Position = z.infer<typeof position>;

export const placeCabinetInput = position.extend({
  serial,
  batch: text(40).optional(),
  cabinetModelId: z.uuid().optional(),
  installedOn: nullableDate,
  notes: text(2000).optional(),
});
export type PlaceCabinetInput = z.infer<typeof placeCabinetInput>;

/**
 * The note of a move, swap or status change is the staff's own unless they choose to show it to
 * the client's users (who see the history of their own walls).
 */
const historyNote = { note: text(500).optional(), noteForClient: z.boolean().optional() };

export const moveCabinetInput = z.object({
  wallId: z.uuid(),
  column: position.shape.column,
  row: position.shape.row,
  ...historyNote,
});
export type MoveCabinetInput = z.infer<typeof moveCabinetInput>;

export const swapCabinetInput = z.object({ otherCabinetId: z.uuid(), ...historyNote });
export type SwapCabinetInput = z.infer<typeof swapCabinetInput>;

export const cabinetPatch = z.object({
  batch: text(40).optional(),
  notes: text(2000).optional(),
  /** Taking a cabinet off its wall (to the bench, back to the maker, retired) frees its position. */
  status: z.enum(cabinetStatuses).optional(),
  stockLocationId: z.uuid().nullable().optional(),
  ...historyNote,
});
export type CabinetPatch = z.infer<typeof cabinetPatch>;

export const listCabinetsQuery = pageQuery.extend({
  /** A serial prefix (a scan or the first characters typed). */
  serial: z.string().trim().max(64).optional(),
  wallId: optionalId,
  /** Cabinets on the walls of this client or site (a cabinet in stock belongs to neither). */
  clientId: optionalId,
  siteId: optionalId,
  /** The cabinet's own model. */
  modelId: optionalId,
  status: z.enum(cabinetStatuses).optional(),
  /** A production batch or batch family: the codes that start with it (any case), the filter of a recall. */
  batch: z.string().trim().max(40).optional(),
  sort: z.enum(['serial', 'batch', 'installedOn']).default('serial'),
  dir: sortDir,
});
export type ListCabinetsQuery = z.infer<typeof listCabinetsQuery>;

/** One CSV row of a cabinet import; line numbers count the header as line 1. */
export const importRow = z.object({
  serial,
  column: z.coerce
    .number({ error: 'column must be a whole number' })
    .int('column must be a whole number')
    .min(1, 'column counts from 1')
    .max(PG_INT_MAX, 'column is too large'),
  row: z.coerce
    .number({ error: 'row must be a whole number' })
    .int('row must be a whole number')
    .min(1, 'row counts from 1')
    .max(PG_INT_MAX, 'row is too large'),
  batch: z.string().trim().max(40).default(''),
});
export interface ImportRowError {
  line: number;
  serial?: string;
  message: string;
}
export interface ImportResult {
  imported: number;
  errors: ImportRowError[];
}

// ---- responses ----

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

/**
 * One event of a cabinet's history. Client users get only the events on their own walls, with
 * the other side of a move or swap (another organisation's wall, position, cabinet) left out.
 */
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
  /** Empty for client users unless staff chose to show it (`noteForClient`). */
  note: string;
  noteForClient: boolean;
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
  /** Newest first, at most the newest 200 (client users: those on their own walls). */
  history: CabinetEvent[];
  /** Older events exist beyond `history`. */
  historyTruncated: boolean;
}
