// Runs the engine on a field with one or more treatment plans applied: the changed input, the
// estimate, and each factor that moved (from → to, and why). The runoff row follows the new
// cropping and practice when the current row was itself taken from them (TR-55 tables 2-2b, 2-2c).
import { EstimateInput, type EstimateInputParsed, type EstimateSuccess } from '../../schemas/estimate';
import { fail, succeed, type Result } from '../assert';
import { curveNumberCover, type CroppingForCurveNumber } from '../curve-number-cover';
import { estimate } from '../estimate';
import type { Plan, SiteContext } from './plan';
import type { FactorChange, FactorKey, TreatmentSite } from './types';

/** Parses the site's input and runs the engine on it as it is now. */
export function siteContext(site: TreatmentSite): Result<SiteContext> {
  if (!(site.areaHa > 0) || !Number.isFinite(site.areaHa)) return fail('the field needs an area > 0 ha');
  const parsed = EstimateInput.safeParse(site.input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return fail(`${issue.path.join('.') || 'input'}: ${issue.message}`);
  }
  const base = estimate(parsed.data);
  if (!base.ok) return fail(base.reason);
  return succeed({ site, input: parsed.data, base });
}

function cropping(inp: EstimateInputParsed): CroppingForCurveNumber | null {
  if (inp.c.from !== 'table' || inp.p.from !== 'practice') return null;
  const c = inp.c;
  return { crop: c.crop, tillage: c.tillage ?? null, residuePct: c.residuePct ?? null, groundCoverPct: c.groundCoverPct ?? null, coverCrop: c.coverCrop, practice: inp.p.practice };
}

/** Moves the runoff row to the new cropping when the current row came from the current cropping. */
function followRunoffRow(before: EstimateInputParsed, after: EstimateInputParsed): EstimateInputParsed {
  const ro = after.runoff;
  if (!ro || ro.cn !== undefined) return after;
  const was = cropping(before);
  const now = cropping(after);
  if (!was || !now) return after;
  const old = curveNumberCover(was);
  const derived = ro.cover === old.cover && (ro.treatment ?? null) === old.treatment && (ro.condition ?? null) === old.condition;
  if (!derived) return after;
  const row = curveNumberCover(now);
  return { ...after, runoff: { ...ro, cover: row.cover, treatment: row.treatment, condition: row.condition } };
}

export type PlansRun = { input: EstimateInputParsed; result: EstimateSuccess; changes: FactorChange[] };

const slopeLengthOf = (inp: EstimateInputParsed, r: EstimateSuccess) => r.practice?.effectiveSlopeLengthM ?? inp.slopeLengthM;

/** Applies the plans in order and runs the engine. */
export function runPlans(ctx: SiteContext, plans: Plan[]): Result<PlansRun> {
  let input = ctx.input;
  for (const p of plans) if (p.modify) input = p.modify(input);
  input = followRunoffRow(ctx.input, input);
  const result = estimate(input);
  if (!result.ok) return fail(`the engine could not run with ${plans.map((p) => p.key).join(' + ')}: ${result.reason}`);
  const base = ctx.base;
  const pairs: [FactorKey, number | undefined, number | undefined][] = [
    ['C', base.factors.c.value, result.factors.c.value],
    ['P', base.factors.p.value, result.factors.p.value],
    ['slope length', slopeLengthOf(ctx.input, base), slopeLengthOf(input, result)],
    ['K', base.factors.k.value, result.factors.k.value],
    ['curve number', base.runoff?.cn.value, result.runoff?.cn.value],
  ];
  const changes: FactorChange[] = [];
  for (const [factor, from, to] of pairs) {
    if (from === undefined || to === undefined || Math.abs(from - to) < 1e-12) continue;
    const why = plans.map((p) => p.whys[factor]).filter(Boolean).join('; ');
    changes.push({ factor, from, to, why: why || 'follows from the other changes' });
  }
  return succeed({ input, result, changes });
}
