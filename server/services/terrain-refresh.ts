// A boundary changed: queue a terrain run when the farm has an elevation model, so the
// field's figures follow its new shape.
import { ElevationModel } from '../models';
import type { JobQueue } from './jobs/job-queue';

export async function refreshTerrainIfAny(deps: { jobs?: JobQueue }, farmId: number, userId: number): Promise<string | null> {
  if (!deps.jobs) return null;
  return (await ElevationModel.farmHasAny(farmId)) ? deps.jobs.enqueue('terrain', farmId, userId, { reason: 'boundary changed' }) : null;
}
