// The controllers resource: what GET /api/controllers answers with.

/** A processor (sending device) and the wall it drives. */
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
