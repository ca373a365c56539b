// What one treatment does to a field, before the engine runs: how it changes the estimate input,
// what it takes (quantities, cost lines), what it does outside RUSLE, and its cautions. Each
// treatment module turns a site into a Plan, or says why it cannot be offered.
import type { EstimateInputParsed, EstimateSuccess } from '../../schemas/estimate';
import type { PriceKey } from '../../schemas/treatments';
import type { CostLine, FactorKey, TreatmentKey, TreatmentQuantity, TreatmentSite, Unavailable } from './types';

/** Treatments of one family exclude each other (never two tillage systems, never two support practices). */
export type Family = 'tillage' | 'cover-crop' | 'support-practice' | 'waterway' | 'filter-strip' | 'lime' | 'gypsum' | 'organic-matter' | 'raised-beds' | 'drainage' | 'land-use';

export type Plan = {
  key: TreatmentKey;
  family: Family;
  /** A changed copy of the estimate input; absent for treatments no RUSLE or curve-number factor shows. */
  modify?: (input: EstimateInputParsed) => EstimateInputParsed;
  /** Why each factor it changes moves, for a person. */
  whys: Partial<Record<FactorKey, string>>;
  quantities: TreatmentQuantity[];
  costLines: CostLine[];
  effects: string[];
  cautions: string[];
};

export type PlanResult = { ok: true; plan: Plan } | { ok: false; unavailable: Unavailable };

/** The site, its parsed estimate input, and the engine's answer for it as it is now. */
export type SiteContext = { site: TreatmentSite; input: EstimateInputParsed; base: EstimateSuccess };

export const offer = (plan: Plan): PlanResult => ({ ok: true, plan });
export const cannot = (key: TreatmentKey, reason: string, needs?: Unavailable['needs']): PlanResult => ({
  ok: false,
  unavailable: needs ? { key, reason, needs } : { key, reason },
});

/** One cost line: quantity × the farm's price for the item. */
export function costLine(site: TreatmentSite, priceKey: PriceKey, quantity: number, unit: string): CostLine {
  const unitPrice = site.prices[priceKey];
  return { priceKey, quantity, unit, unitPrice, total: round2(quantity * unitPrice) };
}

export const round2 = (x: number): number => Math.round(x * 100) / 100;

/** The C input as a table lookup, or why a C-changing treatment cannot be predicted. */
export function tableC(ctx: SiteContext, key: TreatmentKey): Extract<EstimateInputParsed['c'], { from: 'table' }> | PlanResult {
  const c = ctx.input.c;
  if (c.from === 'value') return cannot(key, 'C was typed in as a value, so what this treatment does to C cannot be predicted; choose the cropping from the table to compare');
  if (c.from === 'subfactors') return cannot(key, 'C comes from typed subfactor periods: change the periods themselves to see this treatment');
  return c;
}

/** The P input as a practice, or why a support practice cannot be predicted. */
export function practiceP(ctx: SiteContext, key: TreatmentKey): Extract<EstimateInputParsed['p'], { from: 'practice' }> | PlanResult {
  const p = ctx.input.p;
  if (p.from === 'value') return cannot(key, 'P was typed in as a value, so what this practice does to P cannot be predicted; choose the support practice instead');
  return p;
}

export const isPlanResult = (x: unknown): x is PlanResult => typeof x === 'object' && x !== null && 'ok' in x;
