// The PostGIS and jsonb work on soil map units that Sequelize cannot express: storing uploaded
// outlines (repaired with ST_MakeValid), intersecting units with fields on the WGS84 ellipsoid,
// and summarising the units' attribute values.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { MultiPolygon, Polygon } from 'geojson';
import { SOIL_MAP_MEANINGS, type SoilMapMeaning } from '../../shared/schemas/soils';
import type { StoredMapping } from './soil-map.model';

export type MapUnitOutline = { index: number; geometry: Polygon | MultiPolygon; properties: Record<string, unknown> };
/** What became of one uploaded outline: stored as it was, repaired, or left with no area. */
export type StoredOutline = { featureIndex: number; wasValid: boolean; stored: boolean };

/**
 * Stores the units of one soil map. Map units are not drawn by the person, so invalid rings are
 * repaired (ST_MakeValid, keeping the polygons) rather than refused; an outline with no area left
 * is not stored.
 */
export async function insertMapUnits(sequelize: Sequelize, soilMapId: number, units: MapUnitOutline[], transaction: Transaction): Promise<StoredOutline[]> {
  if (units.length === 0) return [];
  const rows = await sequelize.query<{ idx: number; was_valid: boolean; stored: boolean }>(
    `WITH src AS (
       SELECT (u->>'index')::int AS idx, COALESCE(u->'properties', '{}'::json)::jsonb AS props,
              ST_SetSRID(ST_GeomFromGeoJSON(u->>'geometry'), 4326) AS g
         FROM json_array_elements(CAST(:units AS json)) u),
     fixed AS (
       SELECT idx, props, ST_IsValid(g) AS was_valid,
              CASE WHEN ST_IsValid(g) THEN ST_Multi(g) ELSE ST_Multi(ST_CollectionExtract(ST_MakeValid(g), 3)) END AS g FROM src),
     ins AS (
       INSERT INTO soil_map_units (soil_map_id, feature_index, attributes, geom)
       SELECT :soilMapId, idx, props, g FROM fixed WHERE NOT ST_IsEmpty(g) RETURNING id)
     SELECT idx, was_valid, NOT ST_IsEmpty(g) AS stored FROM fixed ORDER BY idx`,
    {
      replacements: { soilMapId, units: JSON.stringify(units.map((u) => ({ index: u.index, properties: u.properties, geometry: JSON.stringify(u.geometry) }))) },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return rows.map((r) => ({ featureIndex: r.idx, wasValid: r.was_valid, stored: r.stored }));
}

/** One map unit under one field, with the map's mapping and the overlap's area. */
export type UnitUnderField = {
  fieldId: number;
  unitId: number;
  featureIndex: number;
  attributes: Record<string, unknown>;
  mapping: Partial<StoredMapping>;
  /** ST_Area of the intersection as geography: square metres on the WGS84 ellipsoid. */
  areaM2: number;
};

/** The units of each field's farm soil map that meet the field, in one query for any number of fields. */
export async function mapUnitsUnderFields(sequelize: Sequelize, fieldIds: number[], transaction?: Transaction): Promise<UnitUnderField[]> {
  if (fieldIds.length === 0) return [];
  const rows = await sequelize.query<{ field_id: number; id: number; feature_index: number; attributes: Record<string, unknown>; mapping: Partial<StoredMapping>; area_m2: number }>(
    `SELECT f.id AS field_id, u.id, u.feature_index, u.attributes, m.mapping, ST_Area(ST_Intersection(u.geom, f.geom)::geography) AS area_m2
       FROM fields f
       JOIN soil_maps m ON m.farm_id = f.farm_id
       JOIN soil_map_units u ON u.soil_map_id = m.id AND ST_Intersects(u.geom, f.geom)
      WHERE f.id IN (:fieldIds)
      ORDER BY f.id, u.feature_index, u.id`,
    { replacements: { fieldIds }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({ fieldId: r.field_id, unitId: r.id, featureIndex: r.feature_index, attributes: r.attributes, mapping: r.mapping, areaM2: r.area_m2 }));
}

/** Per attribute name of a map's units: how many distinct non-empty values, and the first few of them. */
export async function attributeValueStats(
  sequelize: Sequelize,
  soilMapId: number,
  sampleCount: number,
  transaction?: Transaction,
): Promise<{ name: string; distinctValues: number; sampleValues: string[] }[]> {
  const rows = await sequelize.query<{ name: string; distinct_values: number; sample_values: string[] }>(
    `SELECT e.key AS name, count(DISTINCT e.value)::int AS distinct_values, (array_agg(DISTINCT e.value))[1:${Math.trunc(sampleCount)}] AS sample_values
       FROM soil_map_units u, jsonb_each_text(u.attributes) AS e(key, value)
      WHERE u.soil_map_id = :soilMapId AND e.value IS NOT NULL AND e.value <> ''
      GROUP BY e.key`,
    { replacements: { soilMapId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({ name: r.name, distinctValues: r.distinct_values, sampleValues: r.sample_values }));
}

/** Each unit's values of the mapped attributes only, keyed by meaning (the units' other attributes stay in the database). */
export async function mappedAttributeValues(
  sequelize: Sequelize,
  soilMapId: number,
  attributeOf: Partial<Record<SoilMapMeaning, string>>,
  transaction?: Transaction,
): Promise<Partial<Record<SoilMapMeaning, unknown>>[]> {
  // Only the fixed meanings are written into the SQL; the attribute names are bound as values.
  const meanings = SOIL_MAP_MEANINGS.filter((k) => attributeOf[k] !== undefined);
  if (meanings.length === 0) return [];
  const rows = await sequelize.query<{ v: Partial<Record<SoilMapMeaning, unknown>> }>(
    `SELECT jsonb_build_object(${meanings.map((k) => `'${k}', u.attributes -> :${k}`).join(', ')}) AS v FROM soil_map_units u WHERE u.soil_map_id = :soilMapId`,
    { replacements: { soilMapId, ...attributeOf }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => r.v);
}
