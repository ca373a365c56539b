// How an outline about to be imported meets the fields already on a farm: for each field whose
// interior it touches, the shared area and the area of the symmetric difference, both on the
// WGS84 ellipsoid (geography type). The outline must be a valid shape (repair it first).
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { AreaGeometry } from '../../shared/schemas/geojson';

export type FieldMatchRow = {
  fieldId: number;
  name: string;
  /** Area of the existing field. */
  fieldAreaM2: number;
  /** Area of the outline being imported. */
  outlineAreaM2: number;
  /** Area both share. */
  overlapM2: number;
  /** Area in one but not the other. */
  symmetricDifferenceM2: number;
};

/** The farm's fields whose interiors meet `geometry`, ordered by field id. */
export async function matchFarmFields(sequelize: Sequelize, farmId: number, geometry: AreaGeometry, transaction?: Transaction): Promise<FieldMatchRow[]> {
  const rows = await sequelize.query<{ id: number; name: string; field_area: number; outline_area: number; overlap: number; sym_diff: number }>(
    `WITH g AS (SELECT ST_Multi(ST_Force2D(ST_SetSRID(ST_GeomFromGeoJSON($gj), 4326))) AS geom)
     SELECT f.id, f.name, f.area_m2 AS field_area, ST_Area(g.geom::geography) AS outline_area,
            ST_Area(ST_Intersection(f.geom, g.geom)::geography) AS overlap,
            ST_Area(ST_SymDifference(f.geom, g.geom)::geography) AS sym_diff
       FROM fields f, g
      WHERE f.farm_id = $farmId AND f.geom && g.geom AND ST_Relate(f.geom, g.geom, 'T********')
      ORDER BY f.id`,
    { bind: { gj: JSON.stringify(geometry), farmId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    fieldId: r.id,
    name: r.name,
    fieldAreaM2: r.field_area,
    outlineAreaM2: r.outline_area,
    overlapM2: r.overlap,
    symmetricDifferenceM2: r.sym_diff,
  }));
}
