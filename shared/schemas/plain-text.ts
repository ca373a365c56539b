// Typed text as zod schemas, by the rules in shared/text-rules.ts (control, broken and invisible
// characters refused, each with its own message).
import { z } from 'zod';
import { textProblem } from '../text-rules';

/** The same check as a zod refinement, for text with other length rules (optional labels, attribute names). */
export const checkedText = (field: string, multiLine = false) => (s: string, ctx: z.RefinementCtx) => {
  const problem = textProblem(field, s, multiLine);
  if (problem) ctx.addIssue({ code: 'custom', message: problem });
};

/** A one-line name: trimmed, 1..max characters, none of the characters above; messages name the field. */
export const plainText = (field: string, max: number, emptyMessage = `${field} must not be empty`) =>
  z
    .string({ error: `${field} must be text` })
    .trim()
    .min(1, emptyMessage)
    .max(max, `${field} must be at most ${max} characters`)
    .superRefine(checkedText(field));

/** A note or comment: like plainText, but line breaks and tabs are allowed. */
export const longText = (field: string, max: number) =>
  z
    .string({ error: `${field} must be text` })
    .trim()
    .min(1, `${field} must not be empty`)
    .max(max, `${field} must be at most ${max} characters`)
    .superRefine(checkedText(field, true));
