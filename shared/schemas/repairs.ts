// The repairs resource: one line of work on one cabinet of a wall, logged from a visit or a
// ticket on the technician's phone. `POST /api/repairs` writes the repair, its stock movement,
// the cabinet's history event and the ticket's activity in one transaction, and takes an
// `Idempotency-Key` header so a retry or a double tap writes nothing twice.
import { z } from 'zod';
import { pageQuery, PG_INT_MAX, text } from './common.js';
import { batchCode } from './stock.js';
import {
  removedPartFates,
  repairActions,
  repairComponents,
  repairFaults,
  type RemovedPartFate,
  type RepairAction,
  type RepairComponent,
  type RepairFault,
} from './enums.js';

const moduleIndex = z.number({ error: 'Pick the module.' }).int().min(1).max(64);

export const createRepairInput = z
  .object({
    cabinetId: z.uuid('Choose the cabinet.'),
    component: z.enum(repairComponents, { error: 'Choose what was worked on.' }),
    fault: z.enum(repairFaults, { error: 'Choose the fault.' }),
    action: z.enum(repairActions, { error: 'Choose what was done.' }),
    visitId: z.uuid().optional(),
    ticketId: z.uuid().optional(),
    /** Module position inside the cabinet, counted from the top-left as seen from the audience. */
    moduleColumn: moduleIndex.optional(),
    moduleRow: moduleIndex.optional(),
    /** The spare fitted: taken from a van or a site kit (one unit). */
    spare: z
      .object({
        partId: z.uuid('Choose the spare.'),
        batch: batchCode,
        locationId: z.uuid('Choose where the spare came from.'),
      })
      .optional(),
    /** A whole-cabinet swap: the spare cabinet (in a van or a site kit) that takes the position. */
    replacementCabinetId: z.uuid().optional(),
    /** Fitting a spare of another batch than the wall's needs this (colour match), and it is recorded. */
    acceptBatchMismatch: z.boolean().optional(),
    removedPartFate: z.enum(removedPartFates).default('none'),
    notes: text(2000).optional(),
    /**
     * Where the phone saw the cabinet when the repair was logged (a queued repair may arrive
     * later): if it has moved since, the repair is refused with `cabinet_moved`.
     */
    seenAt: z
      .object({ wallId: z.uuid(), column: z.number().int().min(1).max(PG_INT_MAX), row: z.number().int().min(1).max(PG_INT_MAX) })
      .optional(),
    /** When the work was done, if earlier than now (a repair queued without signal). */
    performedAt: z.iso.datetime({ offset: true }).optional(),
  })
  .superRefine((r, ctx) => {
    if (r.component === 'module' && (r.moduleColumn === undefined || r.moduleRow === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['moduleColumn'], message: 'Pick the module inside the cabinet.' });
    }
    if (r.component !== 'module' && (r.moduleColumn !== undefined || r.moduleRow !== undefined)) {
      ctx.addIssue({ code: 'custom', path: ['moduleColumn'], message: 'A module position goes with module work only.' });
    }
    const swap = r.action === 'cabinet_swapped';
    if (swap && !r.replacementCabinetId) {
      ctx.addIssue({ code: 'custom', path: ['replacementCabinetId'], message: 'Choose the spare cabinet that takes the position.' });
    }
    if (!swap && r.replacementCabinetId) {
      ctx.addIssue({ code: 'custom', path: ['action'], message: 'A replacement cabinet goes with a cabinet swap.' });
    }
    if (swap && r.component !== 'whole_cabinet') {
      ctx.addIssue({ code: 'custom', path: ['component'], message: 'A cabinet swap replaces the whole cabinet.' });
    }
    if (swap && r.spare) ctx.addIssue({ code: 'custom', path: ['spare'], message: 'A cabinet swap takes a spare cabinet, not a part.' });
    if (r.action === 'replaced' && !r.spare) {
      ctx.addIssue({ code: 'custom', path: ['spare'], message: 'Choose the spare that was fitted.' });
    }
    if (r.removedPartFate !== 'none' && r.action !== 'replaced' && !swap) {
      ctx.addIssue({ code: 'custom', path: ['removedPartFate'], message: 'Only a replaced part has a removed part.' });
    }
  });
export type CreateRepairInput = z.input<typeof createRepairInput>;
export type CreateRepairRequest = z.output<typeof createRepairInput>;

/** The `Idempotency-Key` header: any client-made unique string (a UUID from the phone). */
export const idempotencyKey = z
  .string()
  .trim()
  .min(8, 'The Idempotency-Key is too short.')
  .max(200, 'The Idempotency-Key is too long.')
  .regex(/^[\x21-\x7e]+$/, 'The Idempotency-Key must be printable ASCII.');

export const listRepairsQuery = pageQuery.extend({
  wallId: z.uuid().optional(),
  cabinetId: z.uuid().optional(),
  ticketId: z.uuid().optional(),
  visitId: z.uuid().optional(),
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
});
export type ListRepairsQuery = z.infer<typeof listRepairsQuery>;

// ---- responses (server/services/repairs.ts presenter) ----

/** One repair (`GET /api/repairs`, `POST /api/repairs`, a visit's repairs). Latest first in lists. */
export interface RepairItem {
  id: string;
  wallId: string;
  wallName: string;
  cabinetId: string | null;
  cabinetSerial: string | null;
  column: number;
  row: number;
  /** `C{col}·R{row}`. */
  position: string;
  component: RepairComponent;
  moduleColumn: number | null;
  moduleRow: number | null;
  fault: RepairFault;
  action: RepairAction;
  visitId: string | null;
  ticketId: string | null;
  technicianName: string | null;
  performedAt: string;
  /** The spare fitted: its name and batch (client users see these too, not its cost). */
  part: { id: string; name: string; sku: string; batch: string | null } | null;
  /** A swap's replacement cabinet. */
  replacementCabinet: { id: string; serial: string } | null;
  removedPartFate: RemovedPartFate;
  /** Staff only. */
  notes?: string;
  fromLocation?: { id: string; name: string } | null;
  batchMismatch?: boolean;
}

export const componentLabels: Record<RepairComponent, string> = {
  module: 'Module',
  power_supply: 'Power supply',
  receiving_card: 'Receiving card',
  data_cable: 'Data cable',
  power_cable: 'Power cable',
  fan: 'Fan',
  whole_cabinet: 'Whole cabinet',
};

export const faultLabels: Record<RepairFault, string> = {
  dead_module: 'Module dark',
  dead_pixels: 'Dead pixels',
  colour_shift: 'Colour shift',
  flicker: 'Flicker',
  no_signal: 'No signal',
  physical_damage: 'Physical damage',
  other: 'Other',
};

export const actionLabels: Record<RepairAction, string> = {
  replaced: 'Replaced',
  reseated: 'Reseated',
  recalibrated: 'Recalibrated',
  cabinet_swapped: 'Cabinet swapped',
  cleaned: 'Cleaned',
};

export const fateLabels: Record<RemovedPartFate, string> = {
  none: 'Nothing removed',
  to_bench: 'To the bench',
  to_vendor_return: 'To a vendor return',
  scrapped: 'Scrapped',
};

/** The part kinds that fit each component, for picking a spare. */
export const partKindFor: Record<RepairComponent, string | null> = {
  module: 'module',
  power_supply: 'power_supply',
  receiving_card: 'receiving_card',
  data_cable: 'cable',
  power_cable: 'cable',
  fan: 'fan',
  whole_cabinet: 'cabinet',
};
