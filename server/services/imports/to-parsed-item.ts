// One raw feature → a checked field boundary or a rejection naming the feature.
import { AreaGeometry } from '../../../shared/schemas/geojson';
import type { ParsedBoundary, ParsedItem, RawFeature } from './import-types';
import { describeIssue } from './describe-issue';
import { normalizeGeometry } from './normalize-geometry';
import { pickName } from './pick-name';

const PROJECTED_HINT =
  ' (the coordinates look like metres or feet, not longitude/latitude: export the file in WGS84, EPSG:4326)';

/** `index` is the feature's 1-based position in the file. */
export function toParsedItem(raw: RawFeature, index: number): ParsedItem {
  const name = pickName(raw.properties);
  const label = name ? `feature ${index} ("${name}")` : `feature ${index}`;
  const properties = raw.properties;
  if (raw.problem) return { index, rejected: `${label}: ${raw.problem}`, properties };
  const normalized = normalizeGeometry(raw.geometry);
  if (!normalized.ok) return { index, rejected: `${label}: ${normalized.reason}`, properties };
  const checked = AreaGeometry.safeParse(normalized.geometry);
  if (!checked.success) {
    const outOfRange = checked.error.issues.some((i) => /^(longitude|latitude) must be/.test(i.message));
    const hint = outOfRange ? PROJECTED_HINT : '';
    return { index, rejected: `${label}: ${describeIssue(normalized.geometry.type, checked.error)}${hint}`, properties };
  }
  const notes = [...(raw.notes ?? []), ...normalized.warnings.map((detail) => ({ kind: 'parts_left_out' as const, detail }))];
  const item: ParsedBoundary = { index, name, geometry: checked.data, notes, properties };
  if (normalized.warnings.length) item.warnings = normalized.warnings.map((w) => `${label}: ${w}`);
  return item;
}
