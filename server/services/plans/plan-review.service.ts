// The review of a plan: the farmer submits it, the advisor returns it with a comment or approves
// it (which freezes the revision for the landowner), and both comment on the plan or an action.
// Each step checks the version the caller read (409 when stale) and the state it starts from.
import type { Sequelize, Transaction } from 'sequelize';
import type { Plan as PlanShape, PlanComment as PlanCommentShape, PlanState } from '../../../shared/schemas/plans';
import { badRequest, invalid } from '../../lib/http-error';
import { Plan, PlanAction, PlanComment, PlanVersion, User } from '../../models';
import { presentComment } from '../../presenters/plan.presenter';
import { recordEvent } from '../audit';
import { noticePlanEvent } from '../notices/plan-notices';
import { livePlan } from './plan-read.service';
import { lockPlan, type Actor } from './plans.service';

const STATE_WORDS: Record<PlanState, string> = { draft: 'a draft', submitted: 'submitted for review', returned: 'returned to the farmer', approved: 'approved' };

function expectState(plan: Plan, allowed: PlanState[], doing: string): void {
  const state: PlanState = plan.state;
  if (!allowed.includes(state)) throw invalid('plan_state', `Only a plan that is ${allowed.map((s) => STATE_WORDS[s]).join(' or ')} can be ${doing}; this one is ${STATE_WORDS[state]}.`);
}

async function event(actor: Actor, plan: Plan, action: string, t: Transaction): Promise<void> {
  await recordEvent({ userId: actor.userId, farmId: plan.farmId, entity: 'plan', entityId: plan.id, action, detail: { revision: plan.revision } }, t);
}

export async function submitPlan(sequelize: Sequelize, actor: Actor, planId: number, version: number): Promise<PlanShape> {
  return sequelize.transaction(async (t) => {
    const plan = await lockPlan(planId, version, t);
    expectState(plan, ['draft', 'returned'], 'submitted');
    if ((await PlanAction.count({ where: { planId }, transaction: t })) === 0) throw invalid('plan_empty', 'Add at least one action before submitting the plan.');
    await plan.update({ state: 'submitted', version: plan.version + 1, submittedBy: actor.userId, submittedAt: new Date() }, { transaction: t });
    await event(actor, plan, 'submitted', t);
    await noticePlanEvent({ plan, event: 'submitted', actorId: actor.userId }, t);
    return livePlan(planId, t);
  });
}

export async function returnPlan(sequelize: Sequelize, actor: Actor, planId: number, input: { version: number; comment: string }): Promise<PlanShape> {
  return sequelize.transaction(async (t) => {
    const plan = await lockPlan(planId, input.version, t);
    expectState(plan, ['submitted'], 'returned');
    await plan.update({ state: 'returned', version: plan.version + 1, returnedBy: actor.userId, returnedAt: new Date() }, { transaction: t });
    await PlanComment.create({ planId, actionId: null, revision: plan.revision, kind: 'return', authorId: actor.userId, body: input.comment }, { transaction: t });
    await event(actor, plan, 'returned', t);
    await noticePlanEvent({ plan, event: 'returned', actorId: actor.userId, comment: input.comment }, t);
    return livePlan(planId, t);
  });
}

/** Approves the submitted revision and stores it frozen: what the landowner reads from now on. */
export async function approvePlan(sequelize: Sequelize, actor: Actor, planId: number, input: { version: number; comment?: string | null }): Promise<PlanShape> {
  return sequelize.transaction(async (t) => {
    const plan = await lockPlan(planId, input.version, t);
    expectState(plan, ['submitted'], 'approved');
    const approvedAt = new Date();
    await plan.update({ state: 'approved', version: plan.version + 1, approvedBy: actor.userId, approvedAt }, { transaction: t });
    if (input.comment) await PlanComment.create({ planId, actionId: null, revision: plan.revision, kind: 'approval', authorId: actor.userId, body: input.comment }, { transaction: t });
    const approved = await livePlan(planId, t);
    // The frozen copy: the plan as approved, with itself as the newest approved revision; the
    // review conversation stays with the live plan.
    const snapshot: PlanShape = { ...approved, approvedRevision: plan.revision, comments: [] };
    await PlanVersion.create({ planId, revision: plan.revision, snapshot, approvedBy: actor.userId, approvedAt }, { transaction: t });
    await event(actor, plan, 'approved', t);
    await noticePlanEvent({ plan, event: 'approved', actorId: actor.userId }, t);
    return { ...approved, approvedRevision: plan.revision };
  });
}

/** POST /api/plans/:planId/comments: on the plan, or on one of its actions. */
export async function addComment(sequelize: Sequelize, actor: Actor, planId: number, input: { body: string; actionId?: number | null }): Promise<PlanCommentShape> {
  return sequelize.transaction(async (t) => {
    const plan = await lockPlan(planId, undefined, t);
    if (input.actionId != null) {
      const action = await PlanAction.findOne({ where: { id: input.actionId, planId }, attributes: ['id'], transaction: t });
      if (!action) throw badRequest('invalid_input', 'actionId: there is no action with that id in this plan', { issues: [{ path: 'actionId', message: 'there is no action with that id in this plan' }] });
    }
    const comment = await PlanComment.create({ planId, actionId: input.actionId ?? null, revision: plan.revision, authorId: actor.userId, body: input.body }, { transaction: t });
    await recordEvent({ userId: actor.userId, farmId: plan.farmId, entity: 'plan_comment', entityId: comment.id, action: 'created', detail: { planId, actionId: input.actionId ?? null } }, t);
    const author = await User.findByPk(actor.userId, { attributes: ['id', 'name'], transaction: t });
    return presentComment(comment, new Map(author ? [[author.id, author.name]] : []));
  });
}
