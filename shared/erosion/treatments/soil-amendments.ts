// Lime, gypsum and organic matter for a field, from its soil checks. Lime and gypsum change no
// RUSLE factor (said so); organic matter lowers K through the nomograph's organic-matter term.
// On ground with shallow gray or mottled subsoil none of them is offered.
import { compostQuantity } from '../amendments';
import { gypsumQuantity, sodicGypsumOrder, SODIC_ESP_PCT, type SodicGypsumResult } from '../gypsum';
import { limeRequirement } from '../lime';
import { ASSUMED_OM_RISE_PCT, kAfterOrganicMatterRise } from '../organic-matter-k';
import type { Quantity } from '../amendments';
import type { PermeabilityCode, StructureCode } from '../k-factor';
import { kSiToUs, tonPerAcToTPerHa } from '../units';
import { cautionsFor } from './cautions';
import { cannot, costLine, offer, round2, type PlanResult, type SiteContext } from './plan';
import type { TreatmentKey } from './types';
import { formatContent, formatFactor, formatRate, formatRateRange, formatShare } from '../../format/quantities';

const WET_GROUND =
  'shallow gray or mottled subsoil means a high water table: amendments will not fix this ground; raised or no-dig beds, designed drainage or permanent cover are the answer here';

const notWorth = (ctx: SiteContext, key: TreatmentKey): PlanResult | null => (ctx.site.soil.notWorthAmending ? cannot(key, WET_GROUND) : null);

const spreadCosts = (ctx: SiteContext, priceKey: 'lime-per-t' | 'gypsum-per-t' | 'compost-per-t', q: Quantity) => [
  costLine(ctx.site, priceKey, round2(q.tonnes), 't'),
  costLine(ctx.site, 'spreading-per-ha', ctx.site.areaHa, 'ha'),
];

export function limePlan(ctx: SiteContext): PlanResult {
  const wet = notWorth(ctx, 'lime');
  if (wet) return wet;
  const { ph, bufferPh, bufferMethod } = ctx.site.soil;
  if (ph === null || bufferPh === null) return cannot('lime', 'the lime rate needs a soil check with pH and buffer pH', 'soil-check');
  if (bufferMethod === null) return cannot('lime', 'the lime rate needs the buffer method the lab used (SMP or Mehlich) with the buffer pH', 'buffer-method');
  const a = ctx.site.amendments;
  const r = limeRequirement({ method: bufferMethod, soilPh: ph, bufferPh, targetPh: a?.limeTargetPh, product: a?.limeProduct, areaHa: ctx.site.areaHa });
  if (!r.ok) return cannot('lime', r.reason, 'soil-check');
  const v = r.value;
  if (v.tonnes <= 0) return cannot('lime', v.reason);
  const exampleProduct = a?.limeProduct === undefined;
  return offer({
    key: 'lime',
    family: 'lime',
    whys: {},
    quantities: [
      {
        item: 'agricultural lime',
        amount: round2(v.tonnes),
        unit: 't',
        origin: { kind: v.flag === 'pub' ? 'published-table' : 'rule-of-thumb', source: { title: v.source }, detail: v.reason },
        note: `${formatRate(v.tPerHa, ctx.site.units)} of product: ${formatRate(tonPerAcToTPerHa(v.pureTonPerAc), ctx.site.units)} pure lime ÷ effective CCE ${formatContent(v.effectiveCcePct)} (CCE ${formatShare(v.product.ccePct)} × fineness ${formatFactor(v.finenessEfficiency)}, ${v.finenessRule})${exampleProduct ? '; product figures are example values — replace with your lime\'s label' : ''}`,
      },
    ],
    costLines: spreadCosts(ctx, 'lime-per-t', v),
    effects: [`Raises soil pH toward ${v.targetPh} over a season or two.`, 'Lime changes no RUSLE factor: A stays as it is.'],
    cautions: cautionsFor('lime'),
  });
}

export function gypsumPlan(ctx: SiteContext): PlanResult {
  const wet = notWorth(ctx, 'gypsum');
  if (wet) return wet;
  const { espPct, cecCmolPerKg, bulkDensityMgPerM3, problemClay } = ctx.site.soil;
  const a = ctx.site.amendments;
  const sodic = espPct !== null && espPct >= SODIC_ESP_PCT;
  let q: Quantity;
  let note: string;
  let origin: NonNullable<import('./types').TreatmentQuantity['origin']>;
  if (sodic) {
    if (cecCmolPerKg === null) return cannot('gypsum', `ESP ${espPct} % is sodic: the gypsum for it needs the soil's CEC from a soil check`, 'soil-check');
    const r = sodicGypsumOrder({
      cecCmolPerKg,
      espInitialPct: espPct,
      ...(bulkDensityMgPerM3 !== null ? { bulkDensityMgPerM3 } : {}),
      ...(a?.gypsumExchangeEfficiency !== undefined ? { exchangeEfficiency: a.gypsumExchangeEfficiency } : {}),
      ...(a?.gypsumPurityPct !== undefined ? { purityPct: a.gypsumPurityPct } : {}),
      areaHa: ctx.site.areaHa,
    });
    if (!r.ok) return cannot('gypsum', r.reason, 'soil-check');
    const v: SodicGypsumResult = r.value;
    q = v;
    origin = { kind: 'derived', source: { title: 'USDA Handbook 60 (gypsum requirement)' }, detail: `ESP ${espPct} % → ${v.espTargetPct} %, CEC ${cecCmolPerKg} cmolc/kg, top ${v.depthCm} cm` };
    note = `${formatRate(v.pureGypsumTPerHa, ctx.site.units)} pure gypsum × exchange efficiency ${formatFactor(v.exchangeEfficiency)} ÷ purity ${formatShare(v.purityPct)}${bulkDensityMgPerM3 === null ? '; bulk density 1.47 Mg/m³ taken (USDA Handbook 60\'s acre-foot)' : ''}`;
  } else if (problemClay) {
    q = gypsumQuantity({ areaHa: ctx.site.areaHa });
    origin = { kind: 'rule-of-thumb' };
    note = `for clay structure and infiltration: the ${ctx.site.units === 'ac' ? '1–2 US t/ac' : '2.2–4.5 t/ha (1–2 US t/ac)'} rule of thumb met with NRCS practice standard 333`;
  } else if (espPct === null) {
    return cannot('gypsum', 'gypsum is for sodic soils or problem clay: a soil check with ESP and CEC shows whether the field is sodic', 'soil-check');
  } else {
    return cannot('gypsum', `ESP ${espPct} % is below ${SODIC_ESP_PCT} % (not sodic) and the field shows no problem clay: gypsum is not called for`);
  }
  return offer({
    key: 'gypsum',
    family: 'gypsum',
    whys: {},
    quantities: [{ item: 'gypsum', amount: round2(q.tonnes), unit: 't', origin, note: `${formatRate(q.tPerHa, ctx.site.units)}; ${note}` }],
    costLines: spreadCosts(ctx, 'gypsum-per-t', q),
    effects: [
      sodic ? 'Replaces exchangeable sodium with calcium so the clay holds together and takes in water.' : 'May improve clay structure and water entry; results vary by soil.',
      'No published factor gives gypsum a change in K or the curve number, so A and runoff are shown as they are.',
    ],
    cautions: cautionsFor('gypsum'),
  });
}

export function organicMatterPlan(ctx: SiteContext): PlanResult {
  const wet = notWorth(ctx, 'organic-matter');
  if (wet) return wet;
  const { organicMatterPct, sandPct, siltPct, clayPct } = ctx.site.soil;
  if (organicMatterPct === null || sandPct === null || siltPct === null || clayPct === null) {
    return cannot('organic-matter', 'the effect on K needs a soil check with sand, silt, clay and organic matter', 'soil-check');
  }
  const k = ctx.input.k;
  const nomoCodes = k.from === 'nomograph' ? { structure: k.structure as StructureCode, ...(k.permeability !== undefined ? { permeability: k.permeability as PermeabilityCode } : {}) } : {};
  const kNowUs = kSiToUs(ctx.base.factors.k.value);
  const r = kAfterOrganicMatterRise({ kNowUs, organicMatterPct, sandPct, siltPct, clayPct, ...nomoCodes });
  if (!r.ok) return cannot('organic-matter', r.reason);
  const v = r.value;
  const q = compostQuantity({ areaHa: ctx.site.areaHa, purpose: 'build' });
  const hsg = ctx.base.runoff?.hsg;
  return offer({
    key: 'organic-matter',
    family: 'organic-matter',
    modify: (inp) => ({
      ...inp,
      k: { from: 'value', value: v.kNewUs, units: 'us' },
      // K typed as a value carries no texture, so keep the soil group the estimate took from it.
      ...(inp.runoff && !inp.runoff.hsg && inp.runoff.cn === undefined && hsg ? { runoff: { ...inp.runoff, hsg: hsg as NonNullable<typeof inp.runoff>['hsg'] } } : {}),
    }),
    whys: { K: `K × ${formatFactor(v.ratio)} through the nomograph's organic-matter term (AH-703 eq. 3-1); ${v.assumptions.join('; ')}` },
    quantities: [
      {
        item: 'compost',
        amount: round2(q.tonnes),
        unit: 't',
        origin: { kind: 'rule-of-thumb' },
        note: `${formatRate(q.tPerHa, ctx.site.units)} once to build organic matter (${formatRateRange(q.rangeTPerHa[0], q.rangeTPerHa[1], ctx.site.units)}; rule of thumb); the assumed +${formatContent(ASSUMED_OM_RISE_PCT)} organic matter comes after years, not at once`,
      },
    ],
    costLines: spreadCosts(ctx, 'compost-per-t', q),
    effects: ['The K change is what the nomograph shows for more organic matter; it comes slowly.', 'It does not change C, P, LS or the curve number here.'],
    cautions: cautionsFor('organic-matter'),
  });
}
