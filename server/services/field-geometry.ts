// Topology and measures of a boundary, by PostGIS: validity (ST_IsValid with its reason), a
// repaired shape for the user to confirm (RECIPES.md), and WGS84-ellipsoid area and perimeter
// from the geography type (agrees with GeographicLib to ~1e-11, RECIPES.md "Areas").
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { MultiPolygon } from 'geojson';
import type { AreaGeometry } from '../../shared/schemas/geojson';

export const MIN_AREA_HA = 0.01;
export const MAX_AREA_HA = 10_000;

export type GeometryCheck =
  | { ok: true; geometry: MultiPolygon; areaM2: number; perimeterM: number }
  | { ok: false; code: 'invalid_geometry' | 'area_out_of_range'; message: string; repaired: MultiPolygon | null };

type Row = { valid: boolean; reason: string; repaired: string | null; repaired_area: number | null; area_m2: number; perimeter_m: number; geometry: string };

export async function checkGeometry(sequelize: Sequelize, geometry: AreaGeometry, transaction?: Transaction): Promise<GeometryCheck> {
  const [row] = await sequelize.query<Row>(
    `WITH g AS (SELECT ST_Multi(ST_Force2D(ST_SetSRID(ST_GeomFromGeoJSON(:gj), 4326))) AS geom),
          r AS (SELECT geom, ST_Multi(ST_CollectionExtract(ST_MakeValid(geom), 3)) AS fixed FROM g)
     SELECT ST_IsValid(geom) AS valid, ST_IsValidReason(geom) AS reason,
            CASE WHEN ST_IsEmpty(fixed) THEN NULL ELSE ST_AsGeoJSON(fixed, 9) END AS repaired,
            ST_Area(fixed::geography) AS repaired_area,
            ST_Area(geom::geography) AS area_m2, ST_Perimeter(geom::geography) AS perimeter_m,
            ST_AsGeoJSON(geom, 9) AS geometry
     FROM r`,
    { replacements: { gj: JSON.stringify(geometry) }, type: QueryTypes.SELECT, transaction },
  );
  if (!row.valid) {
    const repaired = row.repaired ? (JSON.parse(row.repaired) as MultiPolygon) : null;
    const offer = repaired
      ? ` A repaired shape of ${((row.repaired_area ?? 0) / 10_000).toFixed(2)} ha is offered: check it before you use it.`
      : '';
    return { ok: false, code: 'invalid_geometry', message: `The boundary is not a valid shape: ${row.reason}.${offer}`, repaired };
  }
  const areaHa = row.area_m2 / 10_000;
  if (areaHa < MIN_AREA_HA || areaHa > MAX_AREA_HA) {
    return {
      ok: false,
      code: 'area_out_of_range',
      message: `The field's area is ${areaHa < 1 ? areaHa.toFixed(4) : areaHa.toFixed(1)} ha; a field must be between ${MIN_AREA_HA} ha and ${MAX_AREA_HA.toLocaleString('en')} ha. Check the coordinates' order ([longitude, latitude]) and units.`,
      repaired: null,
    };
  }
  return { ok: true, geometry: JSON.parse(row.geometry) as MultiPolygon, areaM2: row.area_m2, perimeterM: row.perimeter_m };
}
