// What a plan's treatments would do: for each field with actions, the treatment engine applied
// to the field as the season's assessment has it, with every engine treatment planned there
// (actions of typed work change nothing the engine models). A in t/ha/yr, A/T, tonnes a year.
import { applyTreatments } from '../../../shared/erosion/treatments/field-treatments';
import { TREATMENT_KEYS, type TreatmentKey } from '../../../shared/erosion/treatments/types';
import type { PlanAction, PlanFieldPrediction, PlanPrediction } from '../../../shared/schemas/plans';
import type { FarmTreatmentsAnswer } from '../../../shared/schemas/treatments';
import type { Units } from '../../../shared/schemas/auth';
import { Plan } from '../../models';
import { sumSaved } from '../../presenters/plan.presenter';
import { farmTreatments } from '../treatments/farm-treatments.service';

const isEngineKey = (k: string): k is TreatmentKey => (TREATMENT_KEYS as readonly string[]).includes(k);

/** The engine's treatments planned on each field, in the order the actions were added, once each. */
function treatmentsByField(actions: PlanAction[]): Map<number, { fieldName: string; keys: TreatmentKey[] }> {
  const byField = new Map<number, { fieldName: string; keys: TreatmentKey[] }>();
  for (const a of actions) {
    const f = byField.get(a.fieldId) ?? { fieldName: a.fieldName, keys: [] };
    if (isEngineKey(a.treatment) && !f.keys.includes(a.treatment)) f.keys.push(a.treatment);
    byField.set(a.fieldId, f);
  }
  return byField;
}

/** Pure: each field's answer from the treatments service, with its planned treatments applied. */
export function predictFromOptions(actions: PlanAction[], options: FarmTreatmentsAnswer): PlanPrediction {
  const answers = new Map(options.fields.map((f) => [f.fieldId, f]));
  const fields: PlanFieldPrediction[] = [];
  for (const [fieldId, { fieldName, keys }] of treatmentsByField(actions)) {
    const base = { fieldId, fieldName, treatments: keys };
    const answer = answers.get(fieldId)?.answer;
    if (!answer || !answer.ok) {
      fields.push({ ...base, ok: false, reason: answer && !answer.ok ? answer.reason : 'The field cannot be assessed for this season yet.' });
      continue;
    }
    const areaHa = answer.site.areaHa;
    const current = { soilLossTPerHaYr: answer.current.soilLossTPerHaYr, aOverT: answer.current.aOverT, tonnesPerYr: answer.current.tonnesPerYr };
    if (keys.length === 0) {
      fields.push({ ...base, ok: true, current, planned: current, tonnesSavedPerYr: 0, reachesT: current.aOverT <= 1, effects: [] });
      continue;
    }
    const applied = applyTreatments(answer.site, keys);
    if (!applied.ok) {
      fields.push({ ...base, ok: false, reason: applied.reason });
      continue;
    }
    const soilLossTPerHaYr = applied.value.estimate.soilLoss.tPerHaYr;
    const planned = { soilLossTPerHaYr, aOverT: applied.value.estimate.aOverT, tonnesPerYr: soilLossTPerHaYr * areaHa };
    fields.push({
      ...base,
      ok: true,
      current,
      planned,
      tonnesSavedPerYr: current.tonnesPerYr - planned.tonnesPerYr,
      reachesT: planned.aOverT <= 1,
      effects: applied.value.effects,
    });
  }
  return { fields, tonnesSavedPerYr: sumSaved(fields) };
}

/**
 * The prediction for a plan's actions in its farm and season, its effects worded in the reader's
 * units (a prediction frozen with an approval keeps the words of the one who approved it).
 */
export async function predictPlan(plan: { farmId: number; season: string; actions: PlanAction[] }, units: Units = 'ha'): Promise<PlanPrediction> {
  const fieldIds = [...new Set(plan.actions.map((a) => a.fieldId))];
  if (fieldIds.length === 0) return { fields: [], tonnesSavedPerYr: 0 };
  const options = await farmTreatments(Plan.sequelize!, { farmId: plan.farmId, seasonLabel: plan.season, fieldIds, units });
  return predictFromOptions(plan.actions, options);
}
