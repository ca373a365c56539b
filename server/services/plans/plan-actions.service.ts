// Adding, changing and removing a plan's actions: one transaction each with the plan locked,
// the action's version checked on change and removal (409 when stale), an audit event, and the
// whole plan in the answer (its version, state and revision move with every action change).
import type { Sequelize, Transaction } from 'sequelize';
import { TREATMENT_TITLES } from '../../../shared/erosion/treatments/field-treatments';
import { PlanActionCreate, type PlanAction as PlanActionShape, type Plan as PlanShape, type PlanActionUpdate } from '../../../shared/schemas/plans';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import { describeIssues } from '../../middleware/validate';
import { Field, PlanAction, type Plan } from '../../models';
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

async function answer(planId: number, actionId: number | null, t: Transaction): Promise<ActionAnswer> {
  const plan = await livePlan(planId, t);
  return { plan, action: plan.actions.find((a) => a.id === actionId) ?? null };
}

export async function addAction(sequelize: Sequelize, actor: Actor, planId: number, input: ActionInput): Promise<ActionAnswer> {
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
async function lockAction(actionId: number, sentVersion: number, t: Transaction): Promise<{ action: PlanAction; plan: Plan }> {
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
