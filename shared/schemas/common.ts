import { z } from 'zod';

/** Trimmed text; empty strings stay empty (use `requiredText` when a value is needed). */
export const text = (max = 2000) => z.string().trim().max(max, `At most ${max} characters.`);
export const requiredText = (max = 200) => text(max).min(1, 'Required.');
export const email = z.string().trim().toLowerCase().max(254, 'At most 254 characters.').email('Enter a valid e-mail address.');
export const uuid = z.uuid('Not a valid id.');
export const idParams = z.object({ id: uuid });
export const isoDate = z.iso.date('Use the form YYYY-MM-DD.');
/** A date that may be cleared (null) or left out. */
export const nullableDate = isoDate.nullable().optional();
export const optionalId = z.uuid().optional();
export const sortDir = z.enum(['asc', 'desc']).default('asc');
export const positive = (label: string) => z.number({ error: `${label} must be a number.` }).positive(`${label} must be more than zero.`);
export const positiveInt = (label: string) => positive(label).int(`${label} must be a whole number.`);

const ianaZones = new Set(Intl.supportedValuesOf('timeZone'));
ianaZones.add('UTC');
/** An IANA time-zone name the runtime knows (America/Chicago, Europe/Berlin, UTC). */
export const timeZone = z
  .string()
  .trim()
  .refine((tz) => ianaZones.has(tz), 'Choose a time zone from the list (IANA name, e.g. America/Chicago).');

/** Keyset pagination: `?cursor=` from the previous page's `nextCursor`, and `?limit=`. */
export const pageQuery = z.object({
  cursor: z.string().max(500).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(50),
});

export interface Page<T> {
  items: T[];
  nextCursor: string | null;
}

/** The one error shape every route answers with. */
export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}
