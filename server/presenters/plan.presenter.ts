// Season plans as the API shows them. Pure: rows and the names of the people in them in,
// shapes out; the landowner's view is the same shape cut down to their own fields.
import { NO_FOLLOW_UP, type Plan as PlanShape, type PlanAction as PlanActionShape, type PlanComment as PlanCommentShape, type PlanFieldPrediction, type PlanFieldTotal, type PlanPerson } from '../../shared/schemas/plans';
import type { Plan, PlanAction, PlanComment, PlanVersion } from '../models';

/** Names of the people a plan mentions, by user id. */
export type People = Map<number, string>;

const person = (people: People, id: number | null): PlanPerson => (id == null ? null : { id, name: people.get(id) ?? 'a former member' });
const iso = (d: Date | null | undefined) => (d ? new Date(d).toISOString() : null);

export function presentAction(a: PlanAction, fieldName: string, people: People): PlanActionShape {
  return {
    id: a.id,
    planId: a.planId,
    fieldId: a.fieldId,
    fieldName,
    treatment: a.treatment,
    title: a.title,
    quantity: a.quantity,
    unit: a.unit,
    cost: a.cost,
    currency: a.currency,
    plannedOn: a.plannedOn,
    plannedFrom: a.plannedFrom,
    plannedTo: a.plannedTo,
    doneBy: a.doneBy,
    status: a.status,
    notes: a.notes,
    version: a.version,
    createdBy: person(people, a.createdBy),
    updatedBy: person(people, a.updatedBy),
    updatedAt: new Date(a.updatedAt).toISOString(),
    doneOn: a.doneOn ?? null,
    appliedQuantity: a.appliedQuantity ?? null,
    doneNote: a.doneNote ?? null,
    doneRecordedBy: person(people, a.doneByUser ?? null),
    doneRecordedAt: iso(a.doneAt),
    checkedBy: person(people, a.checkedBy ?? null),
    checkedAt: iso(a.checkedAt),
    hasPhoto: Boolean(a.photoKey),
  };
}

export const presentComment = (c: PlanComment, people: People): PlanCommentShape => ({
  id: c.id,
  actionId: c.actionId,
  revision: c.revision,
  kind: c.kind,
  author: person(people, c.authorId),
  body: c.body,
  createdAt: new Date(c.createdAt).toISOString(),
});

const roundMoney = (x: number) => Math.round(x * 100) / 100;

/** Cost per field (in the order fields first appear) and for the whole plan. */
export function planTotals(actions: PlanActionShape[]): PlanShape['totals'] {
  const byField = new Map<number, PlanFieldTotal>();
  for (const a of actions) {
    const t = byField.get(a.fieldId) ?? { fieldId: a.fieldId, fieldName: a.fieldName, actions: 0, cost: 0 };
    t.actions += 1;
    t.cost = roundMoney(t.cost + (a.cost ?? 0));
    byField.set(a.fieldId, t);
  }
  const fields = [...byField.values()];
  return { cost: roundMoney(fields.reduce((s, f) => s + f.cost, 0)), fields };
}

export type PlanRows = {
  plan: Plan;
  season: string;
  actions: { action: PlanAction; fieldName: string }[];
  comments: PlanComment[];
  approvedRevision: number | null;
  people: People;
};

/** Tonnes a year saved over the fields whose prediction could be made. */
export const sumSaved = (fields: PlanFieldPrediction[]) => fields.reduce((s, f) => s + (f.ok ? f.tonnesSavedPerYr : 0), 0);

/** The plan without its prediction, which needs the treatment engine (plan-prediction service). */
export function presentPlan({ plan, season, actions, comments, approvedRevision, people }: PlanRows): Omit<PlanShape, 'prediction'> {
  const shown = actions.map(({ action, fieldName }) => presentAction(action, fieldName, people));
  return {
    id: plan.id,
    farmId: plan.farmId,
    season,
    state: plan.state,
    version: plan.version,
    revision: plan.revision,
    approvedRevision,
    frozen: false,
    currency: plan.currency,
    createdBy: person(people, plan.createdBy),
    submittedBy: person(people, plan.submittedBy),
    submittedAt: iso(plan.submittedAt),
    returnedBy: person(people, plan.returnedBy),
    returnedAt: iso(plan.returnedAt),
    approvedBy: person(people, plan.approvedBy),
    approvedAt: iso(plan.approvedAt),
    actions: shown,
    totals: planTotals(shown),
    comments: comments.map((c) => presentComment(c, people)),
  };
}

/** A frozen approved revision as stored (the plan as it was, comments left with the live plan). */
export const presentFrozen = (v: PlanVersion): PlanShape => ({ ...v.snapshot, actions: v.snapshot.actions.map((a) => ({ ...NO_FOLLOW_UP, ...a })), frozen: true });

/** A plan cut down to the fields a landowner owns: their actions, totals and predictions, no review conversation. */
export function forLandowner(plan: PlanShape, ownedFieldIds: Set<number>): PlanShape {
  const actions = plan.actions.filter((a) => ownedFieldIds.has(a.fieldId));
  const fields = plan.prediction.fields.filter((f) => ownedFieldIds.has(f.fieldId));
  return { ...plan, actions, totals: planTotals(actions), prediction: { fields, tonnesSavedPerYr: sumSaved(fields) }, comments: [] };
}
