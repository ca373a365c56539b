// The fields a member may see on their farm, with their outlines and areas (WGS84 ellipsoid):
// every field, or a landowner's own. For files and reports made from a farm.
import type { Sequelize } from 'sequelize';
import type { MultiPolygon, Point } from 'geojson';
import { selectFieldFeatureRows } from '../models/field.queries';

export type VisibleField = { fieldId: number; name: string; areaHa: number; geometry: MultiPolygon; centroid: [number, number] };

export async function visibleFields(sequelize: Sequelize, viewer: { farmId: number; membershipId: number; role: string }): Promise<VisibleField[]> {
  const owner = viewer.role === 'landowner' ? { ownerMembershipId: viewer.membershipId, visibleToOwner: viewer.membershipId } : {};
  const rows = await selectFieldFeatureRows(sequelize, { farmId: viewer.farmId, ...owner });
  return rows.map((r) => ({
    fieldId: r.id,
    name: r.name,
    areaHa: r.areaM2 / 10_000,
    geometry: JSON.parse(r.geometryJson) as MultiPolygon,
    centroid: (JSON.parse(r.centroidJson) as Point).coordinates as [number, number],
  }));
}
