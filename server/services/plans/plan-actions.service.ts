// Adding, changing and removing a plan's actions: one transaction each with the plan locked,
// the action's version checked on change and removal (409 when stale), an audit event, and the
// whole plan in the answer (its version, state and revision move with every action change).
import type { Sequelize, Transaction } from 'sequelize';
import { TREATMENT_TITLES } from '../../../shared/erosion/treatments/field-treatments';
import { PlanActionCreate, type PlanAction as PlanActionShape, type Plan as PlanShape, type PlanActionUpdate } from '../../../shared/schemas/plans';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import { describeIssues } from '../../middleware/validate';
import { actionsFromOption } from '../../../shared/plan-from-option';
import { Field, Plan, PlanAction, Season } from '../../models';
import { fieldTreatmentsAnswer } from '../treatments/farm-treatments.service';
import { recordEvent } from '../audit';
import { livePlan } from './plan-read.service';
import { lockPlan, openForEdit, type Actor } from './plans.service';

export type ActionAnswer = { action: PlanActionShape | null; plan: PlanShape };

type ActionInput = ReturnType<typeof PlanActionCreate.parse>;

async function checkField(plan: Plan, fieldId: number, t: Transaction): Promise<void> {
  const field = await Field.findByPk(fieldId, { attributes: ['id', 'farmId'], transaction: t });
  if (!field || field.farmId !== plan.farmId) {
    const message = 'fieldId: there is no field with that id on this farm';
    throw badRequest('invalid_input', message, { issues: [{ path: 'fieldId', message: 'there is no field with that id on this farm' }] });
  }
}

function valuesOf(input: ActionInput) {
  return {
    fieldId: input.fieldId,
    treatment: input.treatment,
    title: input.title ?? (input.treatment === 'other' ? '' : TREATMENT_TITLES[input.treatment]),
    quantity: input.quantity ?? null,
    unit: input.unit ?? null,
    cost: input.cost ?? null,
    plannedOn: input.plannedOn ?? null,
    plannedFrom: input.plannedFrom ?? null,
    plannedTo: input.plannedTo ?? null,
    doneBy: input.doneBy ?? null,
    status: input.status,
    notes: input.notes ?? null,
  };
}

export async function answer(planId: number, actionId: number | null, t: Transaction): Promise<ActionAnswer> {
  const plan = await livePlan(planId, t);
  return { plan, action: plan.actions.find((a) => a.id === actionId) ?? null };
}

/** Done and checked are follow-up records with their own routes, never a change of the plan. */
function refuseStatus(status: string | undefined, current: string): void {
  if (status === undefined || status === current) return;
  const message = 'status: mark an action done with POST /api/plan-actions/:id/done and checked with …/check; those are follow-up records, not changes to the plan';
  throw badRequest('invalid_input', message, { issues: [{ path: 'status', message: message.slice('status: '.length) }] });
}

export async function addAction(sequelize: Sequelize, actor: Actor, planId: number, input: ActionInput): Promise<ActionAnswer> {
  refuseStatus(input.status, 'planned');
  return sequelize.transaction(async (t) => {
    const plan = await lockPlan(planId, undefined, t);
    await checkField(plan, input.fieldId, t);
    await openForEdit(plan, actor, t);
    const action = await PlanAction.create({ ...valuesOf(input), planId, currency: plan.currency, createdBy: actor.userId, updatedBy: actor.userId }, { transaction: t });
    await recordEvent(
      { userId: actor.userId, farmId: plan.farmId, entity: 'plan_action', entityId: action.id, action: 'created', detail: { planId, fieldId: input.fieldId, treatment: input.treatment } },
      t,
    );
    return answer(planId, action.id, t);
  });
}

/** The action, locked, with its plan locked first; 409 when the caller read an older version. */
export async function lockAction(actionId: number, sentVersion: number, t: Transaction): Promise<{ action: PlanAction; plan: Plan }> {
  const found = await PlanAction.findByPk(actionId, { attributes: ['planId'], transaction: t });
  if (!found) throw notFound('That plan action');
  const plan = await lockPlan(found.planId, undefined, t);
  const action = await PlanAction.findByPk(actionId, { lock: t.LOCK.UPDATE, transaction: t });
  if (!action) throw notFound('That plan action');
  if (action.version !== sentVersion) {
    const current = (await livePlan(plan.id, t)).actions.find((a) => a.id === actionId);
    throw conflict(
      'stale_version',
      `Someone changed this action since you opened it (you had version ${sentVersion}, it is now ${action.version}). Look at what changed, then make your change again.`,
      { current },
    );
  }
  return { action, plan };
}

/** The stored action in the create payload's shape, so a change can be merged and checked whole. */
const inputOf = (a: PlanAction) => ({
  fieldId: a.fieldId,
  treatment: a.treatment,
  title: a.title,
  quantity: a.quantity,
  unit: a.unit,
  cost: a.cost,
  plannedOn: a.plannedOn,
  plannedFrom: a.plannedFrom,
  plannedTo: a.plannedTo,
  doneBy: a.doneBy,
  status: a.status,
  notes: a.notes,
});

export async function updateAction(sequelize: Sequelize, actor: Actor, actionId: number, patch: PlanActionUpdate): Promise<ActionAnswer> {
  return sequelize.transaction(async (t) => {
    const { action, plan } = await lockAction(actionId, patch.version, t);
    refuseStatus(patch.status, action.status);
    const { version: _version, ...changes } = patch;
    const given = Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined));
    // A new treatment without a title of its own takes the treatment's title.
    const merged = { ...inputOf(action), ...('treatment' in given && !('title' in given) ? { title: null } : {}), ...given };
    const parsed = PlanActionCreate.safeParse(merged);
    if (!parsed.success) {
      const d = describeIssues(parsed.error);
      throw badRequest('invalid_input', d.message, { issues: d.issues });
    }
    if (parsed.data.fieldId !== action.fieldId) await checkField(plan, parsed.data.fieldId, t);
    await openForEdit(plan, actor, t);
    await action.update({ ...valuesOf(parsed.data), version: action.version + 1, updatedBy: actor.userId }, { transaction: t });
    await recordEvent({ userId: actor.userId, farmId: plan.farmId, entity: 'plan_action', entityId: actionId, action: 'updated', detail: { planId: plan.id, changed: Object.keys(given) } }, t);
    return answer(plan.id, actionId, t);
  });
}

export async function deleteAction(sequelize: Sequelize, actor: Actor, actionId: number, version: number): Promise<ActionAnswer> {
  return sequelize.transaction(async (t) => {
    const { action, plan } = await lockAction(actionId, version, t);
    await openForEdit(plan, actor, t);
    await action.destroy({ transaction: t });
    await recordEvent(
      { userId: actor.userId, farmId: plan.farmId, entity: 'plan_action', entityId: actionId, action: 'deleted', detail: { planId: plan.id, fieldId: action.fieldId, title: action.title } },
      t,
    );
    return answer(plan.id, null, t);
  });
}

/**
 * POST /api/plans/:planId/actions/from-option: a field's treatment option for the plan's season,
 * one action per treatment it combines (shared/plan-from-option), in one transaction.
 */
export async function addOption(sequelize: Sequelize, actor: Actor, planId: number, input: { fieldId: number; optionId: string }): Promise<ActionAnswer> {
  const found = await Plan.findByPk(planId, { attributes: ['id', 'farmId'], include: [{ model: Season, as: 'season', attributes: ['label'] }] });
  if (!found) throw notFound('That plan');
  const field = await Field.findByPk(input.fieldId, { attributes: ['id', 'farmId'] });
  if (!field || field.farmId !== found.farmId) {
    throw badRequest('invalid_input', 'fieldId: there is no field with that id on this farm', { issues: [{ path: 'fieldId', message: 'there is no field with that id on this farm' }] });
  }
  // Only the option's typed quantities and costs go into the plan, so the notes' units do not matter here.
  const treatments = await fieldTreatmentsAnswer(sequelize, found.farmId, input.fieldId, found.season!.label, 'ha');
  const option = treatments.ok ? treatments.options.find((o) => o.id === input.optionId) : undefined;
  if (!option) {
    const message = `optionId: the field has no treatment option "${input.optionId}" for season ${found.season!.label}`;
    throw badRequest('invalid_input', message, { issues: [{ path: 'optionId', message: message.slice('optionId: '.length) }] });
  }
  const made = actionsFromOption(input.fieldId, option);
  return sequelize.transaction(async (t) => {
    const plan = await lockPlan(planId, undefined, t);
    await openForEdit(plan, actor, t);
    let firstId: number | null = null;
    for (const a of made) {
      const action = await PlanAction.create(
        { ...valuesOf(PlanActionCreate.parse(a)), planId, currency: plan.currency, createdBy: actor.userId, updatedBy: actor.userId },
        { transaction: t },
      );
      firstId ??= action.id;
      await recordEvent(
        { userId: actor.userId, farmId: plan.farmId, entity: 'plan_action', entityId: action.id, action: 'created', detail: { planId, fieldId: a.fieldId, treatment: a.treatment, option: option.id } },
        t,
      );
    }
    return answer(planId, firstId, t);
  });
}
