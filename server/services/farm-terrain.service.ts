// The terrain job: run the pipeline on the farm's newest elevation model, render the map
// layers, and store every field's terrain figures. Re-run when a boundary changes (the
// whole pipeline takes ~1.7 s for 4 M cells, see docs/benchmarks.md, so no partial update).
// Field borders break overland flow for LS; where water gathers is drawn from unbroken flow.
// Field labels are 2 bytes per cell (Uint16, up to 65 535 fields), kept as such for the soil-loss map.
import type { Sequelize } from 'sequelize';
import { ElevationModel, FieldGround, FieldTerrain, TerrainGrid, TerrainLayer } from '../models';
import type { StoredTerrainStats } from '../models/field-terrain.model';
import type { FileStorage } from './storage/file-storage';
import { newKey } from './storage/file-storage';
import { readDem, runTerrain, renderLayer, reprojectBoundary, fieldTerrainStats, converterBetween, rasterisePolygon, LAYER_LABELS } from './terrain';
import type { BoundsWgs84, LayerKind, LegendEntry, RenderValues } from './terrain';
import { listFieldFeatures } from './fields.service';
import type { JobHandler } from './jobs/job-queue';
import { farmSlopeClasses } from './slope-classes.service';
import { afterInputsChange } from './input-changes.service';

/** Keep at most this many concentrated-flow points per field for the map. */
const MAX_FLOW_POINTS = 400;
/** Labels are Uint16 with 0 for "no field". */
const MAX_FIELDS = 65_535;

export function terrainJobHandler(deps: { sequelize: Sequelize; storage: FileStorage }): JobHandler {
  return async (job, report) => {
    const { sequelize, storage } = deps;
    // The person who asked for the run is the actor of what follows it (fresh assessments).
    if (job.createdBy === null) throw new Error('The account that asked for this terrain run no longer exists; ask again from the farm.');
    const actor = { userId: job.createdBy };
    const model = await ElevationModel.newestOfFarm(job.farmId);
    if (!model) throw new Error('This farm has no elevation model yet.');
    await report(0.02, 'Reading the elevation model');
    const read = await readDem(await storage.get(model.fileKey));
    if (!read.ok) throw new Error(`The elevation model cannot be read: ${read.reason}`);
    const dem = read.dem;
    const frame = { width: dem.width, height: dem.height, originX: dem.originX, originY: dem.originY, cellSizeX: dem.cellSizeX, cellSizeY: dem.cellSizeY, epsg: dem.epsg };
    // Each field's cells carry its label, so overland flow starts afresh at its border.
    const fields = await listFieldFeatures(sequelize, { farmId: job.farmId });
    if (fields.length > MAX_FIELDS) throw new Error(`This farm has ${fields.length} fields; terrain can label at most ${MAX_FIELDS}.`);
    const labels = new Uint16Array(dem.width * dem.height);
    const ringsByField = new Map<number, Array<Array<[number, number]>>>();
    fields.forEach((f, idx) => {
      const rings = reprojectBoundary(f.geometry, dem.epsg);
      if (!rings.ok) return;
      ringsByField.set(f.id, rings.rings);
      for (const cell of rasterisePolygon(rings.rings, frame)) labels[cell] = idx + 1;
    });
    // A slope length typed on the Ground tab (terraces, diversions, field roads) caps the flow length.
    const typedById = await FieldGround.typedSlopeLengthsM(job.farmId);
    const capByLabel = new Float64Array(fields.length + 1).fill(NaN);
    fields.forEach((f, idx) => (capByLabel[idx + 1] = typedById.get(f.id) ?? NaN));
    let last = 0;
    const pending: Promise<void>[] = [];
    const grids = runTerrain(dem, {
      flowBreakLabels: labels,
      maxSlopeLengthMByLabel: capByLabel,
      onProgress: (f, stage) => {
        if (f - last >= 0.05 || f === 1) {
          last = f;
          pending.push(report(0.05 + 0.6 * f, `Terrain: ${stage}`));
        }
      },
    });
    await Promise.all(pending);
    const slopeClasses = await farmSlopeClasses(job.farmId);

    await report(0.7, 'Drawing map layers');
    const layers: { kind: LayerKind; values: RenderValues | null }[] = [
      { kind: 'hillshade', values: grids.hillshade },
      { kind: 'slope-classes', values: grids.slopePct },
      { kind: 'ls', values: grids.ls },
      { kind: 'concentrated-flow', values: grids.contributingAreaM2 },
    ];
    const rendered: { kind: LayerKind; key: string; bounds: BoundsWgs84; legend: LegendEntry[] }[] = [];
    for (const l of layers) {
      if (!l.values) continue;
      const r = renderLayer({ kind: l.kind, grid: frame, values: l.values, slopeClasses });
      if (!r.ok) throw new Error(`Could not draw the ${LAYER_LABELS[l.kind]} layer: ${r.reason}`);
      const key = newKey('layers', '.png');
      await storage.put(key, r.png);
      rendered.push({ kind: l.kind, key, bounds: r.bounds, legend: r.legend });
    }

    // Keep LS and the field labels for pictures drawn on request (soil loss per cell).
    const lsKey = newKey('grids', '.f32');
    const labelsKey = newKey('grids', '.u16');
    await storage.put(lsKey, Buffer.from(grids.ls.buffer, grids.ls.byteOffset, grids.ls.byteLength));
    await storage.put(labelsKey, Buffer.from(labels.buffer, labels.byteOffset, labels.byteLength));
    const fieldIdsByLabel = fields.map((f) => f.id);

    await report(0.85, 'Working out each field');
    const toWgs = converterBetween(dem.epsg, 4326);
    const oldFileKeys = [...(await TerrainLayer.ofFarm(job.farmId)), ...(await TerrainGrid.ofFarm(job.farmId))].map((r) => r.fileKey);
    const figures = fields.flatMap((f) => {
      const rings = ringsByField.get(f.id);
      if (!rings) return [];
      const s = fieldTerrainStats({ rings, grid: frame, slopePct: grids.slopePct, ls: grids.ls, contributingAreaM2: grids.contributingAreaM2, slopeClasses });
      if (!s.ok) return [];
      const { cells: _cells, points, ...flow } = s.stats.concentratedFlow;
      const step = Math.max(1, Math.ceil(points.length / MAX_FLOW_POINTS));
      const pointsWgs84 = toWgs.ok ? points.filter((_, i) => i % step === 0).map((p) => toWgs.converter.forward(p) as [number, number]) : [];
      const stats: StoredTerrainStats = { ...s.stats, concentratedFlow: { ...flow, points: pointsWgs84 }, cellSizeM: dem.rowCellSizeXM[0], epsg: dem.epsg };
      return [{ fieldId: f.id, elevationModelId: model.id, fieldVersion: f.properties.version, stats }];
    });
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
