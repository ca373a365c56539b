// Contour farming (NRCS 330), strip cropping (NRCS 585) and terraces (NRCS 600): each changes P
// through supportPractice, with the slope-length limits beyond which it stops working; terraces
// also cut the slope length to the terrace interval. The curve number follows the TR-55 row
// (contoured; contoured and terraced).
import { STRIP_ROTATION_WORDS, supportPractice, type Practice, type StripRotation } from '../support-practice';
import { ftToM } from '../units';
import { cautionsFor } from './cautions';
import { cannot, costLine, isPlanResult, offer, practiceP, type PlanResult, type SiteContext } from './plan';
import type { TreatmentKey } from './types';
import { formatFactor, formatSlope } from '../../format/quantities';
import { formatLength } from '../../format/units';

const PRACTICE_OF: Record<'contour-farming' | 'strip-cropping' | 'terraces', Practice> = {
  'contour-farming': 'contouring',
  'strip-cropping': 'strip cropping',
  terraces: 'terraces',
};

/** Practices that already include what a new one would add. */
const INCLUDES: Record<Practice, Practice[]> = {
  none: [],
  contouring: ['contouring'],
  'strip cropping': ['contouring', 'strip cropping'],
  terraces: ['contouring', 'terraces'],
};

/**
 * Strips offered in the rotation that changes the farm's cropping least: row crop alternating
 * with winter grain, the least favourable column of AH-537 table 14. A rotation with meadow
 * lowers P further; the farmer chooses it on the Cropping tab.
 */
const OFFERED_STRIP_ROTATION: StripRotation = 'C';

/** Crops that cover the ground all year: contour tillage and strips of crops do not apply. */
const PERMANENT_COVER_CROPS = ['pasture', 'hay or meadow'];

function checkPractice(ctx: SiteContext, key: keyof typeof PRACTICE_OF, terraceIntervalM?: number) {
  const p = practiceP(ctx, key);
  if (isPlanResult(p)) return p;
  const practice = PRACTICE_OF[key];
  if (INCLUDES[p.practice].includes(practice)) return cannot(key, `the field already has ${p.practice}`);
  const c = ctx.input.c;
  if (key !== 'terraces' && c.from === 'table' && PERMANENT_COVER_CROPS.includes(c.crop)) {
    return cannot(key, `${practice} is for tilled crops; ${c.crop} already covers the ground all year`);
  }
  const stripRotation = key === 'strip-cropping' ? OFFERED_STRIP_ROTATION : undefined;
  const sp = supportPractice({ practice, slopePct: ctx.input.slopePct, slopeLengthM: ctx.input.slopeLengthM, terraceIntervalM, ...(stripRotation ? { stripRotation } : {}) });
  if (!sp.ok) return cannot(key, sp.reason);
  if (!sp.value.effective) return cannot(key, sp.value.notes.join('; '));
  return sp.value;
}

function layoutPlan(ctx: SiteContext, key: 'contour-farming' | 'strip-cropping'): PlanResult {
  const sp = checkPractice(ctx, key);
  if (isPlanResult(sp)) return sp;
  const strips = key === 'strip-cropping';
  return offer({
    key,
    family: 'support-practice',
    modify: (inp) => ({ ...inp, p: { from: 'practice', practice: sp.practice, ...(strips ? { stripRotation: OFFERED_STRIP_ROTATION } : {}) } }),
    whys: {
      P: `${sp.practice} at ${formatSlope(ctx.input.slopePct)} slope: P ${formatFactor(sp.p)} (${sp.source})${sp.maxLengthM !== undefined ? `, within its ${formatLength(sp.maxLengthM, ctx.site.units)} slope-length limit` : ''}`,
      'curve number': 'TR-55 row for contoured row crops',
    },
    quantities: [{ item: strips ? 'contour strips laid out' : 'contour lines laid out', amount: ctx.site.areaHa, unit: 'ha' }],
    costLines: [costLine(ctx.site, strips ? 'strip-layout-per-ha' : 'contour-layout-per-ha', ctx.site.areaHa, 'ha')],
    effects: [
      ...sp.notes,
      ...(strips
        ? [`P is for strips of ${STRIP_ROTATION_WORDS[OFFERED_STRIP_ROTATION]} (AH-537 table 14, rotation ${OFFERED_STRIP_ROTATION}); a rotation with meadow in it (A or B) lowers P further.`]
        : []),
      'It does not change C, K or the slope length.',
    ],
    cautions: [],
  });
}

export const contourPlan = (ctx: SiteContext): PlanResult => layoutPlan(ctx, 'contour-farming');
export const stripCroppingPlan = (ctx: SiteContext): PlanResult => layoutPlan(ctx, 'strip-cropping');

/** Rule-of-thumb terrace spacing: vertical interval VI = x·s + y (ft), x = 0.6 and y = 2.5 taken mid-range (x 0.4–0.8 by region, y 1–4 by soil and cover). */
export const TERRACE_SPACING_RULE = { x: 0.6, y: 2.5, words: 'terrace spacing VI = 0.6·s + 2.5 ft (mid-range x and y of the vertical-interval rule used with NRCS practice 600; rule of thumb)' };

/** Horizontal terrace interval, m, for a slope in %: VI/s, held within the contouring length limit. */
export function terraceIntervalM(slopePct: number): number {
  // VI = x·s + y (ft); horizontal interval = VI / (s/100)
  const viFt = TERRACE_SPACING_RULE.x * slopePct + TERRACE_SPACING_RULE.y;
  return ftToM((viFt * 100) / slopePct);
}

export function terracesPlan(ctx: SiteContext): PlanResult {
  const key: TreatmentKey = 'terraces';
  const slopePct = ctx.input.slopePct;
  if (slopePct < 2) return cannot(key, `the slope (${formatSlope(slopePct)}) is too gentle for terraces to be worth building`);
  const interval = terraceIntervalM(slopePct);
  if (interval >= ctx.input.slopeLengthM) return cannot(key, `the slope (${formatLength(ctx.input.slopeLengthM, ctx.site.units)}) is shorter than one terrace interval (${formatLength(interval, ctx.site.units)})`);
  const sp = checkPractice(ctx, 'terraces', interval);
  if (isPlanResult(sp)) return sp;
  const lengthM = (ctx.site.areaHa * 10_000) / interval;
  const grid = ctx.input.lsFromGrid !== undefined;
  return offer({
    key,
    family: 'support-practice',
    // estimate() takes LS on the terrace interval at the mean slope in place of the elevation model's.
    modify: (inp) => ({ ...inp, p: { from: 'practice' as const, practice: 'terraces' as const, terraceIntervalM: interval } }),
    whys: {
      P: `terraces farmed on the contour at ${formatSlope(slopePct)}: P ${formatFactor(sp.p)} (${sp.source})`,
      'slope length': `slope length becomes the terrace interval, ${formatLength(interval, ctx.site.units)}, by ${TERRACE_SPACING_RULE.words}${grid ? "; LS on that length at the mean slope replaces the elevation model's LS" : ''}`,
      'curve number': 'TR-55 row for contoured and terraced row crops',
    },
    quantities: [
      { item: 'terrace', amount: Math.round(lengthM), unit: 'm', origin: { kind: 'rule-of-thumb' }, note: `field area ÷ terrace interval ${formatLength(interval, ctx.site.units)}` },
    ],
    costLines: [costLine(ctx.site, 'terrace-per-m', Math.round(lengthM), 'm')],
    effects: [...sp.notes, 'Terrace channels and outlets carry the water off; their design sets the real spacing.', 'It does not change C or K.'],
    cautions: cautionsFor('terraces'),
  });
}
