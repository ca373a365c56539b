// Ground with shallow gray or mottled subsoil (a high water table): raised or no-dig beds,
// designed subsurface drainage (NRCS 606) or permanent cover (NRCS 327) instead of amendments.
// Offered only on such ground.
import { ADEQUATELY_DRAINED_MIN_DEPTH_CM } from '../runoff';
import { cautionsFor } from './cautions';
import { cannot, costLine, isPlanResult, offer, tableC, type PlanResult, type SiteContext } from './plan';
import type { TreatmentKey } from './types';

const onlyWet = (ctx: SiteContext, key: TreatmentKey): PlanResult | null =>
  ctx.site.soil.notWorthAmending ? null : cannot(key, 'offered for ground with shallow gray or mottled subsoil; the soil checks show none on this field');

const area = (ctx: SiteContext) => [{ item: 'area', amount: ctx.site.areaHa, unit: 'ha' }];

export function raisedBedsPlan(ctx: SiteContext): PlanResult {
  const no = onlyWet(ctx, 'raised-beds');
  if (no) return no;
  return offer({
    key: 'raised-beds',
    family: 'raised-beds',
    whys: {},
    quantities: area(ctx),
    costLines: [costLine(ctx.site, 'raised-beds-per-ha', ctx.site.areaHa, 'ha')],
    effects: ['Lifts the root zone above the wet subsoil.', 'No RUSLE or curve-number change is predicted for beds: A and runoff stay as they are.'],
    cautions: cautionsFor('raised-beds'),
  });
}

/**
 * The water-table depth a drainage design is asked to hold: the depth from which NEH 630 ch. 7
 * lets a drained dual group take its first letter. A design deeper or shallower changes it.
 */
const DESIGN_DRAINED_DEPTH_CM = ADEQUATELY_DRAINED_MIN_DEPTH_CM;

export function drainagePlan(ctx: SiteContext): PlanResult {
  const no = onlyWet(ctx, 'drainage');
  if (no) return no;
  const ro = ctx.input.runoff;
  const dual = !!ro && ro.cn === undefined && !!ro.hsg && ro.hsg.includes('/') && !ro.drained;
  return offer({
    key: 'drainage',
    family: 'drainage',
    ...(dual ? { modify: (inp) => ({ ...inp, ...(inp.runoff ? { runoff: { ...inp.runoff, drained: true, drainedWaterTableDepthCm: DESIGN_DRAINED_DEPTH_CM } } : {}) }) } : {}),
    whys: dual ? { 'curve number': `soil group ${ro!.hsg} drained to keep the water table ${DESIGN_DRAINED_DEPTH_CM} cm or more below the surface takes its first letter's curve number (NEH 630 ch. 7; TR-55 ch. 2)` } : {},
    quantities: area(ctx),
    costLines: [costLine(ctx.site, 'drainage-per-ha', ctx.site.areaHa, 'ha')],
    effects: [
      'Lowers the water table so the root zone drains.',
      dual ? 'Runoff follows the drained soil group.' : 'No curve-number change is predicted: the soil group is not a dual (drained/undrained) group.',
      'RUSLE A does not change.',
    ],
    cautions: cautionsFor('drainage'),
  });
}

export function permanentCoverPlan(ctx: SiteContext): PlanResult {
  const no = onlyWet(ctx, 'permanent-cover');
  if (no) return no;
  const c = tableC(ctx, 'permanent-cover');
  if (isPlanResult(c)) return c;
  if (c.crop === 'hay or meadow') return cannot('permanent-cover', 'the field is already in hay or meadow');
  return offer({
    key: 'permanent-cover',
    family: 'land-use',
    modify: (inp) => ({ ...inp, c: { from: 'table', crop: 'hay or meadow', coverCrop: false } }),
    whys: { C: 'established grass or meadow: the C table\'s hay or meadow row', 'curve number': 'TR-55 meadow row' },
    quantities: area(ctx),
    costLines: [costLine(ctx.site, 'permanent-cover-per-ha', ctx.site.areaHa, 'ha')],
    effects: ['Takes the field out of annual crops.', 'It does not change K, LS or P.'],
    cautions: [],
  });
}
