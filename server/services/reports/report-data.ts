// Everything the plan report prints, gathered before drawing starts: plain data (and the relief
// picture's bytes), so drawing needs no database and could run anywhere.
import type { MultiPolygon } from 'geojson';
import type { FieldAssessment } from '../../../shared/schemas/assessment';
import type { Units } from '../../../shared/schemas/auth';
import type { Plan } from '../../../shared/schemas/plans';

export type ReportField = {
  fieldId: number;
  name: string;
  areaHa: number;
  geometry: MultiPolygon;
  /** [lng, lat] of the field's centroid, where its name is written on the map. */
  labelAt: [number, number];
  /** The season's stored assessment (null only when none could be stored). */
  assessment: FieldAssessment | null;
};

/** The farm's shaded relief: a PNG drawn on a Web Mercator aligned frame, and its WGS84 bounds. */
export type ReliefPicture = { png: Buffer; bounds: { west: number; south: number; east: number; north: number } };

export type ReportData = {
  farmName: string;
  plan: Plan;
  /** The fields the reader may see: every field of the farm, or a landowner's own. */
  fields: ReportField[];
  relief: ReliefPicture | null;
  /** Who the report was made for, in their units. */
  reader: { name: string; units: Units; role: 'farmer' | 'advisor' | 'landowner' };
  /** When it was made, ISO date and time. */
  madeAt: string;
};
