// The password rules, shared by the forms and the API. NIST SP 800-63B §5.1.1.2 asks for a minimum
// length, a check against commonly used passwords and refusing repetitive characters, and no
// composition rules; bcrypt (Provos & Mazières 1999) reads only the first 72 bytes of a password.
import { z } from 'zod';
import commonJson from '../../data/security/common-passwords.json';

export const PASSWORD_MIN_CHARS = 10;
/** bcrypt's input limit: bytes past it would be ignored without a word, so they are refused. */
export const PASSWORD_MAX_BYTES = 72;
/** Fewer different characters than this ("aaaaaaaaaa", "abababab12") is a repetition, not a password. */
export const PASSWORD_MIN_DISTINCT_CHARS = 4;

const COMMON = new Set(commonJson.passwords);
const utf8Bytes = (s: string) => new TextEncoder().encode(s).length;

/** Why a new password is refused, in plain words, or null when it is fine. */
export function passwordProblem(password: string): string | null {
  if ([...password].length < PASSWORD_MIN_CHARS) return `password must be at least ${PASSWORD_MIN_CHARS} characters`;
  if (utf8Bytes(password) > PASSWORD_MAX_BYTES) {
    return `password must be at most ${PASSWORD_MAX_BYTES} bytes (letters with accents and other scripts take 2–4 bytes each); longer passwords cannot be checked in full`;
  }
  if (new Set(password).size < PASSWORD_MIN_DISTINCT_CHARS) return `password must use at least ${PASSWORD_MIN_DISTINCT_CHARS} different characters`;
  if (COMMON.has(password.toLowerCase())) return 'password is one of the most common passwords; choose another';
  return null;
}

/** A password someone chooses (sign-up, reset, change, accepting an invitation as a new person). */
export const NewPassword = z.string({ error: 'password must be text' }).superRefine((password, ctx) => {
  const problem = passwordProblem(password);
  if (problem) ctx.addIssue({ code: 'custom', message: problem });
});

/** The rule in one line, for the hint under a new-password input. */
export const PASSWORD_HINT = `At least ${PASSWORD_MIN_CHARS} characters and not a well-known password; a few words make a good one.`;
