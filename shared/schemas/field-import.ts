// Importing field outlines from a file in two steps: a preview that stores nothing
// (POST /api/farms/:farmId/fields/import/preview) and the import itself with the user's
// choices (POST /api/farms/:farmId/fields/import, multipart part `options` as JSON text).
import { z } from 'zod';
import type { AreaGeometry } from './geojson';

/** The choices made in the preview. Every member is optional; none given keeps the plain import. */
export const ImportOptions = z
  .object({
    /** The attribute each feature's name is read from; null for default names ("Field 4"). */
    nameAttribute: z.string().min(1, 'nameAttribute must name an attribute').max(200).nullable().optional(),
    /** 1-based feature numbers to import, as the preview numbers them; absent = all of them. */
    indexes: z
      .array(z.number().int('indexes must be whole numbers').positive('indexes start at 1'))
      .max(5000)
      .optional(),
    /** Store the repaired outline of a feature whose own outline is not a valid shape. */
    acceptRepaired: z.boolean().optional(),
    /** Store features that are the same as a field already on the farm (skipped otherwise). */
    allowDuplicates: z.boolean().optional(),
  })
  .strict();
export type ImportOptions = z.infer<typeof ImportOptions>;

/** The multipart text part `options`: JSON text of ImportOptions. */
export const ImportOptionsPart = z.string().transform((text, ctx): unknown => {
  try {
    return JSON.parse(text);
  } catch {
    ctx.addIssue({ code: 'custom', message: 'options must be JSON text' });
    return z.NEVER;
  }
}).pipe(ImportOptions);

/** The multipart body beside the file. */
export const ImportBody = z.object({ options: ImportOptionsPart.optional() });
export type ImportBody = z.infer<typeof ImportBody>;

/** Something the user should know about one feature before importing it, as a typed value. */
export type ImportWarning =
  | { kind: 'no_prj_assumed_wgs84'; layer: string }
  | { kind: 'repaired'; reason: string }
  | { kind: 'parts_left_out'; detail: string }
  | { kind: 'overlaps_field'; fieldId: number; name: string; overlapHa: number }
  | { kind: 'same_as_field'; fieldId: number; name: string };

/** One feature of the file as the preview sees it. */
export type PreviewFeature = {
  /** 1-based position in the file; the number ImportOptions.indexes uses. */
  index: number;
  /** The outline that would be stored (the repaired one when the original is not valid); null when none can be. */
  geometry: AreaGeometry | null;
  /** The outline as found in the file, when it differs from `geometry` (it was repaired). */
  original: AreaGeometry | null;
  /** Area of `geometry` on the WGS84 ellipsoid. */
  areaHa: number | null;
  attributes: Record<string, string | number | boolean | null>;
  /** The attribute proposed for this feature's name, or null when none looks like one. */
  proposedNameAttribute: string | null;
  warnings: ImportWarning[];
  /** Why this feature cannot become a field at all (a line, an area out of range); null when it can. */
  problem: string | null;
};

export type ImportPreview = {
  format: 'geojson' | 'shapefile' | 'kml';
  features: PreviewFeature[];
  /** Every attribute key found, in first-seen order. */
  attributeKeys: string[];
  /** The attribute proposed for all names, or null. */
  proposedNameAttribute: string | null;
};

/** POST /api/farms/:farmId/fields/import answer's rejections; `kind` says which are duplicates. */
export type ImportRejection = { index: number; reason: string; kind?: 'same_as_field' };
