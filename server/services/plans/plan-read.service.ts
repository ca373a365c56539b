// Reading season plans: the live plan for the farmer and the advisor; for a landowner the newest
// approved revision as it was frozen, cut down to the fields they own. Each read is a fixed
// number of queries however many actions and comments the plan has.
import type { Transaction } from 'sequelize';
import type { Plan as PlanShape, PlanVersion as PlanVersionShape } from '../../../shared/schemas/plans';
import { planChanges } from '../../../shared/plan-changes';
import type { Units } from '../../../shared/schemas/auth';
import { HttpError, notFound } from '../../lib/http-error';
import { Field, Plan, PlanAction, PlanComment, PlanVersion, Season, User } from '../../models';
import { forLandowner, presentAction, presentFrozen, presentPlan, type People } from '../../presenters/plan.presenter';
import { resolveSeason } from '../seasons.service';
import { predictPlan } from './plan-prediction';

/** Who reads: their farm, membership and role. */
/** Who reads a plan; `units` words the prediction's effects (hectares when not given). */
export type PlanViewer = { farmId: number; membershipId: number; role: 'farmer' | 'advisor' | 'landowner'; units?: Units };

async function peopleOf(ids: (number | null)[], transaction?: Transaction): Promise<People> {
  const wanted = [...new Set(ids.filter((x): x is number => x != null))];
  if (!wanted.length) return new Map();
  const users = await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

/**
 * The live plan as the API shows it (read inside the caller's transaction when given), with the
 * prediction of its treatments from the season's stored assessments.
 */
export async function livePlan(planId: number, transaction?: Transaction, units: Units = 'ha'): Promise<PlanShape> {
  const plan = await Plan.findByPk(planId, { include: [{ model: Season, as: 'season', attributes: ['label'] }], transaction });
  if (!plan) throw notFound('That plan');
  // One after another: inside a transaction they share one connection.
  const actions = await PlanAction.scope('inOrder').findAll({ where: { planId }, include: [{ model: Field, as: 'field', attributes: ['name'] }], transaction });
  const comments = await PlanComment.scope('oldestFirst').findAll({ where: { planId }, transaction });
  const newest = await PlanVersion.max<number, PlanVersion>('revision', { where: { planId }, transaction });
  const people = await peopleOf(
    [plan.createdBy, plan.submittedBy, plan.returnedBy, plan.approvedBy, ...actions.flatMap((a) => [a.createdBy, a.updatedBy, a.doneByUser, a.checkedBy]), ...comments.map((c) => c.authorId)],
    transaction,
  );
  const shown = presentPlan({
    plan,
    season: plan.season!.label,
    actions: actions.map((action) => ({ action, fieldName: action.field!.name })),
    comments,
    approvedRevision: newest ?? null,
    people,
  });
  return { ...shown, prediction: await predictPlan(shown, units) };
}

async function ownedFieldIds(viewer: PlanViewer): Promise<Set<number>> {
  const rows = await Field.findAll({ where: { farmId: viewer.farmId, ownerMembershipId: viewer.membershipId }, attributes: ['id'] });
  return new Set(rows.map((f) => f.id));
}

/**
 * The approved revision with the work done and checked since (follow-up is a record, not a change
 * of the plan, so the landowner sees it on the revision they read). Photos stay with the farmer
 * and the advisor.
 */
async function withFollowUp(plan: PlanShape): Promise<PlanShape> {
  const ids = plan.actions.map((a) => a.id);
  if (!ids.length) return plan;
  const rows = await PlanAction.findAll({ where: { id: ids }, include: [{ model: Field, as: 'field', attributes: ['name'] }] });
  const people = await peopleOf(rows.flatMap((r) => [r.doneByUser, r.checkedBy]));
  const live = new Map(rows.map((r) => [r.id, presentAction(r, r.field!.name, people)]));
  const actions = plan.actions.map((a) => {
    const l = live.get(a.id);
    if (!l || l.status === 'planned') return a;
    const { status, doneOn, appliedQuantity, doneNote, doneRecordedBy, doneRecordedAt, checkedBy, checkedAt } = l;
    return { ...a, status, doneOn, appliedQuantity, doneNote, doneRecordedBy, doneRecordedAt, checkedBy, checkedAt, hasPhoto: false };
  });
  return { ...plan, actions };
}

/** GET /api/plans/:planId. A landowner gets the newest approved revision of their own fields, with the work done since. */
export async function readPlan(viewer: PlanViewer, planId: number): Promise<PlanShape> {
  if (viewer.role !== 'landowner') return livePlan(planId, undefined, viewer.units);
  const newest = await PlanVersion.newestOf(planId);
  // plan-access lets a landowner through only to plans with an approved revision.
  if (!newest) throw notFound('That plan');
  return withFollowUp(forLandowner(presentFrozen(newest), await ownedFieldIds(viewer)));
}

/** GET /api/farms/:farmId/plans?season= (the farm's newest season when none is named). */
export async function planForSeason(viewer: PlanViewer, seasonLabel: string | undefined): Promise<PlanShape> {
  const season = await resolveSeason(viewer.farmId, seasonLabel);
  const plan = await Plan.findOne({ where: { farmId: viewer.farmId, seasonId: season.id }, attributes: ['id'] });
  const none = new HttpError(404, 'no_plan', viewer.role === 'landowner' ? `There is no approved plan for season ${season.label} yet.` : `There is no plan for season ${season.label} yet.`);
  if (!plan) throw none;
  if (viewer.role === 'landowner' && !(await PlanVersion.newestOf(plan.id))) throw none;
  return readPlan(viewer, plan.id);
}

/**
 * GET /api/plans/:planId/versions: every approved revision, oldest first, each with what changed
 * from the one before; then, for the farmer and the advisor, the revision being worked on when
 * it is not approved yet, with what changed since the last approval.
 */
export async function planVersions(viewer: PlanViewer, planId: number): Promise<PlanVersionShape[]> {
  const frozen = await PlanVersion.scope('oldestFirst').findAll({ where: { planId } });
  const owned = viewer.role === 'landowner' ? await ownedFieldIds(viewer) : null;
  const entries: PlanVersionShape[] = [];
  for (const v of frozen) {
    const plan = owned ? forLandowner(presentFrozen(v), owned) : presentFrozen(v);
    const before = entries.at(-1)?.plan;
    entries.push({ revision: v.revision, state: 'approved', approvedBy: plan.approvedBy, approvedAt: plan.approvedAt, plan, changes: before ? planChanges(before, plan) : null });
  }
  if (owned) return entries;
  const live = await livePlan(planId);
  if (live.state !== 'approved') {
    const before = entries.at(-1)?.plan;
    entries.push({ revision: live.revision, state: live.state, approvedBy: null, approvedAt: null, plan: live, changes: before ? planChanges(before, live) : null });
  }
  return entries;
}
