// Fields as the API's GeoJSON Features: areas in hectares, perimeter to the centimetre and the
// centroid to 1e-7° (~1 cm). Pure: rows in, API shapes out.
import type { FieldCollection, FieldFeature } from '../../shared/schemas/field';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import type { FieldFeatureRow } from '../models/field.queries';
import { M2_PER_HA } from '../../shared/erosion/units';

const round = (x: number, digits: number) => Number(x.toFixed(digits));

export function presentField(r: FieldFeatureRow): FieldFeature {
  const c = JSON.parse(r.centroidJson) as { coordinates: [number, number] };
  return {
    type: 'Feature',
    id: r.id,
    geometry: JSON.parse(r.geometryJson) as AreaGeometry,
    properties: {
      name: r.name,
      areaHa: r.areaM2 / M2_PER_HA,
      perimeterM: round(r.perimeterM, 2),
      centroid: [round(c.coordinates[0], 7), round(c.coordinates[1], 7)],
      version: r.version,
      ownerMembershipId: r.ownerMembershipId,
      farmId: r.farmId,
      overlaps: r.overlaps.map((o) => ({ fieldId: o.fieldId, name: o.name, areaHa: o.areaM2 / M2_PER_HA })),
      updatedAt: new Date(r.updatedAt).toISOString(),
    },
  };
}

export function presentFieldCollection(features: FieldFeature[]): FieldCollection {
  return { type: 'FeatureCollection', features };
}
