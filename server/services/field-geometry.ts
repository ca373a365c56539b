// Whether a boundary can be stored: a valid shape (else PostGIS's reason and a repaired shape for
// the user to confirm) of a plausible field's area on the WGS84 ellipsoid.
import type { Sequelize, Transaction } from 'sequelize';
import type { MultiPolygon } from 'geojson';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import { measureBoundary } from '../models/field.queries';
import { M2_PER_HA } from '../../shared/erosion/units';

export const MIN_AREA_HA = 0.01;
export const MAX_AREA_HA = 10_000;

export type GeometryCheck =
  | { ok: true; geometry: MultiPolygon; areaM2: number; perimeterM: number }
  | { ok: false; code: 'invalid_geometry' | 'area_out_of_range'; message: string; repaired: MultiPolygon | null };

/** Why a field of this area is not plausible, or null when it is. */
export function areaRangeProblem(areaHa: number): string | null {
  if (areaHa >= MIN_AREA_HA && areaHa <= MAX_AREA_HA) return null;
  return `The field's area is ${areaHa < 1 ? areaHa.toFixed(4) : areaHa.toFixed(1)} ha; a field must be between ${MIN_AREA_HA} ha and ${MAX_AREA_HA.toLocaleString('en')} ha. Check the coordinates' order ([longitude, latitude]) and units.`;
}

export async function checkGeometry(sequelize: Sequelize, geometry: AreaGeometry, transaction?: Transaction): Promise<GeometryCheck> {
  const m = await measureBoundary(sequelize, geometry, transaction);
  if (!m.valid) {
    const offer = m.repaired
      ? ` A repaired shape of ${((m.repairedAreaM2 ?? 0) / M2_PER_HA).toFixed(2)} ha is offered: check it before you use it.`
      : '';
    return { ok: false, code: 'invalid_geometry', message: `The boundary is not a valid shape: ${m.invalidReason}.${offer}`, repaired: m.repaired };
  }
  const outOfRange = areaRangeProblem(m.areaM2 / M2_PER_HA);
  if (outOfRange) return { ok: false, code: 'area_out_of_range', message: outOfRange, repaired: null };
  return { ok: true, geometry: m.geometry, areaM2: m.areaM2, perimeterM: m.perimeterM };
}
