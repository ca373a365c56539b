// Seasons, cropping, climate, typed ground, assessments and the priority board.
import { Router, type Request, type Response } from 'express';
import type { Sequelize } from 'sequelize';
import { ClimateUpdate, CroppingUpdate, GroundUpdate, RainfallRecordFields, SeasonCreate, SeasonLabel } from '../../shared/schemas/season';
import { validate } from '../middleware/validate';
import { singleUpload } from '../middleware/upload';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { badRequest } from '../lib/http-error';
import { createSeason, deleteSeason, getCropping, listSeasons, putCropping } from '../services/seasons.service';
import { getClimate, getGround, putClimate, putClimateFromRecord, putGround } from '../services/climate-ground.service';
import { RAINFALL_RECORD_MAX_BYTES } from '../../shared/limits';
import { advisorBoard, farmBoard, fieldAssessment } from '../services/assessments/read-assessments';
import type { JobQueue } from '../services/jobs/job-queue';

const recordUpload = singleUpload(RAINFALL_RECORD_MAX_BYTES, 'rainfall record');

function seasonParam(req: Request): string | undefined {
  const raw = req.query.season;
  if (raw === undefined) return undefined;
  const r = SeasonLabel.safeParse(raw);
  if (!r.success) throw badRequest('invalid_input', `season: ${r.error.issues[0].message}`);
  return r.data;
}

const actorOf = (req: Request) => ({ userId: req.user!.id });
const farmOf = (req: Request) => req.membership!.farmId;
const fieldOf = (req: Request, res: Response) => ({ id: res.locals.fieldId as number, farmId: req.membership!.farmId });
const viewerOf = (req: Request) => ({ farmId: req.membership!.farmId, membershipId: req.membership!.id, role: req.membership!.role });

export function seasonsRoutes(sequelize: Sequelize, jobs?: JobQueue): { farms: Router; fields: Router; board: Router } {
  const farms = Router();
  farms.get('/:farmId/seasons', loadFarmMembership, async (req, res) => {
    res.json(await listSeasons(farmOf(req)));
  });
  farms.post('/:farmId/seasons', loadFarmMembership, requireRole('farmer'), validate(SeasonCreate), async (req, res) => {
    const { season, created } = await createSeason(sequelize, actorOf(req), farmOf(req), req.body.label, { copyCroppingFrom: req.body.copyCroppingFrom });
    res.status(created ? 201 : 200).json(season);
  });
  farms.delete('/:farmId/seasons/:label', loadFarmMembership, requireRole('farmer'), async (req, res) => {
    const label = SeasonLabel.safeParse(req.params.label);
    if (!label.success) throw badRequest('invalid_input', `label: ${label.error.issues[0].message}`);
    await deleteSeason(sequelize, actorOf(req), farmOf(req), label.data);
    res.status(204).end();
  });
  farms.get('/:farmId/climate', loadFarmMembership, async (req, res) => {
    res.json(await getClimate(farmOf(req)));
  });
  farms.put('/:farmId/climate', loadFarmMembership, requireRole('farmer', 'advisor'), validate(ClimateUpdate), async (req, res) => {
    res.json(await putClimate(sequelize, actorOf(req), farmOf(req), req.body));
  });
  farms.post('/:farmId/climate/rainfall-record', loadFarmMembership, requireRole('farmer', 'advisor'), recordUpload, validate(RainfallRecordFields), async (req, res) => {
    res.json(await putClimateFromRecord(sequelize, actorOf(req), farmOf(req), req.file?.buffer, req.body));
  });
  farms.get('/:farmId/board', loadFarmMembership, async (req, res) => {
    res.json(await farmBoard(sequelize, viewerOf(req), seasonParam(req), req.user!.units));
  });

  const fields = Router();
  fields.get('/:fieldId/ground', loadFieldMembership, async (_req, res) => {
    res.json(await getGround(res.locals.fieldId as number));
  });
  fields.put('/:fieldId/ground', loadFieldMembership, requireRole('farmer', 'advisor'), validate(GroundUpdate), async (req, res) => {
    res.json(await putGround(sequelize, actorOf(req), fieldOf(req, res), req.body, jobs));
  });
  fields.get('/:fieldId/cropping', loadFieldMembership, async (req, res) => {
    res.json(await getCropping(res.locals.fieldId as number, seasonParam(req), farmOf(req)));
  });
  fields.put('/:fieldId/cropping', loadFieldMembership, requireRole('farmer', 'advisor'), validate(CroppingUpdate), async (req, res) => {
    res.json(await putCropping(sequelize, actorOf(req), fieldOf(req, res), req.body));
  });
  fields.get('/:fieldId/assessment', loadFieldMembership, async (req, res) => {
    res.json(await fieldAssessment(sequelize, viewerOf(req), res.locals.fieldId as number, seasonParam(req)));
  });

  // An advisor's board across every client farm given to them.
  const board = Router();
  board.get('/', async (req, res) => {
    res.json(await advisorBoard(sequelize, req.user!.id, seasonParam(req), req.user!.units));
  });
  return { farms, fields, board };
}
