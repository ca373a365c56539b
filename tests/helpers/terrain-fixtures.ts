// A synthetic elevation model with an analytic slope, field outlines on it, and an app that
// works terrain jobs, for the terrain tests.
import { inject } from 'vitest';
import { randomUUID } from 'node:crypto';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import proj4 from 'proj4';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { JobQueue, type JobHandlers } from '../../server/services/jobs/job-queue';
import { JOBS_PER_USER_MAX } from '../../shared/limits';
import { LocalFileStorage } from '../../server/services/storage/file-storage';
import { terrainJobHandler } from '../../server/services/farm-terrain.service';
import { writeGeoTiff } from '../../server/services/terrain';

const UTM15N = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';

/** A plane rising 5 m per 100 m to the east: slope exactly 5 % everywhere (analytic). */
export function planeDem(originX = 600000, originY = 4684400, size = 80, cell = 5): Buffer {
  const z = new Float32Array(size * size);
  for (let r = 0; r < size; r++) for (let c = 0; c < size; c++) z[r * size + c] = 100 + 0.05 * (c + 0.5) * cell;
  return Buffer.from(writeGeoTiff({ width: size, height: size, samples: z, originX, originY, cellSizeX: cell, cellSizeY: cell, epsg: 32615, nodata: -9999 }));
}

/** A square field with its south-west corner at (e0, n0) in UTM zone 15N, as a GeoJSON Feature in WGS84. */
export function utmSquare(e0: number, n0: number, side: number, name = 'Plane field') {
  const ring = [[e0, n0], [e0 + side, n0], [e0 + side, n0 + side], [e0, n0 + side], [e0, n0]].map((p) => proj4(UTM15N, 'WGS84', p));
  return { type: 'Feature', properties: { name }, geometry: { type: 'Polygon', coordinates: [ring] } };
}

/**
 * An app with file storage in its own folder and a job queue; with `worker`, this process works
 * the queue too (the real terrain handler, or the handlers given). Each file gets its own queue prefix unless one is given, because its files
 * live in its own storage folder and other files' workers must not take its jobs.
 */
export async function startTerrainApp(options: {
  worker: boolean | JobHandlers;
  queuePrefix?: string;
  dataDir?: string;
  env?: Record<string, string>;
  jobsPerUserMax?: number;
}) {
  const url = inject('databaseUrl');
  const sequelize = createSequelize(url);
  initModels(sequelize);
  const dataDir = options.dataDir ?? mkdtempSync(path.join(os.tmpdir(), 'fieldshed-terrain-'));
  const uploads = path.join(dataDir, 'uploads');
  mkdirSync(uploads, { recursive: true });
  const storage = new LocalFileStorage(uploads);
  const handlers = options.worker === true ? { terrain: terrainJobHandler({ sequelize, storage }) } : options.worker || undefined;
  const queuePrefix = options.queuePrefix ?? `t${randomUUID().slice(0, 8)}-`;
  const jobs = await JobQueue.start(url, handlers, queuePrefix, {}, { jobsPerUserMax: options.jobsPerUserMax ?? JOBS_PER_USER_MAX });
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: `terrain-${randomUUID()}`, ...options.env });
  const app = createApp({ sequelize, config, storage, jobs, clientDir: '/nonexistent' });
  const close = async () => {
    await jobs.stop();
    await sequelize.close();
    rmSync(dataDir, { recursive: true, force: true });
  };
  return { app, sequelize, jobs, queuePrefix, uploads, dataDir, close };
}
