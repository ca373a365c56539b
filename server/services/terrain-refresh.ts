// A boundary, a typed slope length or the slope classes changed: ask for a terrain run when the
// farm has an elevation model, inside the write's transaction, so the run is queued if and only
// if the write commits (and reads what it wrote).
import type { Transaction } from 'sequelize';
import { ElevationModel } from '../models';
import type { JobQueue } from './jobs/job-queue';

export async function refreshTerrainIfAny(deps: { jobs?: JobQueue }, farmId: number, userId: number, transaction: Transaction): Promise<string | null> {
  if (!deps.jobs || !(await ElevationModel.farmHasAny(farmId, transaction))) return null;
  return deps.jobs.requestRun('terrain', farmId, userId, { reason: 'inputs changed' }, transaction);
}
