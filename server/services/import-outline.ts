// What becomes of one imported outline on a farm: the shape that would be stored (repaired with
// ST_MakeValid when the file's own is not valid), its ellipsoidal area, and how it meets the
// farm's fields (the same field again, or an overlap). Reads only; the preview and the import share it.
import type { Sequelize, Transaction } from 'sequelize';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import type { ImportWarning } from '../../shared/schemas/field-import';
import { measureBoundary } from '../models/field.queries';
import { matchFarmFields } from '../models/field-match.queries';
import { matchWarnings } from './imports/field-matches';
import { areaRangeProblem } from './field-geometry';
import { M2_PER_HA } from '../../shared/erosion/units';

export type AssessedOutline =
  | {
      ok: true;
      /** The shape to store: the file's own, or its repair. */
      geometry: AreaGeometry;
      /** The file's own shape when `geometry` is its repair; null otherwise. */
      original: AreaGeometry | null;
      areaM2: number;
      /** `repaired` first when it was, then `same_as_field` / `overlaps_field` per field met. */
      warnings: ImportWarning[];
    }
  | { ok: false; problem: string };

export async function assessOutline(sequelize: Sequelize, farmId: number, outline: AreaGeometry, transaction?: Transaction): Promise<AssessedOutline> {
  const m = await measureBoundary(sequelize, outline, transaction);
  const warnings: ImportWarning[] = [];
  // measureBoundary's shapes are 2D MultiPolygons from PostGIS: AreaGeometry by construction.
  let geometry = m.geometry as AreaGeometry;
  let areaM2 = m.areaM2;
  let original: AreaGeometry | null = null;
  if (!m.valid) {
    if (!m.repaired || m.repairedAreaM2 === null) {
      return { ok: false, problem: `The outline is not a valid shape (${m.invalidReason}) and no repair of it leaves an area.` };
    }
    warnings.push({ kind: 'repaired', reason: m.invalidReason });
    original = geometry;
    geometry = m.repaired as AreaGeometry;
    areaM2 = m.repairedAreaM2;
  }
  const outOfRange = areaRangeProblem(areaM2 / M2_PER_HA);
  if (outOfRange) return { ok: false, problem: outOfRange };
  warnings.push(...matchWarnings(await matchFarmFields(sequelize, farmId, geometry, transaction)));
  return { ok: true, geometry, original, areaM2, warnings };
}
