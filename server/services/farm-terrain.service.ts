// The terrain job: read the farm's newest elevation model and its fields, run the terrain in a
// worker thread (terrain/run-in-thread.ts: decode, fill, flow, slope, LS, map layers, each field's
// figures), then store the layers, the kept grids and every field's figures. The database and
// file storage are worked here, on the job's side, with the process's own connections; the
// thread only computes. Re-run when a boundary changes (no partial update).
import type { Sequelize } from 'sequelize';
import { ElevationModel, FieldGround, FieldTerrain, TerrainGrid, TerrainLayer } from '../models';
import type { FileStorage } from './storage/file-storage';
import { newKey } from './storage/file-storage';
import { runFarmTerrainInThread } from './terrain/run-in-thread';
import { MAX_TERRAIN_FIELDS } from './terrain/farm-terrain-run';
import { listFieldFeatures } from './fields.service';
import type { JobHandler } from './jobs/job-queue';
import { farmSlopeClasses } from './slope-classes.service';
import { afterInputsChange } from './input-changes.service';

/** Stage names of a run as a person reads them in the progress message. */
const STAGE_WORDS: Record<string, string> = {
  read: 'elevation model read',
  start: 'starting',
  fill: 'hollows filled',
  'flow-direction': 'flow directions',
  'flow-accumulation': 'upslope areas',
  'slope and relief': 'slope and shaded relief',
  ls: 'LS',
};

/** Buffer over a typed array's bytes, no copy. */
const bytesOf = (a: Uint8Array | Uint16Array | Float32Array): Buffer => Buffer.from(a.buffer, a.byteOffset, a.byteLength);

/**
 * The file's bytes as an ArrayBuffer of their own, which can be handed to the thread (transferred,
 * and read there in place). File storage reads a file into a Buffer that is its whole ArrayBuffer,
 * so this copies nothing; only a view into a larger buffer is copied.
 */
function ownArrayBuffer(b: Buffer): ArrayBuffer {
  if (b.byteOffset === 0 && b.byteLength === b.buffer.byteLength) return b.buffer as ArrayBuffer;
  return b.buffer.slice(b.byteOffset, b.byteOffset + b.byteLength) as ArrayBuffer;
}

export function terrainJobHandler(deps: { sequelize: Sequelize; storage: FileStorage }): JobHandler {
  return async (job, report) => {
    const { sequelize, storage } = deps;
    // The person who asked for the run is the actor of what follows it (fresh assessments).
    if (job.createdBy === null) throw new Error('The account that asked for this terrain run no longer exists; ask again from the farm.');
    const actor = { userId: job.createdBy };
    const model = await ElevationModel.newestOfFarm(job.farmId);
    if (!model) throw new Error('This farm has no elevation model yet.');
    await report(0.02, 'Reading the elevation model');
    const fields = await listFieldFeatures(sequelize, { farmId: job.farmId });
    if (fields.length > MAX_TERRAIN_FIELDS) throw new Error(`This farm has ${fields.length} fields; terrain can label at most ${MAX_TERRAIN_FIELDS}.`);
    const typedById = await FieldGround.typedSlopeLengthsM(job.farmId);
    const slopeClasses = await farmSlopeClasses(job.farmId);
    const demBytes = ownArrayBuffer(await storage.get(model.fileKey));

    let last = 0;
    const pending: Promise<void>[] = [];
    const out = await runFarmTerrainInThread(
      {
        demBytes,
        fields: fields.map((f) => ({ id: f.id, geometry: f.geometry, typedSlopeLengthM: typedById.get(f.id) ?? null })),
        slopeClasses: [...slopeClasses],
      },
      (fraction, stage) => {
        if (fraction - last >= 0.05 || fraction >= 0.7) {
          last = fraction;
          pending.push(report(fraction, fraction >= 0.85 ? 'Working out each field' : fraction >= 0.7 ? 'Drawing map layers' : `Terrain: ${STAGE_WORDS[stage] ?? stage}`));
        }
      },
    );
    await Promise.all(pending);

    const rendered = out.layers.map((l) => ({ ...l, key: newKey('layers', '.png') }));
    for (const r of rendered) await storage.put(r.key, bytesOf(r.png));
    // Keep LS and the field labels for pictures drawn on request (soil loss per cell).
    const lsKey = newKey('grids', '.f32');
    const labelsKey = newKey('grids', '.u16');
    await storage.put(lsKey, bytesOf(out.ls));
    await storage.put(labelsKey, bytesOf(out.labels));
    const fieldIdsByLabel = fields.map((f) => f.id);
    const versionById = new Map(fields.map((f) => [f.id, f.properties.version]));
    const figures = out.figures.map((f) => ({ fieldId: f.fieldId, elevationModelId: model.id, fieldVersion: versionById.get(f.fieldId)!, stats: f.stats }));

    await report(0.9, 'Storing the figures');
    const frame = out.frame;
    const oldFileKeys = [...(await TerrainLayer.ofFarm(job.farmId)), ...(await TerrainGrid.ofFarm(job.farmId))].map((r) => r.fileKey);
    await sequelize.transaction(async (transaction) => {
      await TerrainGrid.replaceForFarm(
        job.farmId,
        [
          { elevationModelId: model.id, kind: 'ls', fileKey: lsKey, frame, detail: {} },
          { elevationModelId: model.id, kind: 'field-labels', fileKey: labelsKey, frame, detail: { fieldIdsByLabel } },
        ],
        transaction,
      );
      await TerrainLayer.replaceForFarm(job.farmId, rendered.map((r) => ({ elevationModelId: model.id, kind: r.kind, fileKey: r.key, bounds: r.bounds, legend: r.legend })), transaction);
      await FieldTerrain.replaceForFarm(job.farmId, figures, transaction);
    });
    for (const key of oldFileKeys) await storage.remove(key);
    // The stored assessments take their LS from these figures: bring them up to date now.
    await report(0.95, 'Updating the assessments');
    await afterInputsChange(deps, { kind: 'terrain', farmId: job.farmId }, actor);
    return `Terrain ready: ${figures.length} of ${fields.length} fields covered by the elevation model.`;
  };
}
