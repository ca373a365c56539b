// A farm's soil map as the API's SoilMapInfo: the upload, each attribute name with a few of its
// values, the mapping of names to meanings, and how many units each mapped attribute was read for.
import type { SoilMapInfo } from '../../shared/schemas/soils';
import type { SoilMap } from '../models';
import type { StoredMapping } from '../models/soil-map.model';

export type SoilMapState = {
  map: SoilMap | null;
  unitCount: number;
  attributeStats: { name: string; distinctValues: number; sampleValues: string[] }[];
  mapping: StoredMapping;
  checks: SoilMapInfo['checks'];
};

export function presentSoilMap(s: SoilMapState): SoilMapInfo {
  if (!s.map) return { map: null, attributes: [], mapping: s.mapping, checks: {} };
  const byName = new Map(s.attributeStats.map((a) => [a.name, a]));
  return {
    map: { id: s.map.id, originalName: s.map.originalName, unitCount: s.unitCount, uploadedAt: s.map.createdAt.toISOString(), warnings: s.map.warnings },
    attributes: s.map.attributeNames.map((name) => ({
      name,
      sampleValues: byName.get(name)?.sampleValues ?? [],
      distinctValues: byName.get(name)?.distinctValues ?? 0,
    })),
    mapping: s.mapping,
    checks: s.checks,
  };
}

export function presentSoilMapUpload(r: { state: SoilMapState; rejected: { index: number; reason: string }[] }): SoilMapInfo & { rejected: { index: number; reason: string }[] } {
  return { ...presentSoilMap(r.state), rejected: r.rejected };
}
