// The soil map units under fields: PostGIS intersects the farm's map units with each field
// (areas on the WGS84 ellipsoid, ST_Area of the intersection as geography) and the mapped
// attributes are read per unit; then area-weighted K and T, the mix of soil groups, and the
// dominant texture and drainage class.
import type { Sequelize, Transaction } from 'sequelize';
import type { FieldSoilMapUnits } from '../../../shared/schemas/soils';
import { Field } from '../../models';
import { mapUnitsUnderFields, type UnitUnderField } from '../../models/soil-map-unit.queries';
import { EMPTY_MAPPING, unitValues } from './map-unit-values';

/** Slivers smaller than this (m²) where outlines only touch are left out. */
const MIN_AREA_M2 = 0.01;

/** One field's units (rows of mapUnitsUnderFields, in their order) with their share of the field and their read values. */
function unitsOfField(fieldAreaM2: number, rows: UnitUnderField[]): FieldSoilMapUnits {
  const units = rows
    .filter((r) => r.areaM2 > MIN_AREA_M2)
    .map((r) => {
      const mapping = { ...EMPTY_MAPPING, ...r.mapping };
      return { unitId: r.unitId, featureIndex: r.featureIndex, areaM2: r.areaM2, share: fieldAreaM2 > 0 ? r.areaM2 / fieldAreaM2 : 0, ...unitValues(r.attributes, mapping), attributes: r.attributes };
    });
  return { fieldAreaM2, mappedAreaM2: units.reduce((s, u) => s + u.areaM2, 0), units };
}

/** The soil map units under each of some fields, in one PostGIS query whatever their number. */
export async function soilMapUnitsOfFields(
  sequelize: Sequelize,
  fields: { id: number; areaM2: number }[],
  transaction?: Transaction,
): Promise<Map<number, FieldSoilMapUnits>> {
  const rows = await mapUnitsUnderFields(sequelize, fields.map((f) => f.id), transaction);
  const byField = new Map<number, UnitUnderField[]>();
  for (const r of rows) {
    const list = byField.get(r.fieldId);
    if (list) list.push(r);
    else byField.set(r.fieldId, [r]);
  }
  return new Map(fields.map((f) => [f.id, unitsOfField(f.areaM2, byField.get(f.id) ?? [])]));
}

/** GET /api/fields/:fieldId/soil-map-units: the units under one field. */
export async function fieldSoilMapUnits(sequelize: Sequelize, fieldId: number, transaction?: Transaction): Promise<FieldSoilMapUnits> {
  const field = await Field.findByPk(fieldId, { attributes: ['id', 'areaM2'], transaction });
  const fields = [{ id: fieldId, areaM2: field?.areaM2 ?? 0 }];
  return (await soilMapUnitsOfFields(sequelize, fields, transaction)).get(fieldId)!;
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
