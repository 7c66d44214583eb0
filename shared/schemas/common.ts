import { z } from 'zod';

/** The NUL character: no PostgreSQL text value can hold it, so no field accepts it. */
export const noNul = /^[^\0]*$/;
export const noNulMessage = 'Contains a character that is not allowed (NUL).';

/** Trimmed text without NUL; empty strings stay empty (use `requiredText` when a value is needed). */
export const text = (max = 2000) => z.string().trim().max(max, `At most ${max} characters.`).regex(noNul, noNulMessage);
export const requiredText = (max = 200) => text(max).min(1, 'Required.');
export const email = z.string().trim().toLowerCase().max(254, 'At most 254 characters.').email('Enter a valid e-mail address.');
export const uuid = z.uuid('Not a valid id.');
export const idParams = z.object({ id: uuid });
export const isoDate = z.iso.date('Use the form YYYY-MM-DD.');
/** A date that may be cleared (null) or left out. */
export const nullableDate = isoDate.nullable().optional();
export const optionalId = z.uuid().optional();
export const sortDir = z.enum(['asc', 'desc']).default('asc');
/** The range of a PostgreSQL `integer` column (PostgreSQL manual, 8.1.1 Integer Types). */
export const PG_INT_MAX = 2_147_483_647;
export const PG_INT_MIN = -2_147_483_648;
const tooLarge = `At most ${PG_INT_MAX.toLocaleString('en-US')}.`;

/** A whole number that fits a PostgreSQL `integer` column; anything larger is a 400 naming the field. */
export const wholeNumber = (label = 'Value') =>
  z
    .number({ error: `${label} must be a number.` })
    .int(`${label} must be a whole number.`)
    .min(PG_INT_MIN, `At least ${PG_INT_MIN.toLocaleString('en-US')}.`)
    .max(PG_INT_MAX, tooLarge);
export const positive = (label: string) => z.number({ error: `${label} must be a number.` }).positive(`${label} must be more than zero.`);
export const positiveInt = (label: string) => positive(label).int(`${label} must be a whole number.`).max(PG_INT_MAX, tooLarge);

const ianaZones = new Set(Intl.supportedValuesOf('timeZone'));
ianaZones.add('UTC');
/** An IANA time-zone name the runtime knows (America/Chicago, Europe/Berlin, UTC). */
export const timeZone = z
  .string()
  .trim()
  .refine((tz) => ianaZones.has(tz), 'Choose a time zone from the list (IANA name, e.g. America/Chicago).');

/** Keyset pagination: `?cursor=` from the previous page's `nextCursor`, and `?limit=`. */
export const pageQuery = z.object({
  cursor: z
    .string()
    .max(500)
    .regex(/^[\w-]*$/, 'Not valid.')
    .optional(),
  limit: z.coerce.number().int().min(1).max(500).default(50),
});

export interface Page<T> {
  items: T[];
  nextCursor: string | null;
}

/**
 * A list read whole up to a cap (a catalogue, a ticket's conversation, a record's files):
 * `truncated` says more exist than `items` holds, and the screen says so.
 */
export interface CappedList<T> {
  items: T[];
  truncated: boolean;
}

/** The one error shape every route answers with. */
export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}
