// Cover crop (NRCS 340), no-till (NRCS 329) and reduced tillage (NRCS 345): each changes C through
// the C table (crop × tillage, × the cover-crop factor), and the runoff curve number through the
// TR-55 row the new cropping falls in. They change nothing else.
import { DEFAULT_COVER_TABLE } from '../cover';
import { cannot, costLine, isPlanResult, offer, tableC, type PlanResult, type SiteContext } from './plan';

const ROW_CROPS = ['corn', 'soybean'];
const ANNUAL_CROPS = ['corn', 'soybean', 'small grain'];

const NO_OTHER_FACTOR = 'It does not change K, LS or P.';

export function coverCropPlan(ctx: SiteContext): PlanResult {
  const c = tableC(ctx, 'cover-crop');
  if (isPlanResult(c)) return c;
  if (!ANNUAL_CROPS.includes(c.crop)) return cannot('cover-crop', `a cover crop goes between annual crops; ${c.crop} already covers the ground all year`);
  if (c.coverCrop) return cannot('cover-crop', 'the field already has a cover crop');
  const f = DEFAULT_COVER_TABLE.coverCrop.factor;
  return offer({
    key: 'cover-crop',
    family: 'cover-crop',
    modify: (inp) => ({ ...inp, c: inp.c.from === 'table' ? { ...inp.c, coverCrop: true } : inp.c }),
    whys: {
      C: `a cover crop in the otherwise bare months: C × ${f} (rule of thumb)`,
      'curve number': 'TR-55 counts a cover crop as good hydrologic condition',
    },
    quantities: [{ item: 'cover crop', amount: ctx.site.areaHa, unit: 'ha', origin: { kind: 'derived', detail: 'the whole field' } }],
    costLines: [costLine(ctx.site, 'cover-crop-per-ha', ctx.site.areaHa, 'ha')],
    effects: [NO_OTHER_FACTOR],
    cautions: [],
  });
}

function tillagePlan(ctx: SiteContext, key: 'no-till' | 'reduced-till'): PlanResult {
  const c = tableC(ctx, key);
  if (isPlanResult(c)) return c;
  if (!ROW_CROPS.includes(c.crop)) {
    return cannot(key, c.crop === 'small grain' ? 'the C table has one row for small grain whatever the tillage, so a tillage change cannot be predicted' : `${c.crop} is not tilled each year`);
  }
  const target = key === 'no-till' ? 'no-till' : 'chisel or mulch-till';
  if (c.tillage === 'no-till') return cannot(key, 'the field is already in no-till');
  if (key === 'reduced-till' && c.tillage === target) return cannot(key, 'the field is already in reduced (chisel or mulch) tillage');
  const row = DEFAULT_COVER_TABLE.rows.find((r) => r.crop === c.crop && r.tillage === target);
  const residue = row?.typicalResiduePct;
  return offer({
    key,
    family: 'tillage',
    modify: (inp) => {
      // The row's own typical residue replaces the old tillage's residue figure.
      const next = { ...(inp.c.from === 'table' ? inp.c : c), tillage: target } as typeof c;
      if (residue == null) delete next.residuePct;
      else next.residuePct = residue;
      return { ...inp, c: next };
    },
    whys: {
      C: `${c.crop}, ${target}: the C table's row, with its typical ${residue ?? '—'} % residue after planting`,
      'curve number': key === 'no-till' ? 'TR-55 counts residue and less disturbance as good hydrologic condition' : 'TR-55 row for the new residue cover',
    },
    quantities: [{ item: key === 'no-till' ? 'no-till' : 'reduced tillage', amount: ctx.site.areaHa, unit: 'ha', origin: { kind: 'derived', detail: 'the whole field' } }],
    costLines: [costLine(ctx.site, key === 'no-till' ? 'no-till-per-ha' : 'reduced-till-per-ha', ctx.site.areaHa, 'ha')],
    effects: [`Assumes the residue the table's row assumes (about ${residue ?? '—'} % cover after planting); less residue gives less benefit.`, NO_OTHER_FACTOR],
    cautions: [],
  });
}

export const noTillPlan = (ctx: SiteContext): PlanResult => tillagePlan(ctx, 'no-till');
export const reducedTillPlan = (ctx: SiteContext): PlanResult => tillagePlan(ctx, 'reduced-till');
