import { z } from 'zod';

/** Trimmed text; empty strings stay empty (use `requiredText` when a value is needed). */
export const text = (max = 2000) => z.string().trim().max(max, `At most ${max} characters.`);
export const requiredText = (max = 200) => text(max).min(1, 'Required.');
export const email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'At most 254 characters.')
  .email('Enter a valid e-mail address.');
export const uuid = z.uuid('Not a valid id.');
export const idParams = z.object({ id: uuid });
export const isoDate = z.iso.date('Use the form YYYY-MM-DD.');

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
