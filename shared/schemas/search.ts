// The search resource: what one search box finds (`GET /api/search?q=`, server/services/search.ts).
import type { CabinetStatus } from './enums.js';
import { z } from 'zod';

// ---- request ----
export const searchQuery = z.object({ q: z.string().trim().min(1, 'Type something to search for.').max(100) });

// ---- response ----

export interface SearchResults {
  /** Client names containing the words. */
  clients: { id: string; name: string }[];
  sites: { id: string; name: string; clientName: string; city: string }[];
  walls: { id: string; name: string; siteName: string; clientName: string }[];
  /** Serials starting with the words; the wall and cell are null for a cabinet off any wall. */
  cabinets: {
    id: string;
    serial: string;
    status: CabinetStatus;
    wallId: string | null;
    wallName: string | null;
    column: number | null;
    row: number | null;
  }[];
}
