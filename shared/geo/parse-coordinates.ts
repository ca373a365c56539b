// Typed coordinates → a GeoJSON position [lng, lat] (WGS84 degrees), with no service.
//
// Reads decimal degrees ("42.1234, -93.5678", "42.1234 N 93.5678 W", "N42.1234 W93.5678"),
// degrees and decimal minutes ("42°07.403'N 93°34.068'W") and degrees-minutes-seconds
// ("42°07'24.2\"N 93°34'04.1\"W", "42 07 24.2 N 93 34 04.1 W"). Value = degrees + minutes/60 +
// seconds/3600, the sexagesimal definition of the degree. Without hemisphere letters the first
// figure is the latitude (the order people read coordinates aloud and most GPS units show).
// A decimal comma is not read: "42,5 -93,5" would be ambiguous with the comma between the two.
//
// Text that does not look like coordinates at all (a place name, a single number such as a
// postcode) is `not-coordinates`, so a caller can send it to a place search instead; text that
// looks like coordinates but is wrong says what is wrong.

export type CoordinateProblem =
  | 'not-coordinates'
  | 'one-number'
  | 'too-many-numbers'
  | 'badly-formed'
  | 'two-latitudes'
  | 'two-longitudes'
  | 'sign-and-hemisphere'
  | 'minutes-out-of-range'
  | 'seconds-out-of-range'
  | 'latitude-out-of-range'
  | 'longitude-out-of-range';

export type CoordinateParse =
  | { ok: true; position: [number, number] }
  | { ok: false; reason: CoordinateProblem; message: string };

type NumberToken = { kind: 'number'; value: number; text: string; unit: '' | '°' | "'" | '"' };
type Token = NumberToken | { kind: 'hemisphere'; letter: 'N' | 'S' | 'E' | 'W' } | { kind: 'separator' } | { kind: 'word' };

type Part = { numbers: NumberToken[]; hemisphere: 'N' | 'S' | 'E' | 'W' | null };

const HEMISPHERES: Record<string, 'N' | 'S' | 'E' | 'W'> = {
  n: 'N', north: 'N', s: 'S', south: 'S', e: 'E', east: 'E', w: 'W', west: 'W',
};

type Failure = Extract<CoordinateParse, { ok: false }>;
const fail = (reason: CoordinateProblem, message: string): Failure => ({ ok: false, reason, message });

/** Typographic marks people paste from documents and maps, turned into plain ones. */
function normalise(text: string): string {
  return text
    .trim()
    .replace(/[\u2212\u2012\u2013\u2014]/g, '-')
    .replace(/[º˚]/g, '°')
    .replace(/[′‘’`´]/g, "'")
    .replace(/[″“”]|''/g, '"');
}

const TOKEN = /\s*(?:([+-]?\d+(?:\.\d+)?)\s*([°'"]?)|([a-z]+)|([,;/]))\s*/iy;

function tokenise(text: string): Token[] | null {
  const tokens: Token[] = [];
  TOKEN.lastIndex = 0;
  while (TOKEN.lastIndex < text.length) {
    const m = TOKEN.exec(text);
    if (!m) return null;
    if (m[1] !== undefined) tokens.push({ kind: 'number', value: Number(m[1]), text: m[1], unit: m[2] as NumberToken['unit'] });
    else if (m[3] !== undefined) {
      const letter = HEMISPHERES[m[3].toLowerCase()];
      tokens.push(letter ? { kind: 'hemisphere', letter } : { kind: 'word' });
    } else tokens.push({ kind: 'separator' });
  }
  return tokens;
}

/** Splits the tokens into the two coordinates: by hemisphere letters, a separator, degree marks, or in half. */
function splitParts(tokens: Token[]): Part[] | null {
  const numbersOf = (ts: Token[]) => ts.filter((t): t is NumberToken => t.kind === 'number');
  const letters = tokens.filter((t) => t.kind === 'hemisphere');
  if (letters.length > 0) {
    const prefix = tokens[0].kind === 'hemisphere';
    const parts: Part[] = [];
    let current: Part = { numbers: [], hemisphere: null };
    for (const t of tokens) {
      if (t.kind === 'number') current.numbers.push(t);
      else if (t.kind === 'hemisphere') {
        if (prefix) {
          if (current.numbers.length || current.hemisphere) parts.push(current);
          current = { numbers: [], hemisphere: t.letter };
        } else {
          if (current.hemisphere || current.numbers.length === 0) return null;
          current.hemisphere = t.letter;
          parts.push(current);
          current = { numbers: [], hemisphere: null };
        }
      } else if (t.kind === 'separator' && !prefix && current.numbers.length) {
        parts.push(current);
        current = { numbers: [], hemisphere: null };
      }
    }
    if (current.numbers.length || current.hemisphere) parts.push(current);
    return parts;
  }
  const separators = tokens.filter((t) => t.kind === 'separator').length;
  if (separators > 1) return null;
  if (separators === 1) {
    const at = tokens.findIndex((t) => t.kind === 'separator');
    return [tokens.slice(0, at), tokens.slice(at + 1)].map((ts) => ({ numbers: numbersOf(ts), hemisphere: null }));
  }
  const numbers = numbersOf(tokens);
  if (numbers.some((n) => n.unit === '°')) {
    const parts: Part[] = [];
    for (const n of numbers) {
      if (n.unit === '°' || parts.length === 0) parts.push({ numbers: [], hemisphere: null });
      parts[parts.length - 1].numbers.push(n);
    }
    return parts;
  }
  if (numbers.length % 2 !== 0) return null;
  const half = numbers.length / 2;
  return [numbers.slice(0, half), numbers.slice(half)].map((ns) => ({ numbers: ns, hemisphere: null }));
}

const UNIT_ORDER = ['°', "'", '"'];

/** Degrees (signed) of one part, or a problem. */
function partDegrees(part: Part): { ok: true; degrees: number } | Failure {
  const ns = part.numbers;
  if (ns.length === 0 || ns.length > 3) return fail('badly-formed', 'Each coordinate needs degrees, and may have minutes and seconds.');
  // Marks, where given, must run degrees → minutes → seconds in place.
  if (ns.some((n, i) => n.unit !== '' && UNIT_ORDER.indexOf(n.unit) !== i)) {
    return fail('badly-formed', 'Write degrees, then minutes, then seconds, e.g. 42°07\'24.2"N.');
  }
  // Only the last figure may carry decimals, and only the degrees a sign.
  if (ns.slice(0, -1).some((n) => n.text.includes('.')) || ns.slice(1).some((n) => /^[+-]/.test(n.text))) {
    return fail('badly-formed', 'Only the last figure of a coordinate may have decimals, and only the degrees a minus sign.');
  }
  const [d, m = null, s = null] = ns;
  if (m && m.value >= 60) return fail('minutes-out-of-range', `Minutes run from 0 to 59.999…; ${m.text} is too large.`);
  if (s && s.value >= 60) return fail('seconds-out-of-range', `Seconds run from 0 to 59.999…; ${s.text} is too large.`);
  const negative = d.text.startsWith('-');
  if (negative && part.hemisphere) return fail('sign-and-hemisphere', `Give ${d.text} either a minus sign or a hemisphere letter, not both.`);
  const size = Math.abs(d.value) + (m?.value ?? 0) / 60 + (s?.value ?? 0) / 3600;
  const south = part.hemisphere === 'S' || part.hemisphere === 'W';
  return { ok: true, degrees: negative || south ? -size : size };
}

const isLatitude = (h: Part['hemisphere']) => h === 'N' || h === 'S';
const isLongitude = (h: Part['hemisphere']) => h === 'E' || h === 'W';

/** Reads typed coordinates; see the file's opening comment for the forms understood. */
export function parseCoordinates(input: string): CoordinateParse {
  const text = normalise(input);
  const tokens = tokenise(text);
  const numberCount = tokens?.filter((t) => t.kind === 'number').length ?? 0;
  const looksLikeCoordinates = tokens !== null && numberCount > 0 && !tokens.some((t) => t.kind === 'word');
  // A lone plain number is more likely a postcode or a house number than half a position.
  const lonePlainNumber = numberCount === 1 && tokens!.every((t) => t.kind !== 'hemisphere' && (t.kind !== 'number' || t.unit === ''));
  if (!looksLikeCoordinates || lonePlainNumber) return fail('not-coordinates', 'This does not read as coordinates.');
  if (numberCount > 6) return fail('too-many-numbers', 'Too many figures: give a latitude and a longitude, each as degrees with minutes and seconds if you like.');
  const parts = splitParts(tokens!);
  if (!parts) return fail('badly-formed', 'These coordinates could not be read; try "42.1234, -93.5678" or 42°07\'24.2"N 93°34\'04.1"W.');
  if (parts.length === 1) return fail('one-number', 'Give both a latitude and a longitude.');
  if (parts.length !== 2) return fail('badly-formed', 'Give one latitude and one longitude.');

  const [a, b] = parts;
  if (isLatitude(a.hemisphere) && isLatitude(b.hemisphere)) return fail('two-latitudes', 'Both figures are marked N or S; one must be E or W.');
  if (isLongitude(a.hemisphere) && isLongitude(b.hemisphere)) return fail('two-longitudes', 'Both figures are marked E or W; one must be N or S.');
  const swap = isLongitude(a.hemisphere) || isLatitude(b.hemisphere);
  const [latPart, lngPart] = swap ? [b, a] : [a, b];

  const lat = partDegrees(latPart);
  if (!lat.ok) return lat;
  const lng = partDegrees(lngPart);
  if (!lng.ok) return lng;
  if (Math.abs(lat.degrees) > 90) return fail('latitude-out-of-range', `Latitude runs from -90 to 90 degrees; ${Number(lat.degrees.toFixed(6))} is outside.`);
  if (Math.abs(lng.degrees) > 180) return fail('longitude-out-of-range', `Longitude runs from -180 to 180 degrees; ${Number(lng.degrees.toFixed(6))} is outside.`);
  return { ok: true, position: [lng.degrees, lat.degrees] };
}
