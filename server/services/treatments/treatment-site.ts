// One field as the treatment engine sees it, from what the server stores: the assessment's
// engine input, the soil summary, the terrain figures and the farm's prices. Pure.
import type { TreatmentSite } from '../../../shared/erosion/treatments/types';
import type { Units } from '../../../shared/schemas/auth';
import type { EstimateInput } from '../../../shared/schemas/estimate';
import type { FieldSoilSummary } from '../../../shared/schemas/soils';
import type { AmendmentChoices, PriceList } from '../../../shared/schemas/treatments';
import type { StoredTerrainStats } from '../../models/field-terrain.model';

/**
 * The edge toward water is taken as a quarter of the perimeter: one side of a compact field
 * (rule of thumb; the farmer knows which side drains to the ditch or stream).
 */
const DOWNSLOPE_EDGE_SHARE_OF_PERIMETER = 0.25;

/**
 * Where water gathers, as the length of one waterway: the flow cells end to end, but no longer
 * than the way across the field (half its perimeter), since neighbouring cells of a wide or
 * branching flow line would be one waterway (rule of thumb).
 */
function concentratedFlowLengthM(cellsLengthM: number, perimeterM: number): number {
  return Math.min(cellsLengthM, perimeterM / 2);
}

function amendmentsOf(a: AmendmentChoices): NonNullable<TreatmentSite['amendments']> {
  return {
    ...(a.limeTargetPh !== null ? { limeTargetPh: a.limeTargetPh } : {}),
    limeProduct: {
      ccePct: a.limeCcePct,
      fineness: { passing20MeshPct: a.limePassing20MeshPct, passing60MeshPct: a.limePassing60MeshPct, passing100MeshPct: a.limePassing100MeshPct },
    },
    gypsumPurityPct: a.gypsumPurityPct,
    gypsumExchangeEfficiency: a.gypsumExchangeEfficiency,
  };
}

export type SiteParts = {
  estimateInput: EstimateInput;
  areaHa: number;
  perimeterM: number;
  soil: FieldSoilSummary;
  terrain: StoredTerrainStats | null;
  prices: PriceList;
  units: Units;
};

export function treatmentSiteOf(p: SiteParts): TreatmentSite {
  const flow = p.terrain?.concentratedFlow;
  return {
    input: p.estimateInput,
    areaHa: p.areaHa,
    soil: {
      ph: p.soil.ph,
      bufferPh: p.soil.bufferPh,
      bufferMethod: p.soil.bufferMethod,
      organicMatterPct: p.soil.organicMatterPct,
      sandPct: p.soil.sandPct,
      siltPct: p.soil.siltPct,
      clayPct: p.soil.clayPct,
      cecCmolPerKg: p.soil.cecCmolPerKg,
      espPct: p.soil.espPct,
      bulkDensityMgPerM3: p.soil.bulkDensity,
      notWorthAmending: p.soil.notWorthAmending,
      problemClay: p.soil.problemClay,
    },
    water: {
      concentratedFlowLengthM: p.terrain ? concentratedFlowLengthM((flow?.cellCount ?? 0) * p.terrain.cellSizeM, p.perimeterM) : null,
      downslopeEdgeLengthM: p.perimeterM * DOWNSLOPE_EDGE_SHARE_OF_PERIMETER,
    },
    prices: p.prices.prices,
    currency: p.prices.currency,
    units: p.units,
    amendments: amendmentsOf(p.prices.amendments),
  };
}
