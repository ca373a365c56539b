// Payloads of the fields API (the public API contract in DEVELOPERS.md). Shared by the client forms and
// the server's validate() middleware.
import { z } from 'zod';
import { AreaGeometry } from './geojson';
import { plainText } from './plain-text';
import type { ImportRejection } from './field-import';

export const FieldName = plainText('name', 120);

/** POST /api/farms/:farmId/fields: a GeoJSON Feature. */
export const FieldCreate = z.object({
  type: z.literal('Feature', { error: 'body must be a GeoJSON Feature' }),
  geometry: AreaGeometry,
  properties: z
    .object({
      name: FieldName.optional(),
      ownerMembershipId: z.number().int().positive().nullable().optional(),
    })
    .passthrough()
    .nullable()
    .optional(),
});
export type FieldCreate = z.infer<typeof FieldCreate>;

/** PATCH /api/fields/:fieldId: any of name, geometry, owner; always the version read. */
export const FieldUpdate = z.object({
  version: z.number().int().nonnegative('version must be the number you read'),
  name: FieldName.optional(),
  geometry: AreaGeometry.optional(),
  ownerMembershipId: z.number().int().positive().nullable().optional(),
});
export type FieldUpdate = z.infer<typeof FieldUpdate>;

/** What the server says about a field beside its geometry. */
export type FieldProperties = {
  name: string;
  areaHa: number;
  perimeterM: number;
  centroid: [number, number];
  version: number;
  ownerMembershipId: number | null;
  farmId: number;
  /** Other fields of the farm this one overlaps, with the overlap's area. */
  overlaps: { fieldId: number; name: string; areaHa: number }[];
  updatedAt: string;
};
export type FieldFeature = {
  type: 'Feature';
  id: number;
  geometry: AreaGeometry;
  properties: FieldProperties;
};
export type FieldCollection = { type: 'FeatureCollection'; features: FieldFeature[] };

/** POST /api/farms/:farmId/fields/import answer. */
export type ImportResult = { created: FieldFeature[]; rejected: ImportRejection[] };
