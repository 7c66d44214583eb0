// The spare-stock resources: parts, stock locations, the movement ledger and the quantities on
// hand it adds up to. Request schemas (forms and server alike), list queries and responses.
import { z } from 'zod';
import { optionalId, pageQuery, sortDir, text } from './common.js';
import {
  partKinds,
  stockLocationKinds,
  stockMovementKinds,
  vendorReturnOutcomes,
  type PartKind,
  type StockLocationKind,
  type StockMovementKind,
  type VendorReturnOutcome,
} from './enums.js';

/** A production batch / bin code: trimmed, as printed on the module or cabinet; empty for parts without batches. */
export const batchCode = z.string().trim().max(40, 'At most 40 characters.').default('');

// ---- requests ----

/** Which locations a movement of each kind names: where the stock comes from, where it goes. */
export const movementEnds: Record<StockMovementKind, { from: 'required' | 'none' | 'either'; to: 'required' | 'none' | 'either' }> = {
  receipt: { from: 'none', to: 'required' },
  back_from_vendor: { from: 'none', to: 'required' },
  return_from_wall: { from: 'none', to: 'required' },
  consumption: { from: 'required', to: 'none' },
  sent_to_vendor: { from: 'required', to: 'none' },
  transfer: { from: 'required', to: 'required' },
  // An adjustment corrects a count one way: down from a location, or up into one.
  adjustment: { from: 'either', to: 'either' },
};

export const stockMovementInput = z
  .object({
    kind: z.enum(stockMovementKinds, { error: 'Choose what happened to the stock.' }),
    partId: z.uuid('Choose a part.'),
    batch: batchCode,
    fromLocationId: z.uuid('Choose a location.').optional(),
    toLocationId: z.uuid('Choose a location.').optional(),
    quantity: z
      .number({ error: 'Quantity must be a number.' })
      .int('Whole units only.')
      .min(1, 'At least one.')
      .max(100_000, 'At most 100,000 at once.'),
    reason: text(500).optional(),
    /** The wall the spare is taken for: its module batch is checked against the spare's. */
    forWallId: optionalId,
    /** Taking a spare of another batch than the wall's needs this, and the movement records it. */
    acceptBatchMismatch: z.boolean().optional(),
  })
  .superRefine((m, ctx) => {
    const ends = movementEnds[m.kind];
    const named = (field: 'fromLocationId' | 'toLocationId', rule: 'required' | 'none' | 'either', words: string) => {
      if (rule === 'required' && !m[field]) ctx.addIssue({ code: 'custom', path: [field], message: `Choose where the stock ${words}.` });
      if (rule === 'none' && m[field])
        ctx.addIssue({ code: 'custom', path: [field], message: `A ${m.kind.replace(/_/g, ' ')} names no location here.` });
    };
    named('fromLocationId', ends.from, 'comes from');
    named('toLocationId', ends.to, 'goes to');
    if (m.kind === 'adjustment') {
      if (Boolean(m.fromLocationId) === Boolean(m.toLocationId)) {
        ctx.addIssue({
          code: 'custom',
          path: ['fromLocationId'],
          message: 'An adjustment takes stock off one location or adds it to one.',
        });
      }
      if (!m.reason) ctx.addIssue({ code: 'custom', path: ['reason'], message: 'Say why the count is corrected.' });
    }
    if (m.fromLocationId && m.fromLocationId === m.toLocationId) {
      ctx.addIssue({ code: 'custom', path: ['toLocationId'], message: 'Choose another location than the one it comes from.' });
    }
  });
export type StockMovementInput = z.input<typeof stockMovementInput>;
export type StockMovementRequest = z.output<typeof stockMovementInput>;

export const listStockQuery = pageQuery.extend({
  partId: optionalId,
  locationId: optionalId,
  /** One batch, matched whole (any case). */
  batch: z.string().trim().max(40).optional(),
  partKind: z.enum(partKinds).optional(),
  locationKind: z.enum(stockLocationKinds).optional(),
  /** By part (then batch and location), by location (then part and batch), or by quantity on hand. */
  sort: z.enum(['part', 'location', 'onHand']).default('part'),
  dir: sortDir,
});
export type ListStockQuery = z.infer<typeof listStockQuery>;

export const listStockMovementsQuery = pageQuery.extend({
  partId: optionalId,
  /** Movements into or out of this location. */
  locationId: optionalId,
  kind: z.enum(stockMovementKinds).optional(),
  batch: z.string().trim().max(40).optional(),
});
export type ListStockMovementsQuery = z.infer<typeof listStockMovementsQuery>;

export const listPartsQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  kind: z.enum(partKinds).optional(),
  cabinetModelId: optionalId,
});
export type ListPartsQuery = z.infer<typeof listPartsQuery>;

export const listStockLocationsQuery = z.object({
  kind: z.enum(stockLocationKinds).optional(),
  siteId: optionalId,
});
export type ListStockLocationsQuery = z.infer<typeof listStockLocationsQuery>;

// ---- responses ----

export interface Part {
  id: string;
  sku: string;
  name: string;
  kind: PartKind;
  cabinetModel: { id: string; name: string } | null;
  leadTimeDays: number;
  archived: boolean;
}

export interface StockLocation {
  id: string;
  name: string;
  kind: StockLocationKind;
  /** The technician who holds a van. */
  holder: { id: string; name: string } | null;
  /** The site of an on-site kit. */
  site: { id: string; name: string; clientName: string } | null;
  archived: boolean;
}

/** What one location holds of one part and batch: the ledger's sum. */
export interface StockBalance {
  partId: string;
  partSku: string;
  partName: string;
  partKind: PartKind;
  batch: string;
  locationId: string;
  locationName: string;
  locationKind: StockLocationKind;
  onHand: number;
  /** The part on hand at the location, all batches together: what a reorder point watches. */
  partOnHandHere: number;
  /** The location's reorder point for the part (all batches together), when one is set. */
  reorderAt: number | null;
}

export interface StockMovement {
  id: number;
  kind: StockMovementKind;
  partId: string;
  partName: string;
  batch: string;
  from: { id: string; name: string } | null;
  to: { id: string; name: string } | null;
  quantity: number;
  reason: string;
  wallId: string | null;
  /** The spare's batch differs from the wall's own, and whoever took it said so. */
  batchMismatch: boolean;
  actorName: string | null;
  createdAt: string;
}

/** A spare for a wall, its batch compared with the batches of the wall's cabinets. */
export interface WallSpare extends StockBalance {
  matchesWallBatch: boolean;
}

// ---- vendor returns ----

export const vendorReturnInput = z
  .object({
    partId: z.uuid('Choose a part.'),
    serial: z.string().trim().max(64).default(''),
    batch: batchCode,
    quantity: z.number({ error: 'Quantity must be a number.' }).int('Whole units only.').min(1, 'At least one.').max(10_000).default(1),
    fault: z.string().trim().min(1, 'Say what is wrong with it.').max(500),
    /** Where the failed part leaves from: a `sent_to_vendor` movement takes it off that shelf. */
    fromLocationId: optionalId,
    rmaReference: z.string().trim().max(80).default(''),
    sentOn: z.iso.date('Use the form YYYY-MM-DD.').optional(),
    expectedBackOn: z.iso.date('Use the form YYYY-MM-DD.').optional(),
    notes: text(2000).optional(),
  })
  .refine((v) => !v.sentOn || !v.expectedBackOn || v.expectedBackOn >= v.sentOn, {
    path: ['expectedBackOn'],
    message: 'It cannot be back before it is sent.',
  });
export type VendorReturnInput = z.input<typeof vendorReturnInput>;

export const vendorReturnPatch = z
  .object({
    outcome: z.enum(vendorReturnOutcomes).optional(),
    rmaReference: z.string().trim().max(80).optional(),
    sentOn: z.iso.date('Use the form YYYY-MM-DD.').optional(),
    expectedBackOn: z.iso.date('Use the form YYYY-MM-DD.').optional(),
    /** A repaired or replaced part back on this shelf: a `back_from_vendor` movement puts it there. */
    backToLocationId: optionalId,
    notes: text(2000).optional(),
  })
  .refine((v) => !v.backToLocationId || v.outcome === 'repaired' || v.outcome === 'replaced', {
    path: ['backToLocationId'],
    message: 'Only a repaired or replaced part comes back into stock.',
  });
export type VendorReturnPatch = z.input<typeof vendorReturnPatch>;

export const listVendorReturnsQuery = z.object({
  outcome: z.enum(vendorReturnOutcomes).optional(),
  /** Only returns past their expected date and still pending. */
  overdue: z
    .enum(['true', 'false'])
    .optional()
    .transform((v) => v === 'true'),
});

export interface VendorReturn {
  id: string;
  part: { id: string; name: string; sku: string };
  serial: string;
  batch: string;
  quantity: number;
  fault: string;
  from: { id: string; name: string } | null;
  rmaReference: string;
  sentOn: string | null;
  expectedBackOn: string | null;
  outcome: VendorReturnOutcome;
  backInStockOn: string | null;
  backTo: { id: string; name: string } | null;
  notes: string;
  /** Pending past its expected date. */
  overdue: boolean;
  createdAt: string;
}

// ---- restock from the spares forecast ----

export const restockQuery = z.object({
  serviceLevel: z.coerce
    .number({ error: 'Service level must be a number.' })
    .gt(0, 'Service level must be more than 0.')
    .lt(1, 'Service level must be below 1; try 0.95.')
    .default(0.95),
});

/** One wall's spare modules: what its site kit should hold of the wall's own batches, and what to send. */
export interface RestockLine {
  wallId: string;
  wallName: string;
  siteName: string;
  clientName: string;
  kit: { id: string; name: string } | null;
  part: { id: string; name: string; sku: string } | null;
  modules: number;
  /** Whose failures set the rate: the wall's own history, or its cabinet model's across walls. */
  rateBasis: 'wall' | 'model';
  failures: number;
  exposureModuleMonths: number;
  failuresPerThousandModuleMonths: number;
  leadTimeMonths: number;
  expectedFailures: number;
  recommended: number;
  /** Modules of the wall's own batches in its site kit. */
  onHand: number;
  toSend: number;
}

// ---- parts, locations and reorder points (the office's) ----

export const partInput = z.object({
  sku: z
    .string()
    .trim()
    .min(1, 'Required.')
    .max(40, 'At most 40 characters.')
    .transform((s) => s.toUpperCase()),
  name: z.string().trim().min(1, 'Required.').max(120, 'At most 120 characters.'),
  kind: z.enum(partKinds, { error: 'Choose what kind of part it is.' }),
  /** The cabinet model a module, power supply or card fits; none for generic parts. */
  cabinetModelId: z.uuid().nullable().optional(),
  leadTimeDays: z.number({ error: 'Lead time must be a number.' }).int('Whole days.').min(0).max(3650).default(30),
});
export type PartInput = z.input<typeof partInput>;
export const partPatch = partInput.partial().extend({ archived: z.boolean().optional() });
export type PartPatch = z.input<typeof partPatch>;

export const stockLocationInput = z
  .object({
    name: z.string().trim().min(1, 'Required.').max(120, 'At most 120 characters.'),
    kind: z.enum(stockLocationKinds, { error: 'Choose a kind of location.' }),
    /** The technician who holds a van. */
    holderId: z.uuid().nullable().optional(),
    /** The site of an on-site kit. */
    siteId: z.uuid().nullable().optional(),
  })
  .superRefine((l, ctx) => {
    if (l.kind === 'van' && !l.holderId) ctx.addIssue({ code: 'custom', path: ['holderId'], message: 'A van is held by a technician.' });
    if (l.kind === 'site_kit' && !l.siteId) ctx.addIssue({ code: 'custom', path: ['siteId'], message: 'A site kit is kept at a site.' });
    if (l.kind !== 'site_kit' && l.siteId)
      ctx.addIssue({ code: 'custom', path: ['siteId'], message: 'Only a site kit is kept at a site.' });
  });
export type StockLocationInput = z.input<typeof stockLocationInput>;
export const stockLocationPatch = z.object({
  name: z.string().trim().min(1, 'Required.').max(120).optional(),
  holderId: z.uuid().nullable().optional(),
  archived: z.boolean().optional(),
});
export type StockLocationPatch = z.input<typeof stockLocationPatch>;

export const reorderPointInput = z.object({
  partId: z.uuid('Choose a part.'),
  locationId: z.uuid('Choose a location.'),
  /** Alert when the part on hand here (all batches) falls to or below this. */
  minQuantity: z.number({ error: 'Must be a number.' }).int('Whole units.').min(0, 'Cannot be negative.').max(100_000),
  reorderQuantity: z.number({ error: 'Must be a number.' }).int('Whole units.').min(1, 'At least one.').max(100_000),
});
export type ReorderPointInput = z.input<typeof reorderPointInput>;

/** Whole spare cabinets kept at a location (cabinets with status `spare`), by model and batch. */
export interface SpareCabinetGroup {
  cabinetModel: { id: string; name: string };
  batch: string;
  location: { id: string; name: string; kind: StockLocationKind };
  count: number;
  /** The cabinets themselves, in serial order (a swap names the spare by its id). */
  cabinets: { id: string; serial: string }[];
}
