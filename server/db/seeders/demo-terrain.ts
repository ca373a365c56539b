// Gives the demo farm its shipped elevation model (data/demo/dem.tif, made by
// scripts/make-demo-dem.ts) and queues the terrain run.
import { existsSync, readFileSync } from 'node:fs';
import type { Sequelize } from 'sequelize';
import { Farm, User } from '../../models';
import type { FileStorage } from '../../services/storage/file-storage';
import type { JobQueue } from '../../services/jobs/job-queue';
import { acceptDem } from '../../services/elevation-models.service';
import { DEMO_ACCOUNTS, DEMO_FARM_NAME } from './demo-farm';

export const DEMO_DEM_PATH = 'data/demo/dem.tif';

export async function seedDemoTerrain(deps: { sequelize: Sequelize; storage: FileStorage; jobs: JobQueue }): Promise<boolean> {
  if (!existsSync(DEMO_DEM_PATH)) return false;
  const farm = await Farm.findOne({ where: { name: DEMO_FARM_NAME } });
  const farmer = await User.findOne({ where: { email: DEMO_ACCOUNTS[0].email } });
  if (!farm || !farmer) return false;
  await acceptDem(deps, { userId: farmer.id }, farm.id, { buffer: readFileSync(DEMO_DEM_PATH), originalName: 'alder-run-dem.tif' });
  return true;
}
