// The preview of a boundary file: every feature as it would be imported, with its area, its
// attributes, the attribute proposed for names and what the user should know. Stores nothing.
import type { Sequelize } from 'sequelize';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import type { ImportPreview, PreviewFeature } from '../../shared/schemas/field-import';
import { M2_PER_HA } from '../../shared/erosion/units';
import { HttpError } from '../lib/http-error';
import { attributeKeys, plainAttributes } from './imports/feature-attributes';
import { parseBoundaryFile, type BoundaryFileInput, type ParsedItem } from './imports/parse-boundaries';
import { proposeNameAttribute } from './imports/pick-name';
import { assessOutline } from './import-outline';

async function previewItem(sequelize: Sequelize, farmId: number, item: ParsedItem): Promise<PreviewFeature> {
  const attributes = plainAttributes(item.properties);
  const proposedNameAttribute = proposeNameAttribute(Object.keys(attributes), [item.properties]);
  const base = { index: item.index, attributes, proposedNameAttribute };
  if ('rejected' in item) return { ...base, geometry: null, original: null, areaHa: null, warnings: [], problem: item.rejected };
  const assessed = await assessOutline(sequelize, farmId, item.geometry as AreaGeometry);
  if (!assessed.ok) {
    return { ...base, geometry: null, original: item.geometry as AreaGeometry, areaHa: null, warnings: item.notes, problem: assessed.problem };
  }
  return {
    ...base,
    geometry: assessed.geometry,
    original: assessed.original,
    areaHa: assessed.areaM2 / M2_PER_HA,
    warnings: [...item.notes, ...assessed.warnings],
    problem: null,
  };
}

export async function previewImport(sequelize: Sequelize, farmId: number, file: BoundaryFileInput): Promise<ImportPreview> {
  const parsed = await parseBoundaryFile(file);
  if (!parsed.ok) throw new HttpError(parsed.status, parsed.error, parsed.message);
  const features: PreviewFeature[] = [];
  // One after the other: each feature is two short queries, and a file may hold thousands.
  for (const item of parsed.items) features.push(await previewItem(sequelize, farmId, item));
  const rows = parsed.items.map((i) => i.properties);
  const keys = attributeKeys(rows);
  return { format: parsed.format, features, attributeKeys: keys, proposedNameAttribute: proposeNameAttribute(keys, rows) };
}
