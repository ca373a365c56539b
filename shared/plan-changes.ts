// What changed between two versions of a season plan, action by action: added, removed, and
// each changed action with the parts that differ. Used for the versions list and by the client
// after a 409, to show what someone else changed.
import type { ActionFieldChange, PlanAction, PlanChanges } from './schemas/plans';

/** The parts of an action a person changes (not its version, editor or timestamps). */
const COMPARED: (keyof PlanAction)[] = ['fieldId', 'treatment', 'title', 'quantity', 'unit', 'cost', 'plannedOn', 'plannedFrom', 'plannedTo', 'doneBy', 'status', 'notes'];

export function actionChanges(before: PlanAction, after: PlanAction): ActionFieldChange[] {
  return COMPARED.filter((k) => before[k] !== after[k]).map((key) => ({ key, from: before[key], to: after[key] }));
}

export function planChanges(before: { revision: number; actions: PlanAction[] }, after: { actions: PlanAction[] }): PlanChanges {
  const old = new Map(before.actions.map((a) => [a.id, a]));
  const now = new Set(after.actions.map((a) => a.id));
  const changed: PlanChanges['changed'] = [];
  for (const a of after.actions) {
    const b = old.get(a.id);
    if (!b) continue;
    const fields = actionChanges(b, a);
    if (fields.length) changed.push({ actionId: a.id, title: a.title, fieldName: a.fieldName, fields });
  }
  return {
    fromRevision: before.revision,
    added: after.actions.filter((a) => !old.has(a.id)),
    removed: before.actions.filter((a) => !now.has(a.id)),
    changed,
  };
}
