// Stores the boundaries parsed from an uploaded file, in one transaction. A feature that is the
// same as a field already on the farm is skipped (reported as rejected) unless duplicates are
// allowed, so importing a file twice stores nothing new.
// Without options (scripts): every usable feature is stored, each bad one rejected with a reason,
// and a file with nothing usable stores nothing (422).
// With options (the preview's choices): only the chosen features, named from the chosen
// attribute, repaired outlines stored when accepted; all or nothing — if one chosen feature
// cannot be stored, nothing is. The farm's terrain and assessments then follow the new boundaries.
import type { Sequelize, Transaction } from 'sequelize';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import type { ImportResult } from '../../shared/schemas/field';
import type { ImportOptions, ImportRejection } from '../../shared/schemas/field-import';
import { badRequest, HttpError, invalid } from '../lib/http-error';
import { nameFromAttribute as nameFrom } from '../../shared/feature-name';
import { parseBoundaryFile, type ParsedBoundary, type ParsedItem } from './imports/parse-boundaries';
import { insertField, listFieldFeatures } from './fields.service';
import { assessOutline } from './import-outline';
import { afterInputsChange, type InputChangeDeps } from './input-changes.service';

type Actor = { userId: number };
type Step = { created: number } | { rejected: ImportRejection };

const label = (index: number, name: string | null) => `feature ${index}${name ? ` (${name})` : ''}`;

/** The chosen features; a number the file does not hold is a 400 naming it. */
function chosenItems(items: ParsedItem[], indexes: number[] | undefined): ParsedItem[] {
  if (indexes === undefined) return items;
  const missing = indexes.find((i) => !items.some((item) => item.index === i));
  if (missing !== undefined) {
    throw badRequest('invalid_input', `options.indexes: the file has no feature ${missing} (it holds ${items.length}).`);
  }
  const wanted = new Set(indexes);
  return items.filter((item) => wanted.has(item.index));
}

async function importOne(
  sequelize: Sequelize, actor: Actor, farmId: number, item: ParsedBoundary, options: ImportOptions, t: Transaction,
): Promise<Step> {
  const name = options.nameAttribute !== undefined ? nameFrom(item.properties, options.nameAttribute) : item.name;
  const assessed = await assessOutline(sequelize, farmId, item.geometry as AreaGeometry, t);
  if (assessed.ok && !options.allowDuplicates) {
    const same = assessed.warnings.find((w) => w.kind === 'same_as_field');
    if (same) {
      const reason = `${label(item.index, name)}: the same as the field "${same.name}" already on the farm, so it was not imported again`;
      return { rejected: { index: item.index, reason, kind: 'same_as_field' } };
    }
  }
  const repaired = assessed.ok && assessed.original !== null && options.acceptRepaired === true;
  const geometry = repaired && assessed.ok ? assessed.geometry : (item.geometry as AreaGeometry);
  return { created: await insertField(sequelize, actor, farmId, { geometry, name }, t, options.allowDuplicates === true) };
}

/** Every usable feature; a bad one is rejected inside its own savepoint so the others stay. */
async function importTolerant(sequelize: Sequelize, actor: Actor, farmId: number, items: ParsedItem[], t: Transaction): Promise<Step[]> {
  const steps: Step[] = [];
  for (const item of items) {
    if ('rejected' in item) {
      steps.push({ rejected: { index: item.index, reason: item.rejected } });
      continue;
    }
    const step = await sequelize
      .transaction({ transaction: t }, (inner) => importOne(sequelize, actor, farmId, item, {}, inner))
      .catch((e: unknown) => e);
    // 409: the same outline was stored a moment ago by another request.
    if (step instanceof HttpError && (step.status === 422 || step.status === 409)) {
      steps.push({ rejected: { index: item.index, reason: `${label(item.index, item.name)}: ${step.message}` } });
    } else if (step instanceof Error) throw step;
    else steps.push(step as Step);
  }
  return steps;
}

/** The chosen features or nothing: the first that cannot be stored stops the whole import. */
async function importStrict(
  sequelize: Sequelize, actor: Actor, farmId: number, items: ParsedItem[], options: ImportOptions, t: Transaction,
): Promise<Step[]> {
  const steps: Step[] = [];
  for (const item of items) {
    const what = label(item.index, 'rejected' in item ? null : nameFrom(item.properties, options.nameAttribute ?? null) ?? item.name);
    if ('rejected' in item) throw invalid('feature_not_importable', `${item.rejected} Nothing was stored.`, { index: item.index });
    try {
      steps.push(await importOne(sequelize, actor, farmId, item, options, t));
    } catch (e) {
      if (e instanceof HttpError && e.status === 422) {
        throw invalid('feature_not_importable', `${what[0].toUpperCase()}${what.slice(1)}: ${e.message} Nothing was stored.`, { index: item.index });
      }
      throw e;
    }
  }
  return steps;
}

export async function importFields(
  deps: InputChangeDeps,
  actor: Actor,
  farmId: number,
  file: { buffer: Buffer; originalName: string; mimeType?: string },
  options?: ImportOptions,
): Promise<ImportResult> {
  const { sequelize } = deps;
  const parsed = await parseBoundaryFile(file);
  if (!parsed.ok) throw new HttpError(parsed.status, parsed.error, parsed.message);
  const items = chosenItems(parsed.items, options?.indexes);
  const rejected: ImportRejection[] = [];
  const created = await sequelize.transaction(async (t) => {
    const steps = options
      ? await importStrict(sequelize, actor, farmId, items, options, t)
      : await importTolerant(sequelize, actor, farmId, items, t);
    const ids = steps.flatMap((s) => ('created' in s ? [s.created] : []));
    rejected.push(...steps.flatMap((s) => ('rejected' in s ? [s.rejected] : [])));
    // Nothing new because everything is already there is an answer, not a failure.
    const allKnown = rejected.length > 0 && rejected.every((r) => r.kind === 'same_as_field');
    if (ids.length === 0 && !allKnown) {
      throw invalid('nothing_imported', `Nothing in ${file.originalName || 'the file'} could be imported, so nothing was stored.${rejected[0] ? ` First problem: ${rejected[0].reason}` : ''}`, {
        rejected,
      });
    }
    if (ids.length > 0) await afterInputsChange(deps, { kind: 'boundary', farmId, fieldIds: ids }, actor, t);
    return listFieldFeatures(sequelize, { fieldIds: ids }, t);
  });
  return { created, rejected };
}
