// Grassed waterway (NRCS 412) where water gathers, and a filter strip (NRCS 393) on the
// downslope edge. Neither changes a RUSLE factor: a waterway stops a gully forming in the flow
// path, a filter strip traps sediment leaving the field. Said so; A stays as it is.
import { cautionsFor } from './cautions';
import { cannot, costLine, offer, type PlanResult, type SiteContext } from './plan';
import { formatLength } from '../../format/units';

/** Sizing estimate of a waterway's top width, m (rule of thumb; the design's peak flow sets it). */
export const WATERWAY_WIDTH_M = 10;
/** Filter strip width in the direction of flow, m (about 30 ft; rule of thumb, the design sets it). */
export const FILTER_STRIP_WIDTH_M = 9;

const NOT_A = 'RUSLE A (sheet and rill loss on the field) does not change.';

export function grassedWaterwayPlan(ctx: SiteContext): PlanResult {
  const lengthM = ctx.site.water.concentratedFlowLengthM;
  if (lengthM === null) return cannot('grassed-waterway', 'where water gathers comes from an elevation model: upload one for this farm', 'terrain');
  if (lengthM <= 0) return cannot('grassed-waterway', 'the elevation model shows no path where water gathers in this field');
  const areaHa = (lengthM * WATERWAY_WIDTH_M) / 10_000;
  return offer({
    key: 'grassed-waterway',
    family: 'waterway',
    whys: {},
    quantities: [
      { item: 'grassed waterway', amount: Math.round(lengthM), unit: 'm', origin: { kind: 'derived', detail: 'length of the flow path where water gathers, from the elevation model' } },
      { item: 'waterway area (taken out of crop)', amount: Math.round(areaHa * 100) / 100, unit: 'ha', origin: { kind: 'rule-of-thumb' }, note: `about ${formatLength(WATERWAY_WIDTH_M, ctx.site.units)} wide: a sizing estimate` },
    ],
    costLines: [costLine(ctx.site, 'waterway-per-m', Math.round(lengthM), 'm')],
    effects: ['Gully control: carries the water that gathers in the flow path over grass, so no gully cuts there.', NOT_A],
    cautions: cautionsFor('grassed-waterway'),
  });
}

export function filterStripPlan(ctx: SiteContext): PlanResult {
  const edgeM = ctx.site.water.downslopeEdgeLengthM;
  if (edgeM === null) return cannot('filter-strip', "the field's downslope edge comes from an elevation model: upload one for this farm", 'terrain');
  if (edgeM <= 0) return cannot('filter-strip', 'the field has no downslope edge toward water');
  const stripHa = (edgeM * FILTER_STRIP_WIDTH_M) / 10_000;
  return offer({
    key: 'filter-strip',
    family: 'filter-strip',
    whys: {},
    quantities: [
      { item: 'filter strip', amount: Math.round(edgeM), unit: 'm', origin: { kind: 'derived', detail: "the field's downslope edge" } },
      { item: 'filter strip area (taken out of crop)', amount: Math.round(stripHa * 100) / 100, unit: 'ha', origin: { kind: 'rule-of-thumb' }, note: `${formatLength(FILTER_STRIP_WIDTH_M, ctx.site.units)} wide: a rule of thumb` },
    ],
    costLines: [costLine(ctx.site, 'filter-strip-per-ha', Math.round(stripHa * 100) / 100, 'ha')],
    effects: ['Sediment trapping: grass on the downslope edge catches part of the soil washing off before it reaches water.', NOT_A],
    cautions: cautionsFor('filter-strip'),
  });
}
