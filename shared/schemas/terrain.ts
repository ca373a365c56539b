// Slope classes for a farm's per-field slope shares. Survey areas choose their own class limits
// within ranges (USDA Soil Survey Manual, Handbook 18, ch. 3), so a farm may set its own list:
// contiguous and increasing, the last class open-ended (maxPct null) or closed.
import { z } from 'zod';
import { plainText } from './plain-text';
import { SLOPE_CLASSES_MAX } from '../limits';

export const SlopeClass = z.object({
  name: plainText('name', 60),
  // JSON's 1e999 reads as Infinity: refused as not finite rather than taken as "no limit".
  minPct: z.number({ error: 'must be a finite number >= 0' }).min(0, 'must be a finite number >= 0'),
  maxPct: z
    .number({ error: 'must be a finite number greater than minPct, or null for no upper limit' })
    .nullish()
    .transform((v) => v ?? null),
});
export type SlopeClass = z.infer<typeof SlopeClass>;

const NON_EMPTY_LIST = 'must be a non-empty list';

export const SlopeClassList = z
  .array(SlopeClass, { error: NON_EMPTY_LIST })
  .min(1, NON_EMPTY_LIST)
  .max(SLOPE_CLASSES_MAX, `may hold at most ${SLOPE_CLASSES_MAX} classes`)
  .superRefine((classes, ctx) => {
    classes.forEach((c, i) => {
      if (c.maxPct !== null && !(c.maxPct > c.minPct)) ctx.addIssue({ code: 'custom', path: [i, 'maxPct'], message: 'must be greater than minPct or null' });
      const previous = classes[i - 1];
      if (previous && previous.maxPct !== c.minPct) ctx.addIssue({ code: 'custom', path: [i, 'minPct'], message: "must equal the previous class's maxPct" });
    });
  });

/** PUT /farms/:farmId/slope-classes: the farm's own classes, or null for the defaults; a bare list is read as { classes }. */
export const SlopeClassesUpdate = z.preprocess(
  (body) => (Array.isArray(body) ? { classes: body } : body),
  z.object({ classes: SlopeClassList.nullable() }),
);
export type SlopeClassesUpdate = z.infer<typeof SlopeClassesUpdate>;
