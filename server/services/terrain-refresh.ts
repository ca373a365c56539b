// A boundary changed: queue a terrain run when the farm has an elevation model, so the
// field's figures follow its new shape.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { JobQueue } from './jobs/job-queue';

export async function refreshTerrainIfAny(deps: { sequelize: Sequelize; jobs?: JobQueue }, farmId: number, userId: number): Promise<string | null> {
  if (!deps.jobs) return null;
  const [row] = await deps.sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM elevation_models WHERE farm_id = :farmId`, {
    replacements: { farmId },
    type: QueryTypes.SELECT,
  });
  return row.n > 0 ? deps.jobs.enqueue('terrain', farmId, userId, { reason: 'boundary changed' }) : null;
}
