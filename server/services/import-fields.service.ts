// Stores the boundaries parsed from an uploaded file: each feature created or rejected with
// a reason, all in one transaction; a file with nothing valid stores nothing (422). The farm's
// terrain and assessments then follow the new boundaries.
import type { AreaGeometry } from '../../shared/schemas/geojson';
import type { ImportResult } from '../../shared/schemas/field';
import { HttpError, invalid } from '../lib/http-error';
import { parseBoundaryFile } from './imports/parse-boundaries';
import { insertField, listFieldFeatures } from './fields.service';
import { afterInputsChange, type InputChangeDeps } from './input-changes.service';

export async function importFields(
  deps: InputChangeDeps,
  actor: { userId: number },
  farmId: number,
  file: { buffer: Buffer; originalName: string; mimeType?: string },
): Promise<ImportResult> {
  const { sequelize } = deps;
  const parsed = await parseBoundaryFile(file);
  if (!parsed.ok) throw new HttpError(parsed.status, parsed.error, parsed.message);
  const rejected: ImportResult['rejected'] = [];
  const created = await sequelize.transaction(async (t) => {
    const ids: number[] = [];
    for (const item of parsed.items) {
      if ('rejected' in item) {
        rejected.push({ index: item.index, reason: item.rejected });
        continue;
      }
      // A savepoint per feature: one bad shape must not spoil the others.
      const sp = await sequelize
        .transaction({ transaction: t }, (inner) => insertField(sequelize, actor, farmId, { geometry: item.geometry as AreaGeometry, name: item.name }, inner))
        .catch((e: unknown) => e);
      if (typeof sp === 'number') ids.push(sp);
      else if (sp instanceof HttpError && sp.status === 422) rejected.push({ index: item.index, reason: `feature ${item.index}${item.name ? ` (${item.name})` : ''}: ${sp.message}` });
      else throw sp;
    }
    if (ids.length === 0) {
      throw invalid('nothing_imported', `Nothing in ${file.originalName || 'the file'} could be imported, so nothing was stored.${rejected[0] ? ` First problem: ${rejected[0].reason}` : ''}`, {
        rejected,
      });
    }
    await afterInputsChange(deps, { kind: 'boundary', farmId, fieldIds: ids }, actor, t);
    return listFieldFeatures(sequelize, { fieldIds: ids }, t);
  });
  return { created, rejected };
}
