// Starts a throwaway PostgreSQL/PostGIS cluster for the whole test run in the system temp
// folder (traversable by the postgres user wherever the checkout lives), migrates it, and
// removes it afterwards (RECIPES.md "Tests").
import { mkdtempSync, rmSync, chmodSync } from 'node:fs';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startLocalCluster, stopLocalCluster } from '../../server/db/local-cluster';
import { createSequelize } from '../../server/db/sequelize';
import { migrate } from '../../server/db/migrate';
import { JobQueue } from '../../server/services/jobs/job-queue';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });
}

export default async function setup(project: TestProject) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-test-pg-'));
  chmodSync(dir, 0o755);
  const port = await freePort();
  const { url } = await startLocalCluster({ dir, port, database: 'fieldshed_test', fast: true, log: () => undefined });
  const s = createSequelize(url);
  await migrate(s);
  // Create the job queue's own schema once, before test files start queues in parallel.
  const boss = await JobQueue.start(url);
  await boss.stop();
  await s.close();
  project.provide('databaseUrl', url);
  return async () => {
    await stopLocalCluster(dir);
    rmSync(dir, { recursive: true, force: true });
  };
}
