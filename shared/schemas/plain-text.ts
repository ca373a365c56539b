import { z } from 'zod';

// Control characters (NUL, tabs, line breaks, …) have no place in a name or label.
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f]/;

/** A one-line name: trimmed, 1..max characters, no control characters; messages name the field. */
export const plainText = (field: string, max: number, emptyMessage = `${field} must not be empty`) =>
  z
    .string({ error: `${field} must be text` })
    .trim()
    .min(1, emptyMessage)
    .max(max, `${field} must be at most ${max} characters`)
    .refine((s) => !CONTROL.test(s), `${field} must not contain control characters`);
