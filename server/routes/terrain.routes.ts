import { Router } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { singleUpload } from '../middleware/upload';
import { loadFarmMembership, membershipOf, requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { badRequest, HttpError, notFound } from '../lib/http-error';
import type { FileStorage } from '../services/storage/file-storage';
import { JobQueue } from '../services/jobs/job-queue';
import { acceptDem, DEM_LIMIT_BYTES } from '../services/elevation-models.service';
import { LAYER_LABELS, farmSlopeClasses } from '../services/farm-terrain.service';
import { parseSlopeClasses, layerLegend } from '../services/terrain';
import { keptGrids, renderSoilLossLayer } from '../services/soil-loss-layer.service';
import { listSeasons, resolveSeason } from '../services/seasons.service';
import { afterInputsChange } from '../services/input-changes.service';
import type { LayerKind } from '../services/terrain';

const upload = singleUpload(DEM_LIMIT_BYTES, 'elevation model');

type Deps = { sequelize: Sequelize; storage: FileStorage; jobs?: JobQueue };

export function terrainRoutes(deps: Deps): { farms: Router; fields: Router; jobs: Router } {
  const { sequelize } = deps;
  const farms = Router();
  farms.post('/:farmId/dems', loadFarmMembership, requireRole('farmer'), upload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the elevation model as the multipart part named "file".');
    if (!deps.jobs) throw new HttpError(503, 'jobs_unavailable', 'Background processing is not running on this server; try again later.');
    const r = await acceptDem({ ...deps, jobs: deps.jobs }, { userId: req.user!.id }, req.membership!.farmId, { buffer: req.file.buffer, originalName: req.file.originalname });
    res.status(202).json(r);
  });

  // A landowner sees only the fields they own (DESIGN.md roles), so not the farm-wide model and
  // layers, which show every field; their own fields' figures come with /fields/:id/terrain.
  farms.get('/:farmId/elevation', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    const farmId = req.membership!.farmId;
    const [model] = await sequelize.query<Record<string, unknown>>(
      `SELECT id, original_name AS "originalName", epsg, width, height, cell_size_m AS "cellSizeM", created_at AS "createdAt"
         FROM elevation_models WHERE farm_id = :farmId ORDER BY id DESC LIMIT 1`,
      { replacements: { farmId }, type: QueryTypes.SELECT },
    );
    const [job] = await sequelize.query<Record<string, unknown>>(
      `SELECT id, state, progress, message FROM processing_jobs WHERE farm_id = :farmId AND kind = 'terrain' ORDER BY created_at DESC LIMIT 1`,
      { replacements: { farmId }, type: QueryTypes.SELECT },
    );
    res.json({ model: model ?? null, latestJob: job ?? null });
  });

  farms.get('/:farmId/layers', loadFarmMembership, async (req, res) => {
    const farmId = req.membership!.farmId;
    if (req.membership!.role === 'landowner') {
      res.json([]);
      return;
    }
    const rows = await sequelize.query<{ kind: LayerKind; file_key: string; bounds: { west: number; south: number; east: number; north: number }; legend: unknown }>(
      `SELECT l.kind, l.file_key, l.bounds, l.legend FROM terrain_layers l JOIN elevation_models m ON m.id = l.elevation_model_id
        WHERE m.farm_id = :farmId ORDER BY l.kind`,
      { replacements: { farmId }, type: QueryTypes.SELECT },
    );
    const toEntry = (r: (typeof rows)[number]) => ({
        key: r.kind,
        label: LAYER_LABELS[r.kind] ?? r.kind,
        // The key changes with every terrain run, so a new picture is never hidden by a cache.
        url: `/api/farms/${farmId}/layers/${r.kind}.png?v=${r.file_key.replace(/^.*\/|\.png$/g, '')}`,
        bounds: [
          [r.bounds.south, r.bounds.west],
          [r.bounds.north, r.bounds.east],
        ],
        legend: r.legend,
      });
    const entries = rows.map(toEntry);
    // Soil loss per cell is drawn on request from the kept LS grid and each field's assessment.
    const grids = await keptGrids(sequelize, farmId);
    const [season] = await listSeasons(farmId);
    if (grids && season && rows[0]) {
      entries.push({
        ...toEntry(rows[0]),
        key: 'soil-loss',
        label: `${LAYER_LABELS['soil-loss']} (${season.label})`,
        url: `/api/farms/${farmId}/layers/soil-loss.png?season=${encodeURIComponent(season.label)}&v=${grids.ls.file_key.replace(/^.*\/|\.f32$/g, '')}`,
        legend: layerLegend({ kind: 'soil-loss' }),
      });
    }
    res.json(entries);
  });

  farms.get('/:farmId/layers/:file', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    const kind = String(req.params.file).replace(/\.png$/, '');
    if (kind === 'soil-loss') {
      const season = await resolveSeason(req.membership!.farmId, typeof req.query.season === 'string' ? req.query.season : undefined);
      const r = await renderSoilLossLayer(deps, req.membership!.farmId, season);
      if (!r) throw notFound('That map layer');
      if (!r.ok) throw new HttpError(422, 'cannot_draw', r.reason);
      res.type('png').set('Cache-Control', 'private, no-cache').send(r.png);
      return;
    }
    const [row] = await sequelize.query<{ file_key: string }>(
      `SELECT l.file_key FROM terrain_layers l JOIN elevation_models m ON m.id = l.elevation_model_id WHERE m.farm_id = :farmId AND l.kind = :kind`,
      { replacements: { farmId: req.membership!.farmId, kind }, type: QueryTypes.SELECT },
    );
    if (!row) throw notFound('That map layer');
    res.type('png').set('Cache-Control', 'private, max-age=60').send(await deps.storage.get(row.file_key));
  });

  // Slope-class breaks per farm (default: SSM names with 0-2-6-12-18-25 % breaks [memory]).
  farms.get('/:farmId/slope-classes', loadFarmMembership, async (req, res) => {
    const farmId = req.membership!.farmId;
    const [row] = await sequelize.query<{ slope_breaks: unknown }>(`SELECT slope_breaks FROM farms WHERE id = :farmId`, { replacements: { farmId }, type: QueryTypes.SELECT });
    res.json({ classes: await farmSlopeClasses(sequelize, farmId), custom: row?.slope_breaks != null });
  });
  farms.put('/:farmId/slope-classes', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    const farmId = req.membership!.farmId;
    const reset = req.body?.classes === null;
    const parsed = reset ? null : parseSlopeClasses(req.body);
    if (parsed && !parsed.ok) throw badRequest('invalid_input', `classes: ${parsed.reason}`);
    await sequelize.query(`UPDATE farms SET slope_breaks = :breaks, updated_at = now() WHERE id = :farmId`, {
      replacements: { farmId, breaks: parsed?.ok ? JSON.stringify(parsed.classes) : null },
    });
    const { terrainJobId: jobId } = await afterInputsChange(deps, { kind: 'slope-classes', farmId }, { userId: req.user!.id });
    res.json({ classes: await farmSlopeClasses(sequelize, farmId), custom: !reset, jobId });
  });

  const fields = Router();
  fields.get('/:fieldId/terrain', loadFieldMembership, async (_req, res) => {
    const [row] = await sequelize.query<{ stats: Record<string, unknown>; field_version: number; computed_at: Date; version: number }>(
      `SELECT t.stats, t.field_version, t.computed_at, f.version FROM field_terrain t JOIN fields f ON f.id = t.field_id WHERE t.field_id = :id`,
      { replacements: { id: res.locals.fieldId }, type: QueryTypes.SELECT },
    );
    if (!row) {
      const [pending] = await sequelize.query<{ n: number }>(
        `SELECT count(*)::int AS n FROM processing_jobs j JOIN fields f ON f.farm_id = j.farm_id
          WHERE f.id = :id AND j.kind = 'terrain' AND j.state IN ('queued', 'running')`,
        { replacements: { id: res.locals.fieldId }, type: QueryTypes.SELECT },
      );
      if (pending.n > 0) throw new HttpError(404, 'terrain_pending', 'The terrain figures of this field are being worked out; they will be here in a moment.');
      throw new HttpError(404, 'no_terrain', 'No elevation model covers this field yet: upload one for the farm, or type the slope % and slope length.');
    }
    res.json({ ...row.stats, computedAt: row.computed_at, upToDate: row.field_version === row.version });
  });

  const jobs = Router();
  jobs.get('/:jobId', async (req, res) => {
    const id = String(req.params.jobId);
    if (!/^[0-9a-f-]{36}$/i.test(id)) throw badRequest('invalid_id', 'jobId must be a job id.');
    const job = await JobQueue.status(sequelize, id);
    if (!job || !(await membershipOf(req.user!.id, job.farmId))) throw notFound('That job');
    res.json({ id: job.id, kind: job.kind, state: job.state, progress: job.progress, message: job.message });
  });
  return { farms, fields, jobs };
}
