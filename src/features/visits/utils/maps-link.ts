/**
 * A link that opens the phone's maps app at an address: a `geo:` URI (RFC 5870) with the
 * address as its `q` query, as Android's maps apps read it ("geo:0,0?q=my+street+address").
 * The one place that builds it, so another scheme (an Apple Maps or web link) is one change.
 */
export function mapsHref(address: string): string {
  return `geo:0,0?q=${encodeURIComponent(address.trim())}`;
}
