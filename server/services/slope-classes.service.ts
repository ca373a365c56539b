// A farm's slope classes: its own list when set, else the default classes. A change re-draws
// the slope-class layer and the per-field shares through a new terrain run.
import { Farm } from '../models';
import { DEFAULT_SLOPE_CLASSES, parseSlopeClasses, type SlopeClass } from './terrain';
import { afterInputsChange, type InputChangeDeps } from './input-changes.service';

export type FarmSlopeClasses = { classes: ReadonlyArray<SlopeClass>; custom: boolean };

async function storedSlopeBreaks(farmId: number): Promise<unknown> {
  const farm = await Farm.findByPk(farmId, { attributes: ['id', 'slopeBreaks'] });
  return farm?.slopeBreaks ?? null;
}

/** Stored lists passed the same schema on the way in; one that no longer parses falls back to the defaults. */
function classesFrom(stored: unknown): ReadonlyArray<SlopeClass> {
  const parsed = stored == null ? null : parseSlopeClasses(stored);
  return parsed?.ok ? parsed.classes : DEFAULT_SLOPE_CLASSES;
}

/** The classes terrain runs use for the farm. */
export async function farmSlopeClasses(farmId: number): Promise<ReadonlyArray<SlopeClass>> {
  return classesFrom(await storedSlopeBreaks(farmId));
}

export async function slopeClassesOfFarm(farmId: number): Promise<FarmSlopeClasses> {
  const stored = await storedSlopeBreaks(farmId);
  return { classes: classesFrom(stored), custom: stored != null };
}

/** Sets the farm's own classes (null: back to the defaults) and re-runs terrain when it has a DEM. */
export async function setSlopeClasses(
  deps: InputChangeDeps,
  actor: { userId: number },
  farmId: number,
  classes: SlopeClass[] | null,
): Promise<FarmSlopeClasses & { jobId: string | null }> {
  const { terrainJobId } = await deps.sequelize.transaction(async (t) => {
    await Farm.update({ slopeBreaks: classes }, { where: { id: farmId }, transaction: t });
    return afterInputsChange(deps, { kind: 'slope-classes', farmId }, actor, t);
  });
  return { classes: classes ?? DEFAULT_SLOPE_CLASSES, custom: classes !== null, jobId: terrainJobId };
}
