// Reads fields with their geometry as plain GeoJSON (no Sequelize `crs` member) and shapes
// them as the API's Feature.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { FieldFeature } from '../../shared/schemas/field';
import type { AreaGeometry } from '../../shared/schemas/geojson';

type Row = {
  id: number;
  farm_id: number;
  name: string;
  geometry: string;
  centroid: string;
  area_m2: number;
  perimeter_m: number;
  owner_membership_id: number | null;
  version: number;
  updated_at: Date;
  overlaps: { fieldId: number; name: string; areaM2: number }[] | null;
};

const round = (x: number, digits: number) => Number(x.toFixed(digits));

function present(r: Row): FieldFeature {
  const c = JSON.parse(r.centroid) as { coordinates: [number, number] };
  return {
    type: 'Feature',
    id: r.id,
    geometry: JSON.parse(r.geometry) as AreaGeometry,
    properties: {
      name: r.name,
      areaHa: r.area_m2 / 10_000,
      perimeterM: round(r.perimeter_m, 2),
      centroid: [round(c.coordinates[0], 7), round(c.coordinates[1], 7)],
      version: r.version,
      ownerMembershipId: r.owner_membership_id,
      farmId: r.farm_id,
      overlaps: (r.overlaps ?? []).map((o) => ({ fieldId: o.fieldId, name: o.name, areaHa: o.areaM2 / 10_000 })),
      updatedAt: new Date(r.updated_at).toISOString(),
    },
  };
}

/** Fields of a farm, optionally only some ids or only those owned by one membership. */
export async function queryFields(
  sequelize: Sequelize,
  where: {
    farmId?: number;
    fieldIds?: number[];
    ownerMembershipId?: number;
    /** A landowner's membership: overlaps name only fields they may see. */
    visibleToOwner?: number;
  },
  transaction?: Transaction,
): Promise<FieldFeature[]> {
  const conds: string[] = [];
  if (where.farmId !== undefined) conds.push('f.farm_id = :farmId');
  if (where.fieldIds !== undefined) conds.push('f.id IN (:fieldIds)');
  if (where.ownerMembershipId !== undefined) conds.push('f.owner_membership_id = :ownerMembershipId');
  if (where.fieldIds !== undefined && where.fieldIds.length === 0) return [];
  const rows = await sequelize.query<Row>(
    `SELECT f.id, f.farm_id, f.name, ST_AsGeoJSON(f.geom, 9) AS geometry, ST_AsGeoJSON(ST_Centroid(f.geom), 9) AS centroid,
            f.area_m2, f.perimeter_m, f.owner_membership_id, f.version, f.updated_at,
            (SELECT json_agg(json_build_object('fieldId', o.id, 'name', o.name,
                     'areaM2', ST_Area(ST_Intersection(o.geom, f.geom)::geography)) ORDER BY o.id)
               FROM fields o
              WHERE o.farm_id = f.farm_id AND o.id <> f.id AND ST_Intersects(o.geom, f.geom)
                AND (CAST(:visibleToOwner AS integer) IS NULL OR o.owner_membership_id = :visibleToOwner)
                AND ST_Area(ST_Intersection(o.geom, f.geom)::geography) > 1) AS overlaps
       FROM fields f
      WHERE ${conds.join(' AND ') || 'true'}
      ORDER BY f.name, f.id`,
    { replacements: { visibleToOwner: null, ...where }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map(present);
}
