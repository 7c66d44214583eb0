/**
 * A `tel:` link for a phone number as people write it ("+1 214 555 0131", "(214) 555-0131"):
 * a leading "+" and the digits. RFC 3966 lets a number leave out its visual separators, and
 * a space is not allowed in the URI at all.
 */
export function telHref(phone: string): string {
  const trimmed = phone.trim();
  return `tel:${trimmed.startsWith('+') ? '+' : ''}${trimmed.replace(/\D/g, '')}`;
}
