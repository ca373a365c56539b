// Result types of boundary-file parsing (POST /api/farms/:farmId/fields/import).
import type { MultiPolygon, Polygon } from 'geojson';
import type { ImportWarning } from '../../../shared/schemas/field-import';

export type ImportFormat = 'geojson' | 'shapefile' | 'kml';

/** A feature that became a field boundary (shape-checked; topology is PostGIS's job later). */
export type ParsedBoundary = {
  /** 1-based position of the feature in the file, the number used in messages. */
  index: number;
  name: string | null;
  geometry: Polygon | MultiPolygon;
  /** Things changed on the way in that the user may want to know (parts left out). */
  warnings?: string[];
  /** The same things as typed values, for the preview. */
  notes: ImportWarning[];
  /** The feature's attributes as found in the file. */
  properties: Record<string, unknown> | null;
};

/** A feature that did not, with the reason for a person ("feature 3: a LineString is ..."). */
export type RejectedFeature = { index: number; rejected: string; properties: Record<string, unknown> | null };

/**
 * One input feature, in file order. `index` is 1-based and is the number used in messages;
 * in a zip of several shapefile layers it keeps counting across layers.
 */
export type ParsedItem = ParsedBoundary | RejectedFeature;

/** A whole-file failure, shaped like the API's error body plus its HTTP status. */
export type ImportFailure = { ok: false; status: 400 | 413 | 415 | 422; error: string; message: string };

export type ParseResult =
  | {
      ok: true;
      format: ImportFormat;
      items: ParsedItem[];
      /** File-level notes, e.g. a coordinate system that had to be assumed. */
      warnings?: string[];
    }
  | ImportFailure;

/** A feature as a reader found it, before its geometry is checked. */
export type RawFeature = {
  geometry: unknown;
  properties: Record<string, unknown> | null;
  /** Why the reader could not take this entry as a feature at all. */
  problem?: string;
  /** What the reader had to assume for this feature (a layer without .prj). */
  notes?: ImportWarning[];
};

/** What each format reader gives back. */
export type ReadResult = { ok: true; features: RawFeature[]; warnings: string[] } | ImportFailure;

export function failure(status: ImportFailure['status'], error: string, message: string): ImportFailure {
  return { ok: false, status, error, message };
}
