// The soil map units under one field: PostGIS intersects the farm's map units with the field
// (areas on the WGS84 ellipsoid, ST_Area of the intersection as geography) and the mapped
// attributes are read per unit; then area-weighted K and T, the mix of soil groups, and the
// dominant texture and drainage class.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { FieldSoilMapUnits } from '../../../shared/schemas/soils';
import { EMPTY_MAPPING, unitValues, type StoredMapping } from './map-unit-values';

/** Slivers smaller than this (m²) where outlines only touch are left out. */
const MIN_AREA_M2 = 0.01;

export async function fieldSoilMapUnits(sequelize: Sequelize, fieldId: number): Promise<FieldSoilMapUnits> {
  const rows = await sequelize.query<{ id: number; feature_index: number; attributes: Record<string, unknown>; mapping: Partial<StoredMapping>; area_m2: number; field_area_m2: number }>(
    `SELECT u.id, u.feature_index, u.attributes, m.mapping, ST_Area(ST_Intersection(u.geom, f.geom)::geography) AS area_m2, f.area_m2 AS field_area_m2
       FROM fields f
       JOIN soil_maps m ON m.farm_id = f.farm_id
       JOIN soil_map_units u ON u.soil_map_id = m.id AND ST_Intersects(u.geom, f.geom)
      WHERE f.id = :fieldId
      ORDER BY u.feature_index, u.id`,
    { replacements: { fieldId }, type: QueryTypes.SELECT },
  );
  let fieldAreaM2 = rows[0]?.field_area_m2;
  if (fieldAreaM2 === undefined) {
    const [f] = await sequelize.query<{ area_m2: number }>('SELECT area_m2 FROM fields WHERE id = :fieldId', { replacements: { fieldId }, type: QueryTypes.SELECT });
    fieldAreaM2 = f?.area_m2 ?? 0;
  }
  const units = rows
    .filter((r) => r.area_m2 > MIN_AREA_M2)
    .map((r) => {
      const mapping = { ...EMPTY_MAPPING, ...r.mapping };
      return { unitId: r.id, featureIndex: r.feature_index, areaM2: r.area_m2, share: fieldAreaM2 > 0 ? r.area_m2 / fieldAreaM2 : 0, ...unitValues(r.attributes, mapping), attributes: r.attributes };
    });
  return { fieldAreaM2, mappedAreaM2: units.reduce((s, u) => s + u.areaM2, 0), units };
}

export type MapAggregate = {
  kUs: number | null;
  kShareOfField: number;
  tTonPerAcYr: number | null;
  tShareOfField: number;
  hsgShares: { group: string; share: number }[];
  hsg: string | null;
  textureClass: string | null;
  drainageClass: string | null;
};

/** Σ value·area / Σ area over the units that have a value. */
function areaWeighted(units: { areaM2: number; v: number | null }[]): { mean: number | null; areaM2: number } {
  const known = units.filter((u) => u.v !== null);
  const areaM2 = known.reduce((s, u) => s + u.areaM2, 0);
  // area-weighted mean: Σ(vᵢ·aᵢ) / Σ aᵢ
  return { mean: areaM2 > 0 ? known.reduce((s, u) => s + (u.v as number) * u.areaM2, 0) / areaM2 : null, areaM2 };
}

/** Each value's share of the area that has a value, largest first. */
function shares(units: { areaM2: number; v: string | null }[]): { value: string; share: number }[] {
  const by = new Map<string, number>();
  for (const u of units) if (u.v !== null) by.set(u.v, (by.get(u.v) ?? 0) + u.areaM2);
  const total = [...by.values()].reduce((s, a) => s + a, 0);
  return [...by].map(([value, a]) => ({ value, share: a / total })).sort((a, b) => b.share - a.share || a.value.localeCompare(b.value));
}

export function aggregateMapUnits(m: FieldSoilMapUnits): MapAggregate {
  const k = areaWeighted(m.units.map((u) => ({ areaM2: u.areaM2, v: u.kUs })));
  const t = areaWeighted(m.units.map((u) => ({ areaM2: u.areaM2, v: u.tTonPerAcYr })));
  const hsg = shares(m.units.map((u) => ({ areaM2: u.areaM2, v: u.hsg })));
  const texture = shares(m.units.map((u) => ({ areaM2: u.areaM2, v: u.textureClass })));
  const drainage = shares(m.units.map((u) => ({ areaM2: u.areaM2, v: u.drainageClass })));
  const ofField = (a: number) => (m.fieldAreaM2 > 0 ? a / m.fieldAreaM2 : 0);
  return {
    kUs: k.mean,
    kShareOfField: ofField(k.areaM2),
    tTonPerAcYr: t.mean,
    tShareOfField: ofField(t.areaM2),
    hsgShares: hsg.map((h) => ({ group: h.value, share: h.share })),
    hsg: hsg[0]?.value ?? null,
    textureClass: texture[0]?.value ?? null,
    drainageClass: drainage[0]?.value ?? null,
  };
}
