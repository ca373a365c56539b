// Seasons, cropping, climate, typed ground, assessments and the priority board.
import { Router, type Request } from 'express';
import type { Sequelize } from 'sequelize';
import { ClimateUpdate, CroppingUpdate, GroundUpdate, SeasonCreate, SeasonLabel } from '../../shared/schemas/season';
import { validate } from '../middleware/validate';
import { singleUpload } from '../middleware/upload';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { badRequest, HttpError, notFound } from '../lib/http-error';

const recordUpload = singleUpload(RAINFALL_RECORD_MAX_BYTES, 'rainfall record');
import { Farm, Membership } from '../models';
import { listFieldFeatures } from '../services/fields.service';
import { ensureSeason, findSeason, getCropping, listSeasons, putCropping, resolveSeason } from '../services/seasons.service';
import { getClimate, getGround, putClimate, putClimateFromRecord, putGround } from '../services/climate-ground.service';
import { rFromRainfallCsv } from '../services/rainfall-record';
import { RAINFALL_RECORD_MAX_BYTES } from '../../shared/limits';
import { afterInputsChange } from '../services/input-changes.service';
import type { JobQueue } from '../services/jobs/job-queue';
import { assessField } from '../services/assessment.service';
import { farmBoard, rankRows } from '../services/board.service';

function seasonParam(req: Request): string | undefined {
  const raw = req.query.season;
  if (raw === undefined) return undefined;
  const r = SeasonLabel.safeParse(raw);
  if (!r.success) throw badRequest('invalid_input', `season: ${r.error.issues[0].message}`);
  return r.data;
}

async function fieldOf(sequelize: Sequelize, req: Request, fieldId: number) {
  const m = req.membership!;
  const [f] = await listFieldFeatures(sequelize, { fieldIds: [fieldId], ...(m.role === 'landowner' ? { visibleToOwner: m.id } : {}) });
  if (!f) throw notFound('That field');
  return f;
}

export function seasonsRoutes(sequelize: Sequelize, jobs?: JobQueue): { farms: Router; fields: Router; board: Router } {
  const farms = Router();
  farms.get('/:farmId/seasons', loadFarmMembership, async (req, res) => {
    res.json(await listSeasons(sequelize, req.membership!.farmId));
  });
  farms.post('/:farmId/seasons', loadFarmMembership, requireRole('farmer'), validate(SeasonCreate), async (req, res) => {
    const farmId = req.membership!.farmId;
    const existed = await findSeason(sequelize, farmId, req.body.label);
    res.status(existed ? 200 : 201).json(existed ?? (await ensureSeason(sequelize, farmId, req.body.label)));
  });
  farms.get('/:farmId/climate', loadFarmMembership, async (req, res) => {
    const c = await getClimate(sequelize, req.membership!.farmId);
    if (!c) throw new HttpError(404, 'no_climate', "This farm's climate (R and the design storm) is not set yet.");
    res.json(c);
  });
  farms.put('/:farmId/climate', loadFarmMembership, requireRole('farmer', 'advisor'), validate(ClimateUpdate), async (req, res) => {
    res.json(await putClimate(sequelize, { userId: req.user!.id }, req.membership!.farmId, req.body));
  });
  farms.post('/:farmId/climate/rainfall-record', loadFarmMembership, requireRole('farmer', 'advisor'), recordUpload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the rainfall record as the multipart part named "file".');
    const num = (v: unknown, name: string, min: number, max: number) => {
      if (v === undefined || v === '') return undefined;
      const n = Number(v);
      if (!Number.isFinite(n) || n < min || n > max) throw badRequest('invalid_input', `${name}: must be a number from ${min} to ${max}.`);
      return n;
    };
    const r = rFromRainfallCsv(req.file.buffer, num(req.body?.years, 'years', 0.1, 200));
    if (!r.ok) throw new HttpError(r.status, r.error, r.message);
    res.json(await putClimateFromRecord(sequelize, { userId: req.user!.id }, req.membership!.farmId, r.summary, num(req.body?.designStormMm, 'designStormMm', 1, 1000)));
  });
  farms.get('/:farmId/board', loadFarmMembership, async (req, res) => {
    const m = req.membership!;
    const season = await resolveSeason(sequelize, m.farmId, seasonParam(req));
    const farm = (await Farm.findByPk(m.farmId))!;
    res.json(await farmBoard(sequelize, { id: farm.id }, season, m.role === 'landowner' ? { ownerMembershipId: m.id } : undefined));
  });

  const fields = Router();
  fields.get('/:fieldId/ground', loadFieldMembership, async (_req, res) => {
    res.json((await getGround(sequelize, res.locals.fieldId as number)) ?? { slopePct: null, slopeLengthM: null, version: null });
  });
  fields.put('/:fieldId/ground', loadFieldMembership, requireRole('farmer', 'advisor'), validate(GroundUpdate), async (req, res) => {
    const f = await fieldOf(sequelize, req, res.locals.fieldId as number);
    const before = await getGround(sequelize, f.id);
    const ground = await putGround(sequelize, { userId: req.user!.id }, { id: f.id, farmId: f.properties.farmId }, req.body);
    // The typed slope length caps the DEM's flow length for LS: re-run the terrain when it changes.
    const change = { kind: 'ground' as const, farmId: f.properties.farmId, fieldIds: [f.id], slopeLengthChanged: before?.slopeLengthM !== ground.slopeLengthM };
    await afterInputsChange({ sequelize, jobs }, change, { userId: req.user!.id });
    res.json(ground);
  });
  fields.get('/:fieldId/cropping', loadFieldMembership, async (req, res) => {
    const season = await resolveSeason(sequelize, req.membership!.farmId, seasonParam(req));
    const c = await getCropping(sequelize, res.locals.fieldId as number, season.id);
    if (!c) throw new HttpError(404, 'no_cropping', `This field has no cropping for season ${season.label} yet.`);
    res.json(c);
  });
  fields.put('/:fieldId/cropping', loadFieldMembership, requireRole('farmer', 'advisor'), validate(CroppingUpdate), async (req, res) => {
    const f = await fieldOf(sequelize, req, res.locals.fieldId as number);
    res.json(await putCropping(sequelize, { userId: req.user!.id }, { id: f.id, farmId: f.properties.farmId }, req.body));
  });
  fields.get('/:fieldId/assessment', loadFieldMembership, async (req, res) => {
    const f = await fieldOf(sequelize, req, res.locals.fieldId as number);
    const season = await resolveSeason(sequelize, f.properties.farmId, seasonParam(req));
    res.json(await assessField(sequelize, f, season));
  });

  // An advisor's board across every client farm given to them.
  const board = Router();
  board.get('/', async (req, res) => {
    const label = seasonParam(req);
    const ms = await Membership.findAll({ where: { userId: req.user!.id, role: 'advisor' }, include: [{ model: Farm, as: 'farm' }] });
    const rows = [];
    const seasons = new Set<string>();
    for (const m of ms) {
      const farm = (m as Membership & { farm: Farm }).farm;
      const season = label ? await findSeason(sequelize, farm.id, label) : (await listSeasons(sequelize, farm.id))[0];
      if (!season) continue;
      seasons.add(season.label);
      rows.push(...(await farmBoard(sequelize, { id: farm.id, name: farm.name }, season)).rows);
    }
    res.json({ season: label ?? [...seasons].sort().reverse().join(', '), rows: rankRows(rows) });
  });
  return { farms, fields, board };
}
