// The terrain job: run the pipeline on the farm's newest elevation model, render the map
// layers, and store every field's terrain figures. Re-run when a boundary changes (the
// whole pipeline takes ~1.7 s for 4 M cells, see docs/benchmarks.md, so no partial update).
// Field borders break overland flow for LS; where water gathers is drawn from unbroken flow.
// Field labels are 2 bytes per cell (Uint16, up to 65 535 fields), kept as such for the soil-loss map.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { FileStorage } from './storage/file-storage';
import { newKey } from './storage/file-storage';
import { readDem, runTerrain, renderLayer, reprojectBoundary, fieldTerrainStats, converterBetween, rasterisePolygon, DEFAULT_SLOPE_CLASSES, parseSlopeClasses } from './terrain';
import type { LayerKind, RenderValues, SlopeClass } from './terrain';
import { queryFields } from './field-presenter';
import type { JobHandler } from './jobs/job-queue';
import { refreshAssessments } from './assessments/refresh-assessments';

export const LAYER_LABELS: Record<LayerKind, string> = {
  hillshade: 'Shaded relief',
  'slope-classes': 'Slope classes',
  ls: 'Slope length and steepness (LS)',
  'soil-loss': 'Soil loss hotspots',
  'concentrated-flow': 'Where water gathers',
};

/** Keep at most this many concentrated-flow points per field for the map. */
const MAX_FLOW_POINTS = 400;
/** Labels are Uint16 with 0 for "no field". */
const MAX_FIELDS = 65_535;

export async function farmSlopeClasses(sequelize: Sequelize, farmId: number): Promise<ReadonlyArray<SlopeClass>> {
  const [row] = await sequelize.query<{ slope_breaks: unknown }>(`SELECT slope_breaks FROM farms WHERE id = :farmId`, { replacements: { farmId }, type: QueryTypes.SELECT });
  if (row?.slope_breaks) {
    const parsed = parseSlopeClasses(row.slope_breaks);
    if (parsed.ok) return parsed.classes;
  }
  return DEFAULT_SLOPE_CLASSES;
}

export function terrainJobHandler(deps: { sequelize: Sequelize; storage: FileStorage }): JobHandler {
  return async (job, report) => {
    const { sequelize, storage } = deps;
    const [model] = await sequelize.query<{ id: number; file_key: string }>(
      `SELECT id, file_key FROM elevation_models WHERE farm_id = :farmId ORDER BY id DESC LIMIT 1`,
      { replacements: { farmId: job.farmId }, type: QueryTypes.SELECT },
    );
    if (!model) throw new Error('This farm has no elevation model yet.');
    await report(0.02, 'Reading the elevation model');
    const read = await readDem(await storage.get(model.file_key));
    if (!read.ok) throw new Error(`The elevation model cannot be read: ${read.reason}`);
    const dem = read.dem;
    const frame = { width: dem.width, height: dem.height, originX: dem.originX, originY: dem.originY, cellSizeX: dem.cellSizeX, cellSizeY: dem.cellSizeY, epsg: dem.epsg };
    // Each field's cells carry its label, so overland flow starts afresh at its border.
    const fields = await queryFields(sequelize, { farmId: job.farmId });
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
    const typed = await sequelize.query<{ field_id: number; slope_length_m: number }>(
      `SELECT g.field_id, g.slope_length_m FROM field_grounds g JOIN fields f ON f.id = g.field_id WHERE f.farm_id = :farmId AND g.slope_length_m IS NOT NULL`,
      { replacements: { farmId: job.farmId }, type: QueryTypes.SELECT },
    );
    const typedById = new Map(typed.map((t) => [t.field_id, t.slope_length_m]));
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
    const slopeClasses = await farmSlopeClasses(sequelize, job.farmId);

    await report(0.7, 'Drawing map layers');
    const layers: { kind: LayerKind; values: RenderValues | null }[] = [
      { kind: 'hillshade', values: grids.hillshade },
      { kind: 'slope-classes', values: grids.slopePct },
      { kind: 'ls', values: grids.ls },
      { kind: 'concentrated-flow', values: grids.contributingAreaM2 },
    ];
    const rendered: { kind: LayerKind; key: string; bounds: unknown; legend: unknown }[] = [];
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
    let covered = 0;
    const old = await sequelize.query<{ file_key: string }>(
      `SELECT l.file_key FROM terrain_layers l JOIN elevation_models m ON m.id = l.elevation_model_id WHERE m.farm_id = :farmId
       UNION ALL SELECT g.file_key FROM terrain_grids g JOIN elevation_models m ON m.id = g.elevation_model_id WHERE m.farm_id = :farmId`,
      { replacements: { farmId: job.farmId }, type: QueryTypes.SELECT },
    );
    await sequelize.transaction(async (t) => {
      await sequelize.query(
        `DELETE FROM terrain_layers WHERE elevation_model_id IN (SELECT id FROM elevation_models WHERE farm_id = :farmId)`,
        { replacements: { farmId: job.farmId }, transaction: t },
      );
      await sequelize.query(
        `DELETE FROM terrain_grids WHERE elevation_model_id IN (SELECT id FROM elevation_models WHERE farm_id = :farmId)`,
        { replacements: { farmId: job.farmId }, transaction: t },
      );
      for (const [kind, key] of [['ls', lsKey], ['field-labels', labelsKey]] as const) {
        await sequelize.query(`INSERT INTO terrain_grids (elevation_model_id, kind, file_key, frame, detail) VALUES (:id, :kind, :key, :frame, :detail)`, {
          replacements: { id: model.id, kind, key, frame: JSON.stringify(frame), detail: JSON.stringify(kind === 'field-labels' ? { fieldIdsByLabel } : {}) },
          transaction: t,
        });
      }
      for (const r of rendered) {
        await sequelize.query(`INSERT INTO terrain_layers (elevation_model_id, kind, file_key, bounds, legend) VALUES (:id, :kind, :key, :bounds, :legend)`, {
          replacements: { id: model.id, kind: r.kind, key: r.key, bounds: JSON.stringify(r.bounds), legend: JSON.stringify(r.legend) },
          transaction: t,
        });
      }
      await sequelize.query(`DELETE FROM field_terrain WHERE field_id IN (SELECT id FROM fields WHERE farm_id = :farmId)`, { replacements: { farmId: job.farmId }, transaction: t });
      for (const f of fields) {
        const rings = ringsByField.get(f.id);
        if (!rings) continue;
        const s = fieldTerrainStats({ rings, grid: frame, slopePct: grids.slopePct, ls: grids.ls, contributingAreaM2: grids.contributingAreaM2, slopeClasses });
        if (!s.ok) continue;
        covered++;
        const { cells: _cells, points, ...flow } = s.stats.concentratedFlow;
        const step = Math.max(1, Math.ceil(points.length / MAX_FLOW_POINTS));
        const pointsWgs84 = toWgs.ok ? points.filter((_, i) => i % step === 0).map((p) => toWgs.converter.forward(p)) : [];
        const stats = { ...s.stats, concentratedFlow: { ...flow, points: pointsWgs84 }, cellSizeM: dem.rowCellSizeXM[0], epsg: dem.epsg };
        await sequelize.query(
          `INSERT INTO field_terrain (field_id, elevation_model_id, field_version, stats) VALUES (:fieldId, :mid, :version, :stats)`,
          { replacements: { fieldId: f.id, mid: model.id, version: f.properties.version, stats: JSON.stringify(stats) }, transaction: t },
        );
      }
      // New per-field figures are an input of every stored assessment of the farm.
      await refreshAssessments(sequelize, { farmId: job.farmId }, t);
    });
    for (const o of old) await storage.remove(o.file_key);
    return `Terrain ready: ${covered} of ${fields.length} fields covered by the elevation model.`;
  };
}
