// Typed coordinates read with no service. Expected values worked by hand from the definition of
// the sexagesimal degree (1° = 60′ = 3600″) and the hemisphere signs (S and W negative), as ISO 6709
// writes them (latitude first) — the standard's layout recalled from memory, not re-read.
import { describe, expect, it } from 'vitest';
import { parseCoordinates } from '../../../shared/geo/parse-coordinates';

const position = (text: string) => {
  const r = parseCoordinates(text);
  if (!r.ok) throw new Error(`${text}: ${r.reason} ${r.message}`);
  return r.position;
};
const reason = (text: string) => {
  const r = parseCoordinates(text);
  return r.ok ? 'ok' : r.reason;
};

describe('decimal degrees', () => {
  it('reads "lat, lng" with a minus sign for west, giving [lng, lat]', () => {
    expect(position('42.1234, -93.5678')).toEqual([-93.5678, 42.1234]);
    expect(position('42.1234,-93.5678')).toEqual([-93.5678, 42.1234]);
    expect(position('  42.1234 -93.5678 ')).toEqual([-93.5678, 42.1234]);
    expect(position('42.1234; -93.5678')).toEqual([-93.5678, 42.1234]);
  });

  it('reads hemisphere letters after or before the figures, in either order', () => {
    expect(position('42.1234 N 93.5678 W')).toEqual([-93.5678, 42.1234]);
    expect(position('42.1234N, 93.5678W')).toEqual([-93.5678, 42.1234]);
    expect(position('N42.1234 W93.5678')).toEqual([-93.5678, 42.1234]);
    expect(position('93.5678 W 42.1234 N')).toEqual([-93.5678, 42.1234]);
    expect(position('42.1234 north 93.5678 west')).toEqual([-93.5678, 42.1234]);
  });

  it('gives the southern and eastern hemispheres their signs', () => {
    expect(position('33.9253 S 18.4239 E')).toEqual([18.4239, -33.9253]);
    expect(position('-33.9, 18.4')).toEqual([18.4, -33.9]);
  });
});

describe('degrees, minutes and seconds', () => {
  // 42 + 7/60 + 24.2/3600 = 42.1233889; 93 + 34/60 + 4.1/3600 = 93.5678056 (by hand).
  const expected = [-93.5678056, 42.1233889];

  it('reads 42°07\'24.2"N 93°34\'04.1"W', () => {
    const [lng, lat] = position('42°07\'24.2"N 93°34\'04.1"W');
    expect(lat).toBeCloseTo(expected[1], 7);
    expect(lng).toBeCloseTo(expected[0], 7);
  });

  it('reads typographic primes, spaces between the parts and no marks at all', () => {
    for (const text of ['42°07′24.2″N 93°34′04.1″W', '42° 07\' 24.2" N, 93° 34\' 04.1" W', '42 07 24.2 N 93 34 04.1 W', 'N 42°07\'24.2" W 93°34\'04.1"']) {
      const [lng, lat] = position(text);
      expect(lat, text).toBeCloseTo(expected[1], 7);
      expect(lng, text).toBeCloseTo(expected[0], 7);
    }
  });

  it('reads a minus sign on the degrees as the whole coordinate being negative', () => {
    const [lng, lat] = position('42°07\'24.2", -93°34\'04.1"');
    expect(lat).toBeCloseTo(42.1233889, 7);
    expect(lng).toBeCloseTo(-93.5678056, 7);
  });

  it('reads degrees and decimal minutes: 42°07.403\'N 93°34.068\'W', () => {
    // 42 + 7.403/60 = 42.1233833; 93 + 34.068/60 = 93.5678 (by hand).
    const [lng, lat] = position('42°07.403\'N 93°34.068\'W');
    expect(lat).toBeCloseTo(42.1233833, 7);
    expect(lng).toBeCloseTo(-93.5678, 7);
  });

  it('reads the southern and eastern hemispheres: 33°55\'31"S 18°25\'26"E', () => {
    // 33 + 55/60 + 31/3600 = 33.9252778; 18 + 25/60 + 26/3600 = 18.4238889 (by hand).
    const [lng, lat] = position('33°55\'31"S 18°25\'26"E');
    expect(lat).toBeCloseTo(-33.9252778, 7);
    expect(lng).toBeCloseTo(18.4238889, 7);
  });
});

describe('what is not coordinates goes to the place search', () => {
  it('leaves place names, addresses and a lone postcode alone', () => {
    expect(reason('Marrowby')).toBe('not-coordinates');
    expect(reason('1420 Quillan Road')).toBe('not-coordinates');
    expect(reason('50010')).toBe('not-coordinates');
    expect(reason('')).toBe('not-coordinates');
    expect(reason('42d07m24s')).toBe('not-coordinates');
  });
});

describe('coordinates that are wrong say what is wrong', () => {
  it('refuses a latitude beyond 90° and a longitude beyond 180°', () => {
    expect(reason('95, 10')).toBe('latitude-out-of-range');
    expect(reason('42, 200')).toBe('longitude-out-of-range');
    expect(reason('90, -180')).toBe('ok');
  });

  it('refuses minutes or seconds of 60 or more', () => {
    expect(reason('42 61 00 N 93 00 00 W')).toBe('minutes-out-of-range');
    expect(reason('42 07 60 N 93 00 00 W')).toBe('seconds-out-of-range');
  });

  it('refuses a minus sign together with a hemisphere letter', () => {
    const r = parseCoordinates('42.1 N -93.5 W');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.reason).toBe('sign-and-hemisphere');
      expect(r.message).toContain('-93.5');
    }
  });

  it('refuses two latitudes or two longitudes', () => {
    expect(reason('42.1 N 43.2 S')).toBe('two-latitudes');
    expect(reason('42.1 E 43.2 W')).toBe('two-longitudes');
  });

  it('asks for the second figure when only one coordinate is typed', () => {
    expect(reason('42°07\'24.2"N')).toBe('one-number');
    expect(reason('42.1234 N')).toBe('one-number');
  });

  it('refuses decimals on any figure but the last, and marks out of order', () => {
    expect(reason('42.5°07\'N 93°34\'W')).toBe('badly-formed');
    expect(reason('42\'07°N 93°34\'W')).toBe('badly-formed');
    expect(reason('1 2 3 4 5 6 7 8')).toBe('too-many-numbers');
  });
});
