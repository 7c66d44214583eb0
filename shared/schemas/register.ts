// Contracts of the installed-base register: clients, sites, contacts, walls, catalogue,
// controllers and cabinets. Used by the forms (zodResolver) and by the server's validate().
import { z } from 'zod';
import { email, isoDate, pageQuery, requiredText, text } from './common.js';
import { cabinetStatuses, environments, mountings } from './enums.js';

const sortDir = z.enum(['asc', 'desc']).default('asc');
const optionalId = z.uuid().optional();
const nullableDate = isoDate.nullable().optional();
const ianaZones = new Set(Intl.supportedValuesOf('timeZone'));
ianaZones.add('UTC');
export const timeZone = z
  .string()
  .trim()
  .refine((tz) => ianaZones.has(tz), 'Choose a time zone from the list (IANA name, e.g. America/Chicago).');

// ---- clients ----
export const clientInput = z.object({
  name: requiredText(120),
  servicePlanId: z.uuid().nullable().optional(),
  notes: text(5000).optional(),
});
export type ClientInput = z.infer<typeof clientInput>;
export const clientPatch = clientInput.partial().extend({ archived: z.boolean().optional() });
export type ClientPatch = z.infer<typeof clientPatch>;
export const listClientsQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  sort: z.enum(['name', 'createdAt']).default('name'),
  dir: sortDir,
  archived: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});
export type ListClientsQuery = z.infer<typeof listClientsQuery>;

// ---- sites ----
export const siteInput = z.object({
  clientId: z.uuid(),
  name: requiredText(120),
  address: text(300).optional(),
  city: text(120).optional(),
  region: text(120).optional(),
  postalCode: text(20).optional(),
  country: text(80).optional(),
  timeZone,
  accessNotes: text(5000).optional(),
  internalNotes: text(5000).optional(),
});
export type SiteInput = z.infer<typeof siteInput>;
export const sitePatch = siteInput.omit({ clientId: true }).partial().extend({ archived: z.boolean().optional() });
export type SitePatch = z.infer<typeof sitePatch>;
export const listSitesQuery = pageQuery.extend({
  q: z.string().trim().max(100).optional(),
  clientId: optionalId,
  sort: z.enum(['name', 'city', 'createdAt']).default('name'),
  dir: sortDir,
});
export type ListSitesQuery = z.infer<typeof listSitesQuery>;

// ---- contacts ----
export const contactInput = z.object({
  clientId: z.uuid(),
  siteId: z.uuid().nullable().optional(),
  name: requiredText(120),
  title: text(120).optional(),
  email: email.nullable().optional().or(z.literal('').transform(() => null)),
  phone: text(40).optional(),
  receivesUpdates: z.boolean().optional(),
});
export type ContactInput = z.infer<typeof contactInput>;
export const contactPatch = contactInput.omit({ clientId: true }).partial();
export type ContactPatch = z.infer<typeof contactPatch>;

// ---- cabinet models (catalogue) ----
const positive = (label: string) => z.number({ error: `${label} must be a number.` }).positive(`${label} must be more than zero.`);
const positiveInt = (label: string) => positive(label).int(`${label} must be a whole number.`);
/** An optional datasheet figure: an empty box (NaN or '') is "not known", stored as null. */
const optionalFigure = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (v === '' || (typeof v === 'number' && Number.isNaN(v)) ? null : v), schema.nullable().optional());
const vaBelowWatts = 'Volt-amperes cannot be less than the maximum watts (the power factor is at most 1).';

/**
 * The datasheet's power connection, which may be filled in after a model is in use: it only
 * makes plans safer. Connector rating in amperes, the maker's most cabinets per chain, VA at
 * maximum power.
 */
const powerConnectionFields = {
  passThroughAmps: optionalFigure(positive('Connector rating').max(1000, 'Connector rating must be at most 1,000 A.')),
  maxPerChain: optionalFigure(positiveInt('Cabinets per chain').max(10_000, 'At most 10,000 cabinets per chain.')),
  maxPowerVA: optionalFigure(positive('Maximum volt-amperes').max(100_000, 'At most 100,000 VA.')),
};

export const cabinetModelInput = z
  .object({
    name: requiredText(120),
    maker: text(120).optional(),
    widthMm: positive('Width'),
    heightMm: positive('Height'),
    pixelPitchMm: positive('Pixel pitch'),
    pixelsWide: positiveInt('Pixels wide'),
    pixelsHigh: positiveInt('Pixels high'),
    modulesWide: positiveInt('Modules wide'),
    modulesHigh: positiveInt('Modules high'),
    maxPowerW: positive('Maximum power'),
    typicalPowerW: positive('Typical power'),
    weightKg: positive('Weight'),
    brightnessNits: positiveInt('Brightness'),
    inputVoltageMinV: positiveInt('Lowest input voltage').default(100),
    inputVoltageMaxV: positiveInt('Highest input voltage').default(240),
    ...powerConnectionFields,
    environment: z.enum(environments).default('indoor'),
  })
  .refine((m) => m.typicalPowerW <= m.maxPowerW, { path: ['typicalPowerW'], message: 'Typical power cannot exceed maximum power.' })
  .refine((m) => m.inputVoltageMinV <= m.inputVoltageMaxV, { path: ['inputVoltageMinV'], message: 'The lowest voltage cannot exceed the highest.' })
  .refine((m) => m.maxPowerVA == null || m.maxPowerVA >= m.maxPowerW, { path: ['maxPowerVA'], message: vaBelowWatts });
export type CabinetModelInput = z.infer<typeof cabinetModelInput>;
export const cabinetModelPatch = z.object({
  name: requiredText(120).optional(),
  maker: text(120).optional(),
  ...powerConnectionFields,
  archived: z.boolean().optional(),
});
export type CabinetModelPatch = z.infer<typeof cabinetModelPatch>;
export { vaBelowWatts };

// ---- walls ----
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

// ---- controllers ----
export const controllerInput = z
  .object({
    wallId: z.uuid().nullable().optional(),
    model: requiredText(120),
    serial: requiredText(80).transform((s) => s.toUpperCase()),
    firmware: text(80).optional(),
    outputs: positiveInt('Outputs'),
    outputsInUse: z.number().int().min(0).default(0),
    pixelsPerOutput: positiveInt('Pixels per output').default(650000),
    notes: text(5000).optional(),
  })
  .refine((c) => c.outputsInUse <= c.outputs, { path: ['outputsInUse'], message: 'Cannot use more outputs than the controller has.' });
export type ControllerInput = z.infer<typeof controllerInput>;
export const controllerPatch = z.object({
  wallId: z.uuid().nullable().optional(),
  firmware: text(80).optional(),
  outputsInUse: z.number().int().min(0).optional(),
  notes: text(5000).optional(),
  archived: z.boolean().optional(),
});
export type ControllerPatch = z.infer<typeof controllerPatch>;

// ---- cabinets ----
/** Serials are stored trimmed and upper-cased, so a scan and a typed serial match. */
export const serial = z
  .string()
  .trim()
  .min(1, 'Required.')
  .max(64, 'At most 64 characters.')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._\-/]*$/, 'Letters, digits and . _ - / only.')
  .transform((s) => s.toUpperCase());
export const position = z.object({
  column: z.number().int('Whole positions only.').min(1, 'Columns count from 1.'),
  row: z.number().int('Whole positions only.').min(1, 'Rows count from 1.'),
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

export const moveCabinetInput = z.object({
  wallId: z.uuid(),
  column: position.shape.column,
  row: position.shape.row,
  note: text(500).optional(),
});
export type MoveCabinetInput = z.infer<typeof moveCabinetInput>;

export const swapCabinetInput = z.object({ otherCabinetId: z.uuid(), note: text(500).optional() });
export type SwapCabinetInput = z.infer<typeof swapCabinetInput>;

export const cabinetPatch = z.object({
  batch: text(40).optional(),
  notes: text(2000).optional(),
  /** Taking a cabinet off its wall (to the bench, back to the maker, retired) frees its position. */
  status: z.enum(cabinetStatuses).optional(),
  stockLocationId: z.uuid().nullable().optional(),
  note: text(500).optional(),
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
  /** A production batch, matched whole (any case): the filter of a batch recall. */
  batch: z.string().trim().max(40).optional(),
  sort: z.enum(['serial', 'batch', 'installedOn']).default('serial'),
  dir: sortDir,
});
export type ListCabinetsQuery = z.infer<typeof listCabinetsQuery>;

/** One CSV row of a cabinet import; line numbers count the header as line 1. */
export const importRow = z.object({
  serial,
  column: z.coerce.number({ error: 'column must be a whole number' }).int('column must be a whole number').min(1, 'column counts from 1'),
  row: z.coerce.number({ error: 'row must be a whole number' }).int('row must be a whole number').min(1, 'row counts from 1'),
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

export const searchQuery = z.object({ q: z.string().trim().min(1, 'Type something to search for.').max(100) });

/** `C{column}·R{row}`, counted from the top-left as seen from the audience. */
export const positionLabel = (p: { column: number; row: number }) => `C${p.column}·R${p.row}`;

