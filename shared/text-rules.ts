// The one check for text people type: names, labels, notes. Refused, each with its own message:
// control characters (NUL and the like; PostgreSQL's jsonb cannot even store NUL), lone
// surrogates (half of a character: not valid Unicode, and not storable as UTF-8), and invisible
// format characters (Unicode general category Cf: zero-width spaces, byte-order marks, and the
// direction overrides and isolates that make a name read differently from how it is stored —
// Unicode TR #36, "Bidirectional text spoofing"). ZERO WIDTH NON-JOINER and JOINER (U+200C,
// U+200D) stay allowed: Persian and Indic scripts and emoji sequences need them (Unicode UAX #31).
// Plain functions with no zod, so a screen can clean text without loading the schema library.

// eslint-disable-next-line no-control-regex
const CONTROL_ONE_LINE = /[\u0000-\u001f\u007f-\u009f]/;
// eslint-disable-next-line no-control-regex
const CONTROL_MULTI_LINE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;
const LONE_SURROGATE = /\p{Cs}/u;
const INVISIBLE = /(?![\u200c\u200d])\p{Cf}/u;

/** What is wrong with a piece of typed text, in plain words after the field's name, or null. */
export function textProblem(field: string, s: string, multiLine = false): string | null {
  if ((multiLine ? CONTROL_MULTI_LINE : CONTROL_ONE_LINE).test(s)) return `${field} must not contain control characters`;
  if (LONE_SURROGATE.test(s)) return `${field} contains a broken character (half of a surrogate pair); type it again`;
  if (INVISIBLE.test(s)) return `${field} must not contain invisible or direction-changing characters (such as zero-width spaces or right-to-left overrides)`;
  return null;
}

// eslint-disable-next-line no-control-regex
const REFUSED_ANYWHERE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]|\p{Cs}|(?![\u200c\u200d])\p{Cf}/gu;

/**
 * Text read from an uploaded file (names, attribute values): the refused characters above are
 * dropped rather than the whole file refused — they are invisible, and files often carry them
 * (NUL padding in .dbf records, byte-order marks).
 */
export function cleanText(s: string): string {
  return s.replace(REFUSED_ANYWHERE, '');
}
