// For /api/plans/:planId and /api/plan-actions/:actionId: the caller's membership on the plan's
// farm decides. A landowner reaches a plan only once a revision of it has been approved; drafts,
// plans in review and other farms' plans are a 404, so their existence does not leak.
import type { Request, RequestHandler, Response } from 'express';
import { Plan, PlanAction, PlanVersion } from '../models';
import { notFound } from '../lib/http-error';
import { parseId } from './validate';
import { callerMembership } from './farm-access';

async function admit(req: Request, res: Response, plan: { id: number; farmId: number } | null, what: string): Promise<void> {
  const m = plan ? callerMembership(req, plan.farmId) : null;
  if (!plan || !m) throw notFound(what);
  if (m.role === 'landowner' && (await PlanVersion.count({ where: { planId: plan.id } })) === 0) throw notFound(what);
  req.membership = m;
  res.locals.planId = plan.id;
}

export const loadPlanMembership: RequestHandler = async (req, res, next) => {
  const planId = parseId(req.params.planId as string | undefined, 'planId');
  await admit(req, res, await Plan.findByPk(planId, { attributes: ['id', 'farmId'] }), 'That plan');
  next();
};

export const loadPlanActionMembership: RequestHandler = async (req, res, next) => {
  const actionId = parseId(req.params.actionId as string | undefined, 'actionId');
  const action = await PlanAction.findByPk(actionId, { attributes: ['id', 'planId'], include: [{ model: Plan, as: 'plan', attributes: ['id', 'farmId'] }] });
  await admit(req, res, action?.plan ?? null, 'That plan action');
  res.locals.actionId = actionId;
  next();
};
