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

/** Is the current runoff row the one the current cropping gives (so it may follow a new cropping)? */
function runoffRowFollowsCropping(inp: EstimateInputParsed): boolean {
  const ro = inp.runoff;
  const was = cropping(inp);
  if (!ro || ro.cn !== undefined || !was) return false;
  const old = curveNumberCover(was);
  return ro.cover === old.cover && (ro.treatment ?? null) === old.treatment && (ro.condition ?? null) === old.condition;
}

/** Moves the runoff row to the new cropping and practice. */
function followRunoffRow(after: EstimateInputParsed): EstimateInputParsed {
  const now = cropping(after);
  if (!after.runoff || !now) return after;
  const row = curveNumberCover(now);
  return { ...after, runoff: { ...after.runoff, cover: row.cover, treatment: row.treatment, condition: row.condition } };
}

export type PlansRun = { input: EstimateInputParsed; result: EstimateSuccess; changes: FactorChange[]; notes: string[] };

const slopeLengthOf = (inp: EstimateInputParsed, r: EstimateSuccess) => r.practice?.effectiveSlopeLengthM ?? inp.slopeLengthM;

/** Applies the plans in order and runs the engine. */
export function runPlans(ctx: SiteContext, plans: Plan[]): Result<PlansRun> {
  let input = ctx.input;
  for (const p of plans) if (p.modify) input = p.modify(input);
  const follows = runoffRowFollowsCropping(ctx.input);
  if (follows) input = followRunoffRow(input);
  const result = estimate(input);
  if (!result.ok) return fail(`the figures for ${plans.map((p) => p.key).join(' + ')} could not be worked out: ${result.reason}`);
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
  const notes: string[] = [];
  const wantsCn = plans.some((p) => p.whys['curve number']);
  const ro = ctx.input.runoff;
  if (wantsCn && ro && (ro.cn !== undefined || (!follows && !changes.some((x) => x.factor === 'curve number')))) {
    notes.push(
      ro.cn !== undefined
        ? 'The curve number was typed in, so what this does to runoff cannot be predicted: runoff stays as typed.'
        : "The runoff row was chosen by hand, not from the cropping, so it is left as it is: runoff is not predicted to change.",
    );
  }
  return succeed({ input, result, changes, notes });
}
