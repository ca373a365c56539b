// The words beside a field's rank on the priority board, written in the reader's units from the
// typed reasons an assessment stores.
import { kUsToSi, mmToIn } from '../erosion/units';
import type { BoardReason } from '../schemas/assessment';
import type { Units } from '../schemas/auth';
import { formatCount, formatDepth, formatFactor, formatInches, formatShare } from './quantities';
import { formatArea } from './units';

/** Runoff "55 of 105 mm" (or "2.6 of 4.1 in"): both figures in one unit, whole mm or 0.1 in. */
function runoffWords(runoffMm: number, stormMm: number, units: Units): string {
  if (units === 'ac') return `${formatInches(mmToIn(runoffMm))} of ${formatInches(mmToIn(stormMm))} in`;
  return `${formatCount(runoffMm)} of ${formatCount(stormMm)} mm`;
}

export function boardReasonWords(r: BoardReason, units: Units): string {
  switch (r.kind) {
    case 'steep-slope':
      return `steep or long slope (LS ${formatFactor(r.ls)})`;
    case 'little-cover':
      return `little cover (C ${formatFactor(r.c)})`;
    case 'erodible-soil':
      return units === 'ac' ? `erodible soil (K ${formatFactor(r.kUs)}, US units)` : `erodible soil (K ${formatFactor(kUsToSi(r.kUs))}, SI units)`;
    case 'much-runoff':
      return `much runoff (${runoffWords(r.runoffMm, r.stormMm, units)} in the design storm)`;
    case 'concentrated-flow':
      return r.flowAreaHa !== null
        ? `water gathers on about ${formatArea(r.flowAreaHa, units)} of the field: a grassed waterway candidate`
        : `water gathers in ${formatCount(r.cells)} cells of the elevation model: a grassed waterway candidate`;
    case 'problem-clay':
      return `problem clay: ${[r.clayPct !== null ? `${formatShare(r.clayPct)} clay` : null, r.textureClass ? `texture class ${r.textureClass}` : null].filter(Boolean).join(', ')}`;
    case 'wet-ground':
      return r.depthToGrayCm !== null
        ? `gray (redoximorphic) colours at ${formatDepth(r.depthToGrayCm, units)}${r.drainageClass ? `: ${r.drainageClass}` : ''}, a seasonal water table that amendments will not fix`
        : `${r.drainageClass ? `mapped as ${r.drainageClass}` : 'wet ground'}: a seasonal water table that amendments will not fix`;
  }
}
