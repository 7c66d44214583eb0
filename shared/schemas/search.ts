// The search resource: what one search box finds (`GET /api/search?q=`), and the Scan page's
// typed lookup of a serial by its tail (`GET /api/search/serials?tail=`); server/services/search.ts.
import type { CabinetStatus, TicketPriority, TicketStatus } from './enums.js';
import { z } from 'zod';
import { serial } from './cabinets.js';

// ---- request ----
export const searchQuery = z.object({ q: z.string().trim().min(1, 'Type something to search for.').max(100) });

/** The end of a serial as read off a label (or the whole serial), checked like a serial. */
export const serialTailQuery = z.object({ tail: serial });

/**
 * Fewer characters than a trigram match a serial or batch only whole: two characters are part of
 * nearly every serial, and a contains-match that short cannot use the trigram index.
 */
export const partMinLength = 3;

/** Counts stop here: "1000+" says enough, and counting a million cabinets would not. */
export const searchCountCap = 1000;

/** `1041`, `#1041`, `0042`, and the old `GK-1041` / `gk1041` / `GK 1041`; never 0. */
const bareTicketNumber = /^(?:gk[\s-]?|#)?0*([1-9]\d{0,8})$/i;
/** `1041/26`, `1041 / 26`, `1041/2026`, `1041-26`, `#1041/26`. */
const ticketNumberWithYear = /^#?([1-9]\d{0,8})\s*[/-]\s*(?:\d{2}|20\d{2})$/;

/**
 * The ticket number a query names, or null. A ticket is found by its number alone: numbers are
 * unique on their own, the year of a reference is there for people. Each of these names ticket 1041:
 * - its reference `1041/26` (ticketRef in tickets.ts), also `1041 / 26`, with the whole year
 *   `1041/2026`, or with a dash for the slash as in a visit report's file name (`1041-26`);
 * - the bare number `1041` or `#1041`;
 * - the references written before the year was part of them, `GK-1041`, `gk1041` or `GK 1041`:
 *   e-mails sent then still find their ticket.
 * With a year part, the number has no leading zero and the year is two digits or 20xx, so a
 * year-first spelling (`26/1041`), a one-digit part (`12/5`), a zero-padded day (`05/12`) and a full
 * date (`12/05/2026`) are not numbers. `12/05` does read as ticket 12 of 2005, since a new
 * database numbers tickets from 1 and `12/26` must find ticket 12; search matches the words as well
 * as the number, so a date typed in the box still finds the tickets that mention it.
 */
export function ticketNumberIn(q: string): number | null {
  const s = q.trim();
  const digits = bareTicketNumber.exec(s)?.[1] ?? ticketNumberWithYear.exec(s)?.[1];
  return digits ? Number(digits) : null;
}

// ---- response ----

export const searchKinds = ['tickets', 'clients', 'sites', 'walls', 'cabinets', 'batches'] as const;
export type SearchKind = (typeof searchKinds)[number];

/** A cabinet found by its serial; the wall and cell are null for a cabinet off any wall. */
export interface SearchCabinet {
  id: string;
  serial: string;
  status: CabinetStatus;
  batch: string;
  wallId: string | null;
  wallName: string | null;
  siteName: string | null;
  column: number | null;
  row: number | null;
}

export interface SearchResults {
  /** The ticket the number names, then tickets with every word in their title or description. */
  tickets: {
    id: string;
    /** `1042/26` (ticketRef). */
    ref: string;
    title: string;
    status: TicketStatus;
    priority: TicketPriority;
    clientName: string;
    siteName: string;
    wallName: string | null;
  }[];
  /** Client names containing the words. */
  clients: { id: string; name: string }[];
  sites: { id: string; name: string; clientName: string; city: string }[];
  walls: { id: string; name: string; siteName: string; clientName: string }[];
  /** Serials containing the words anywhere: the whole serial first, then those ending in it. */
  cabinets: SearchCabinet[];
  /** Batch codes containing the words, with how many cabinets carry each. */
  batches: { batch: string; cabinetCount: number }[];
  /** How many of each kind match in all (the lists hold the first few), counted up to searchCountCap. */
  counts: Record<SearchKind, number>;
}

/** Cabinets whose serial is, or ends in, what was typed: the whole serial first. */
export interface SerialTailMatches {
  items: SearchCabinet[];
  /** How many match in all, counted up to searchCountCap. */
  total: number;
}
