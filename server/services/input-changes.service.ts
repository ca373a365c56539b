// The one place that decides what follows a change to an assessment's inputs: a new terrain
// run when the change alters what the terrain run computes and the farm has an elevation
// model, and fresh stored assessments for the fields it touches.
import type { Sequelize, Transaction } from 'sequelize';
import type { JobQueue } from './jobs/job-queue';
import { refreshTerrainIfAny } from './terrain-refresh';
import { refreshAssessments } from './assessments/refresh-assessments';

export type InputChange =
  /** Fields drawn, reshaped, imported or removed: flow paths and per-field figures change. */
  | { kind: 'boundary'; farmId: number; fieldIds?: number[] }
  /** A field renamed or given another owner: nothing the terrain run computes. */
  | { kind: 'field-details'; farmId: number; fieldIds: number[] }
  /** The typed slope length also caps the elevation model's flow length on that field. */
  | { kind: 'ground'; farmId: number; fieldIds: number[]; slopeLengthChanged: boolean }
  /** Slope classes change the terrain figures only, not the assessment's inputs. */
  | { kind: 'slope-classes'; farmId: number }
  /** A terrain run finished and wrote new per-field figures. */
  | { kind: 'terrain'; farmId: number }
  | { kind: 'soils'; farmId: number; fieldIds?: number[] }
  | { kind: 'cropping'; farmId: number; fieldIds: number[] }
  /** R, K, C or P typed for a field in place of the worked-out figure, or such a figure removed. */
  | { kind: 'overrides'; farmId: number; fieldIds: number[] }
  | { kind: 'climate'; farmId: number }
  | { kind: 'season'; farmId: number };

export type InputChangeDeps = { sequelize: Sequelize; jobs?: JobQueue };

function rerunsTerrain(change: InputChange): boolean {
  if (change.kind === 'boundary' || change.kind === 'slope-classes') return true;
  return change.kind === 'ground' && change.slopeLengthChanged;
}

function fieldsTouched(change: InputChange): number[] | undefined {
  return 'fieldIds' in change ? change.fieldIds : undefined;
}

/**
 * Runs what follows an input change; returns the terrain job's id when one was queued or is on
 * its way. A change that re-runs terrain needs the write's `transaction`: the run is queued in it.
 */
export async function afterInputsChange(
  deps: InputChangeDeps,
  change: InputChange,
  actor: { userId: number },
  transaction?: Transaction,
): Promise<{ terrainJobId: string | null }> {
  if (change.kind !== 'slope-classes') {
    await refreshAssessments(deps.sequelize, { farmId: change.farmId, fieldIds: fieldsTouched(change) }, transaction);
  }
  if (!rerunsTerrain(change)) return { terrainJobId: null };
  const terrainJobId = transaction
    ? await refreshTerrainIfAny(deps, change.farmId, actor.userId, transaction)
    : await deps.sequelize.transaction((t) => refreshTerrainIfAny(deps, change.farmId, actor.userId, t));
  return { terrainJobId };
}
