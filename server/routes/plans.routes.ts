// Season plans: a farm's plan per season, its actions, and its review (submit, return, approve,
// comments). The farmer and the advisor write; a landowner reads approved revisions only.
import { Router, type Request, type RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { PlanActionCheck, PlanActionCreate, PlanActionDelete, PlanActionDone, PlanActionUpdate, PlanApprove, PlanCommentCreate, PlanCreate, PlanFromOption, PlanReturn, PlanSubmit } from '../../shared/schemas/plans';
import { PHOTO_MAX_BYTES } from '../../shared/limits';
import { SeasonLabel } from '../../shared/schemas/season';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { loadPlanActionMembership, loadPlanMembership } from '../middleware/plan-access';
import { validate } from '../middleware/validate';
import { badRequest } from '../lib/http-error';
import { createPlan } from '../services/plans/plans.service';
import { planForSeason, planVersions, readPlan, type PlanViewer } from '../services/plans/plan-read.service';
import { addAction, addOption, deleteAction, updateAction } from '../services/plans/plan-actions.service';
import { actionPhoto, markChecked, markDone } from '../services/plans/plan-follow-up.service';
import { singleUpload } from '../middleware/upload';
import type { FileStorage } from '../services/storage/file-storage';
import { addComment, approvePlan, returnPlan, submitPlan } from '../services/plans/plan-review.service';

const actorOf = (req: Request) => ({ userId: req.user!.id });
const viewerOf = (req: Request): PlanViewer => ({ farmId: req.membership!.farmId, membershipId: req.membership!.id, role: req.membership!.role, units: req.user!.units });
const planIdOf = (res: { locals: Record<string, unknown> }) => res.locals.planId as number;
const actionIdOf = (res: { locals: Record<string, unknown> }) => res.locals.actionId as number;

/** Both the farmer and the advisor write plans; the advisor's changes carry their name. */
const writesPlans = requireRole('farmer', 'advisor');

function seasonParam(req: Request): string | undefined {
  if (req.query.season === undefined) return undefined;
  const r = SeasonLabel.safeParse(req.query.season);
  if (!r.success) throw badRequest('invalid_input', `season: ${r.error.issues[0].message}`);
  return r.data;
}

/** DELETE carries its version in the body or as ?version=. */
const versionFromQuery: RequestHandler = (req, _res, next) => {
  if (req.body?.version === undefined && req.query.version !== undefined) req.body = { ...(req.body ?? {}), version: req.query.version };
  next();
};

const photoUpload = singleUpload(PHOTO_MAX_BYTES, 'photo');

export function plansRoutes({ sequelize, storage }: { sequelize: Sequelize; storage: FileStorage }): { farms: Router; plans: Router; actions: Router } {
  const farms = Router();
  farms.get('/:farmId/plans', loadFarmMembership, async (req, res) => {
    res.json(await planForSeason(viewerOf(req), seasonParam(req)));
  });
  farms.post('/:farmId/plans', loadFarmMembership, writesPlans, validate(PlanCreate), async (req, res) => {
    const { plan, created } = await createPlan(sequelize, actorOf(req), req.membership!.farmId, req.body.season);
    res.status(created ? 201 : 200).json(plan);
  });

  const plans = Router();
  plans.get('/:planId', loadPlanMembership, async (req, res) => {
    res.json(await readPlan(viewerOf(req), planIdOf(res)));
  });
  plans.get('/:planId/versions', loadPlanMembership, async (req, res) => {
    res.json(await planVersions(viewerOf(req), planIdOf(res)));
  });
  plans.post('/:planId/actions', loadPlanMembership, writesPlans, validate(PlanActionCreate), async (req, res) => {
    res.status(201).json(await addAction(sequelize, actorOf(req), planIdOf(res), req.body));
  });
  plans.post('/:planId/actions/from-option', loadPlanMembership, writesPlans, validate(PlanFromOption), async (req, res) => {
    res.status(201).json(await addOption(sequelize, actorOf(req), planIdOf(res), req.body));
  });
  plans.post('/:planId/submit', loadPlanMembership, requireRole('farmer'), validate(PlanSubmit), async (req, res) => {
    res.json(await submitPlan(sequelize, actorOf(req), planIdOf(res), req.body.version));
  });
  plans.post('/:planId/return', loadPlanMembership, requireRole('advisor'), validate(PlanReturn), async (req, res) => {
    res.json(await returnPlan(sequelize, actorOf(req), planIdOf(res), req.body));
  });
  plans.post('/:planId/approve', loadPlanMembership, requireRole('advisor'), validate(PlanApprove), async (req, res) => {
    res.json(await approvePlan(sequelize, actorOf(req), planIdOf(res), req.body));
  });
  plans.post('/:planId/comments', loadPlanMembership, writesPlans, validate(PlanCommentCreate), async (req, res) => {
    res.status(201).json(await addComment(sequelize, actorOf(req), planIdOf(res), req.body));
  });

  const actions = Router();
  actions.patch('/:actionId', loadPlanActionMembership, writesPlans, validate(PlanActionUpdate), async (req, res) => {
    res.json(await updateAction(sequelize, actorOf(req), actionIdOf(res), req.body));
  });
  actions.delete('/:actionId', loadPlanActionMembership, writesPlans, versionFromQuery, validate(PlanActionDelete), async (req, res) => {
    res.json(await deleteAction(sequelize, actorOf(req), actionIdOf(res), req.body.version));
  });
  // Follow-up: records of the work, not changes to the plan (no new revision, no new approval).
  actions.post('/:actionId/done', loadPlanActionMembership, writesPlans, photoUpload, validate(PlanActionDone), async (req, res) => {
    res.json(await markDone({ sequelize, storage }, actorOf(req), actionIdOf(res), req.body, req.file?.buffer));
  });
  actions.post('/:actionId/check', loadPlanActionMembership, requireRole('advisor'), validate(PlanActionCheck), async (req, res) => {
    res.json(await markChecked(sequelize, actorOf(req), actionIdOf(res), req.body.version));
  });
  for (const [suffix, which] of [['photo', 'image'], ['photo/thumbnail', 'thumbnail']] as const) {
    actions.get(`/:actionId/${suffix}`, loadPlanActionMembership, writesPlans, async (_req, res) => {
      const f = await actionPhoto({ sequelize, storage }, actionIdOf(res), which);
      res.type(f.contentType).set('Cache-Control', 'private, max-age=3600').send(f.body);
    });
  }
  return { farms, plans, actions };
}
