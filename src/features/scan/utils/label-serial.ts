import { serial as serialSchema } from '@shared/schemas/cabinets';

/**
 * The cabinet serial a scanned QR code names, or null when the code is not a Gridkeep label.
 * A label holds the address `<origin>/c/<serial>` (the serial URL-encoded); labels printed by
 * another installation of Gridkeep, or before the address changed, carry another origin, so
 * any http(s) origin is accepted and the serial is taken from the path. The serial is checked
 * and upper-cased by the same rule the server applies.
 */
export function serialFromLabel(raw: string): string | null {
  let url: URL;
  try {
    url = new URL(raw.trim());
  } catch {
    return null;
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') return null;
  const match = /\/c\/([^/]+)\/?$/.exec(url.pathname);
  if (!match) return null;
  let segment: string;
  try {
    segment = decodeURIComponent(match[1]);
  } catch {
    return null;
  }
  const parsed = serialSchema.safeParse(segment);
  return parsed.success ? parsed.data : null;
}
