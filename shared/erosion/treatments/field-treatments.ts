// A field's treatment options: every single treatment the field can take, and the sensible
// combinations (never two tillage systems or two support practices together), each with the A,
// runoff, tonnes saved, quantities, cost and cautions it gives; and the browser's what-if.
import type { EstimateInputParsed, EstimateSuccess } from '../../schemas/estimate';
import { fail, succeed, type Result } from '../assert';
import { CAUTION_PLANNING_AID } from '../estimate';
import { coverCropPlan, noTillPlan, reducedTillPlan } from './cover-and-tillage';
import type { Family, Plan, PlanResult, SiteContext } from './plan';
import { round2 } from './plan';
import { runPlans, siteContext } from './run-plans';
import { gypsumPlan, limePlan, organicMatterPlan } from './soil-amendments';
import { contourPlan, stripCroppingPlan, terracesPlan } from './support-practices';
import { TREATMENT_KEYS, type CostLine, type FactorChange, type FieldTreatments, type TreatmentKey, type TreatmentOption, type TreatmentQuantity, type TreatmentSite, type Unavailable } from './types';
import { filterStripPlan, grassedWaterwayPlan } from './water-paths';
import { drainagePlan, permanentCoverPlan, raisedBedsPlan } from './wet-ground';

const PLANNERS: Record<TreatmentKey, (ctx: SiteContext) => PlanResult> = {
  'cover-crop': coverCropPlan,
  'no-till': noTillPlan,
  'reduced-till': reducedTillPlan,
  'contour-farming': contourPlan,
  'strip-cropping': stripCroppingPlan,
  terraces: terracesPlan,
  'grassed-waterway': grassedWaterwayPlan,
  'filter-strip': filterStripPlan,
  gypsum: gypsumPlan,
  lime: limePlan,
  'organic-matter': organicMatterPlan,
  'raised-beds': raisedBedsPlan,
  drainage: drainagePlan,
  'permanent-cover': permanentCoverPlan,
};

export const TREATMENT_TITLES: Record<TreatmentKey, string> = {
  'cover-crop': 'Cover crop',
  'no-till': 'No-till',
  'reduced-till': 'Reduced tillage',
  'contour-farming': 'Contour farming',
  'strip-cropping': 'Contour strip cropping',
  terraces: 'Terraces',
  'grassed-waterway': 'Grassed waterway',
  'filter-strip': 'Filter strip',
  gypsum: 'Gypsum',
  lime: 'Lime',
  'organic-matter': 'Organic matter (compost)',
  'raised-beds': 'Raised or no-dig beds',
  drainage: 'Subsurface drainage',
  'permanent-cover': 'Permanent cover',
};

/** Combinations offered when every member is available. */
export const COMBINATIONS: TreatmentKey[][] = [
  ['no-till', 'cover-crop'],
  ['reduced-till', 'cover-crop'],
  ['contour-farming', 'cover-crop'],
  ['contour-farming', 'no-till'],
  ['contour-farming', 'no-till', 'cover-crop'],
  ['strip-cropping', 'cover-crop'],
  ['strip-cropping', 'no-till'],
  ['strip-cropping', 'no-till', 'cover-crop'],
  ['terraces', 'cover-crop'],
  ['terraces', 'no-till'],
  ['terraces', 'no-till', 'cover-crop'],
];

const unique = (xs: string[]) => [...new Set(xs)];

type Applied = { plans: Plan[]; input: EstimateInputParsed; result: EstimateSuccess; changes: FactorChange[]; notes: string[]; quantities: TreatmentQuantity[]; costLines: CostLine[]; effects: string[]; cautions: string[] };

function applyPlans(ctx: SiteContext, plans: Plan[]): Result<Applied> {
  const run = runPlans(ctx, plans);
  if (!run.ok) return run;
  return succeed({
    plans,
    ...run.value,
    quantities: plans.flatMap((p) => p.quantities),
    costLines: plans.flatMap((p) => p.costLines),
    effects: unique([...plans.flatMap((p) => p.effects), ...run.value.notes]),
    cautions: unique([...plans.flatMap((p) => p.cautions), CAUTION_PLANNING_AID]),
  });
}

function toOption(ctx: SiteContext, a: Applied): TreatmentOption {
  const keys = a.plans.map((p) => p.key);
  const total = round2(a.costLines.reduce((s, l) => s + l.total, 0));
  const aNow = ctx.base.soilLoss.tPerHaYr;
  const aNew = a.result.soilLoss.tPerHaYr;
  const saved = (aNow - aNew) * ctx.site.areaHa;
  return {
    id: keys.join('+'),
    treatments: keys,
    title: keys.map((k) => TREATMENT_TITLES[k]).join(' + '),
    soilLossTPerHaYr: aNew,
    aOverT: a.result.aOverT,
    runoffMm: a.result.runoff?.runoffMm ?? null,
    tonnesSavedPerYr: saved,
    quantities: a.quantities,
    cost: { total, currency: ctx.site.currency, lines: a.costLines },
    tonnesSavedPerMoney: total > 0 ? saved / total : null,
    reachesT: a.result.aOverT <= 1,
    cheapestUnderT: false,
    changes: a.changes,
    effects: a.effects,
    cautions: a.cautions,
  };
}

/** Options lowering A first: those under T by cost, then by soil saved per money; options that do not lower A last, by cost. */
function compareOptions(a: TreatmentOption, b: TreatmentOption): number {
  const lowers = (o: TreatmentOption) => o.tonnesSavedPerYr > 1e-9;
  if (lowers(a) !== lowers(b)) return lowers(a) ? -1 : 1;
  if (!lowers(a)) return a.cost.total - b.cost.total || a.id.localeCompare(b.id);
  if (a.reachesT !== b.reachesT) return a.reachesT ? -1 : 1;
  if (a.reachesT) return a.cost.total - b.cost.total || a.soilLossTPerHaYr - b.soilLossTPerHaYr;
  const per = (o: TreatmentOption) => o.tonnesSavedPerMoney ?? Infinity;
  return per(b) - per(a) || b.tonnesSavedPerYr - a.tonnesSavedPerYr;
}

/** Every option the field can take, sorted; the cheapest one bringing A under T marked (only when A is over T now). */
export function fieldTreatments(site: TreatmentSite): Result<FieldTreatments> {
  const c = siteContext(site);
  if (!c.ok) return c;
  const ctx = c.value;
  const plans = new Map<TreatmentKey, Plan>();
  const unavailable: Unavailable[] = [];
  for (const key of TREATMENT_KEYS) {
    const r = PLANNERS[key](ctx);
    if (r.ok) plans.set(key, r.plan);
    else unavailable.push(r.unavailable);
  }
  const sets: Plan[][] = [...plans.values()].map((p) => [p]);
  for (const combo of COMBINATIONS) {
    if (combo.every((k) => plans.has(k))) sets.push(combo.map((k) => plans.get(k)!));
  }
  const options: TreatmentOption[] = [];
  for (const set of sets) {
    const a = applyPlans(ctx, set);
    if (a.ok) options.push(toOption(ctx, a.value));
    else if (set.length === 1) unavailable.push({ key: set[0].key, reason: a.reason });
  }
  options.sort(compareOptions);
  const base = ctx.base;
  if (base.aOverT > 1) {
    const cheapest = options.find((o) => o.reachesT && o.tonnesSavedPerYr > 0);
    if (cheapest) cheapest.cheapestUnderT = true;
  }
  return succeed({
    current: {
      soilLossTPerHaYr: base.soilLoss.tPerHaYr,
      aOverT: base.aOverT,
      runoffMm: base.runoff?.runoffMm ?? null,
      tonnesPerYr: base.soilLoss.tPerHaYr * site.areaHa,
    },
    options,
    unavailable,
  });
}

export type AppliedTreatments = {
  input: EstimateInputParsed;
  estimate: EstimateSuccess;
  changes: FactorChange[];
  quantities: TreatmentQuantity[];
  cost: { total: number; currency: string; lines: CostLine[] };
  effects: string[];
  cautions: string[];
};

/** Permanent cover replaces the crop, so no tillage or cover crop goes with it. */
const clashes = (a: Family, b: Family) => [a, b].includes('land-use') && [a, b].some((f) => f === 'tillage' || f === 'cover-crop');
function clashWords(a: Family, b: Family): string {
  if (a !== b) return 'permanent cover replaces the crop that tillage or a cover crop would go with';
  return a === 'tillage' ? 'two tillage systems' : a === 'support-practice' ? 'two support practices' : 'both do the same job';
}

/** The browser's what-if: the field with the chosen treatments. Unknown, clashing or unavailable treatments fail in words. */
export function applyTreatments(site: TreatmentSite, keys: TreatmentKey[]): Result<AppliedTreatments> {
  for (const k of keys) if (!TREATMENT_KEYS.includes(k)) return fail(`'${String(k)}' is not a treatment the engine knows`);
  if (new Set(keys).size !== keys.length) return fail('a treatment is listed twice');
  const c = siteContext(site);
  if (!c.ok) return c;
  const plans: Plan[] = [];
  for (const k of keys) {
    const r = PLANNERS[k](c.value);
    if (!r.ok) return fail(`${TREATMENT_TITLES[k]}: ${r.unavailable.reason}`);
    const clash = plans.find((p) => p.family === r.plan.family || clashes(p.family, r.plan.family));
    if (clash) return fail(`${TREATMENT_TITLES[clash.key]} and ${TREATMENT_TITLES[k]} cannot go together: ${clashWords(clash.family, r.plan.family)}`);
    plans.push(r.plan);
  }
  const a = applyPlans(c.value, plans);
  if (!a.ok) return a;
  const v = a.value;
  return succeed({
    input: v.input,
    estimate: v.result,
    changes: v.changes,
    quantities: v.quantities,
    cost: { total: round2(v.costLines.reduce((s, l) => s + l.total, 0)), currency: site.currency, lines: v.costLines },
    effects: v.effects,
    cautions: v.cautions,
  });
}
