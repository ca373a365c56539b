// PostGIS work on fields that Sequelize cannot express: a boundary's validity and measures, the
// fields with their geometry as plain GeoJSON (no Sequelize `crs` member), centroid and overlaps,
// and the extent of a farm's fields. Areas and perimeters are on the WGS84 ellipsoid, from the
// geography type (agrees with GeographicLib's geodesic polygon area to ~1e-11).
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { MultiPolygon } from 'geojson';
import type { AreaGeometry } from '../../shared/schemas/geojson';

export type BoundaryMeasure = {
  valid: boolean;
  /** PostGIS's reason when not valid, e.g. "Self-intersection[-93.6 42.0]". */
  invalidReason: string;
  /** ST_MakeValid's polygons, or null when nothing areal is left. */
  repaired: MultiPolygon | null;
  repairedAreaM2: number | null;
  /** The boundary as stored: 2D, MultiPolygon, 9 decimals. */
  geometry: MultiPolygon;
  areaM2: number;
  perimeterM: number;
};

/** Validity (ST_IsValid/ST_IsValidReason), a repaired shape (ST_MakeValid) and ellipsoidal measures. */
export async function measureBoundary(sequelize: Sequelize, geometry: AreaGeometry, transaction?: Transaction): Promise<BoundaryMeasure> {
  const [row] = await sequelize.query<{ valid: boolean; reason: string; repaired: string | null; repaired_area: number | null; area_m2: number; perimeter_m: number; geometry: string }>(
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
  return {
    valid: row.valid,
    invalidReason: row.reason,
    repaired: row.repaired ? (JSON.parse(row.repaired) as MultiPolygon) : null,
    repairedAreaM2: row.repaired_area,
    geometry: JSON.parse(row.geometry) as MultiPolygon,
    areaM2: row.area_m2,
    perimeterM: row.perimeter_m,
  };
}

export type FieldOverlapRow = { fieldId: number; name: string; areaM2: number };

export type FieldFeatureRow = {
  id: number;
  farmId: number;
  name: string;
  /** GeoJSON text from ST_AsGeoJSON (9 decimals). */
  geometryJson: string;
  /** GeoJSON Point text of ST_Centroid (9 decimals). */
  centroidJson: string;
  areaM2: number;
  perimeterM: number;
  ownerMembershipId: number | null;
  version: number;
  updatedAt: Date;
  overlaps: FieldOverlapRow[];
};

export type FieldFeatureFilter = {
  farmId?: number;
  fieldIds?: number[];
  ownerMembershipId?: number;
  /** A landowner's membership: overlaps name only fields they may see. */
  visibleToOwner?: number;
};

/**
 * Fields with geometry, centroid and the other fields of the same farm they overlap by more
 * than 1 m² (ellipsoidal area of the intersection), ordered by name then id.
 * The overlap areas are computed once per pair of fields whose interiors meet: neighbours
 * that only share an edge (most fields of a farm) cost one ST_Relate, not an ST_Intersection.
 */
export async function selectFieldFeatureRows(sequelize: Sequelize, where: FieldFeatureFilter, transaction?: Transaction): Promise<FieldFeatureRow[]> {
  if (where.fieldIds !== undefined && where.fieldIds.length === 0) return [];
  // Bind parameters, not replacements: this runs on every field list, and Sequelize's
  // replacement escaping costs more CPU than PostgreSQL spends on the query.
  const conds: string[] = [];
  const bind = { ...where, visibleToOwner: where.visibleToOwner ?? null };
  if (where.farmId !== undefined) conds.push('f.farm_id = $farmId');
  if (where.fieldIds !== undefined) conds.push('f.id = ANY($fieldIds::integer[])');
  if (where.ownerMembershipId !== undefined) conds.push('f.owner_membership_id = $ownerMembershipId');
  const rows = await sequelize.query<{
    id: number; farm_id: number; name: string; geometry: string; centroid: string; area_m2: number; perimeter_m: number;
    owner_membership_id: number | null; version: number; updated_at: Date; overlaps: FieldOverlapRow[] | null;
  }>(
    `SELECT f.id, f.farm_id, f.name, ST_AsGeoJSON(f.geom, 9) AS geometry, ST_AsGeoJSON(ST_Centroid(f.geom), 9) AS centroid,
            f.area_m2, f.perimeter_m, f.owner_membership_id, f.version, f.updated_at, ov.overlaps
       FROM fields f
       LEFT JOIN LATERAL (
             SELECT json_agg(json_build_object('fieldId', o.id, 'name', o.name, 'areaM2', a.area_m2) ORDER BY o.id) AS overlaps
               FROM fields o
              CROSS JOIN LATERAL (SELECT ST_Area(ST_Intersection(o.geom, f.geom)::geography) AS area_m2) a
              WHERE o.farm_id = f.farm_id AND o.id <> f.id AND o.geom && f.geom
                AND ST_Relate(o.geom, f.geom, 'T********')
                AND ($visibleToOwner::integer IS NULL OR o.owner_membership_id = $visibleToOwner::integer)
                AND a.area_m2 > 1) ov ON true
      WHERE ${conds.join(' AND ') || 'true'}
      ORDER BY f.name, f.id`,
    { bind, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    id: r.id,
    farmId: r.farm_id,
    name: r.name,
    geometryJson: r.geometry,
    centroidJson: r.centroid,
    areaM2: r.area_m2,
    perimeterM: r.perimeter_m,
    ownerMembershipId: r.owner_membership_id,
    version: r.version,
    updatedAt: r.updated_at,
    overlaps: r.overlaps ?? [],
  }));
}

/** [west, south, east, north] of a farm's fields (only one landowner's, when given), or null without fields. */
export async function farmFieldsExtent(sequelize: Sequelize, farmId: number, ownerMembershipId?: number): Promise<[number, number, number, number] | null> {
  const [box] = await sequelize.query<{ w: number | null; s: number; e: number; n: number }>(
    `SELECT ST_XMin(b) AS w, ST_YMin(b) AS s, ST_XMax(b) AS e, ST_YMax(b) AS n
       FROM (SELECT ST_Extent(geom)::geometry AS b FROM fields
              WHERE farm_id = :farmId ${ownerMembershipId !== undefined ? 'AND owner_membership_id = :ownerMembershipId' : ''}) x`,
    { replacements: { farmId, ownerMembershipId: ownerMembershipId ?? null }, type: QueryTypes.SELECT },
  );
  return box && box.w !== null ? [box.w, box.s, box.e, box.n] : null;
}

/** A field of the farm with the same outline (ST_Equals: the same point set, wherever its rings start), or null. */
export async function fieldWithSameOutline(sequelize: Sequelize, farmId: number, geometry: MultiPolygon, transaction: Transaction): Promise<{ id: number; name: string } | null> {
  const [row] = await sequelize.query<{ id: number; name: string }>(
    `SELECT id, name FROM fields
     WHERE farm_id = :farmId AND ST_Equals(geom, ST_SetSRID(ST_GeomFromGeoJSON(:gj), 4326))
     LIMIT 1`,
    { replacements: { farmId, gj: JSON.stringify(geometry) }, type: QueryTypes.SELECT, transaction },
  );
  return row ?? null;
}
