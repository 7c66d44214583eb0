import { describe, expect, it } from 'vitest';
import { mapsHref } from '@/features/visits/utils/maps-link';
import { telHref } from '@/features/visits/utils/phone-link';

// RFC 5870 ("A Uniform Resource Identifier for Geographic Locations"): `geo:` then the
// coordinates; 0,0 with a `q` query is Android's documented form for "show this address"
// (Android Developers, Common intents → Maps → "Show a location": strings in the geo URI must
// be encoded, e.g. "1st & Pike, Seattle" as 1st%20%26%20Pike%2C%20Seattle).
describe('maps link', () => {
  it('puts the address, encoded, in the q query of a geo URI', () => {
    expect(mapsHref('1st & Pike, Seattle')).toBe('geo:0,0?q=1st%20%26%20Pike%2C%20Seattle');
  });

  it('encodes what would end or split the query (#, ?, =, /) and trims the ends', () => {
    expect(mapsHref('  Unit 4/B #2, Route=9? ')).toBe('geo:0,0?q=Unit%204%2FB%20%232%2C%20Route%3D9%3F');
  });
});

// RFC 3966 ("The tel URI for Telephone Numbers", 5.1.1): a global number is "+" then digits;
// visual separators ("-", ".", "(", ")") are optional and a space is not a URI character.
describe('phone link', () => {
  it('keeps the + and the digits of a number written for people', () => {
    expect(telHref('+1 214 555 0131')).toBe('tel:+12145550131');
    expect(telHref('(214) 555-0131')).toBe('tel:2145550131');
  });
});
