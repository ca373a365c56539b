// One field's assessment for one season from its gathered inputs: the engine's answer, the
// figures and reasons the priority board shows, and what went in. Pure.
import { estimate, riskClassOf, ENGINE_VERSION, M2_PER_HA } from '../../../shared/erosion';
import type { BoardReason, FieldAssessment, StoredBoardFigures } from '../../../shared/schemas/assessment';
import type { EstimateInput, EstimateSuccess, Provenance } from '../../../shared/schemas/estimate';
import { OVERRIDE_FACTORS } from '../../../shared/schemas/overrides';
import { originWords, type Origin } from '../../../shared/schemas/provenance';
import type { FieldSoilSummary } from '../../../shared/schemas/soils';
import { buildEstimateInput } from './build-estimate-input';
import type { GatheredInputs } from './gathered-inputs';

/** Gray, mottled subsoil means a high water table; amendments will not fix it. */
const NOT_WORTH_AMENDING_ADVICE =
  'Gray or mottled subsoil near the surface means the ground stays wet: gypsum, lime or organic matter will not fix it. ' +
  'Consider raised or no-dig beds, permanent cover, or drainage designed to local standards by a qualified person ' +
  '(check for buried utilities before any digging, and follow local drainage rules).';

const flagOf = (o: Origin): Provenance['flag'] => (o.kind === 'rule-of-thumb' || o.kind === 'default' ? 'practice' : undefined);

/** K (and a mapped T) reach the engine as plain values; name where they really came from. */
function withSoilSources(e: EstimateSuccess, soil: FieldSoilSummary): EstimateSuccess {
  const sourced = (p: Provenance, o: Origin | null, method: string): Provenance => {
    if (!o) return p;
    const { flag: _engineFlag, ...rest } = p;
    const flag = flagOf(o);
    return { ...rest, source: originWords(o), method: o.detail ?? method, ...(flag ? { flag } : {}) };
  };
  const k = sourced(e.factors.k, soil.kSource, "from the field's soil checks or soil map");
  // The default T keeps the engine's own provenance; a mapped T names the map.
  const t = soil.tSource?.kind === 'default' ? e.factors.t : sourced(e.factors.t, soil.tSource, "from the field's soil map");
  return { ...e, factors: { ...e.factors, k, t } };
}

/** A factor typed for the field replaces the engine's "typed in": who typed it and the note why. */
function withOverrides(e: EstimateSuccess, overrides: GatheredInputs['overrides']): EstimateSuccess {
  const factors = { ...e.factors };
  for (const f of OVERRIDE_FACTORS) {
    const o = overrides[f];
    if (!o) continue;
    const { flag: _engineFlag, ...rest } = factors[f];
    const by: Origin = o.setBy ? { kind: 'typed', typedBy: o.setBy } : { kind: 'typed' };
    factors[f] = { ...rest, source: originWords(by), method: `override: ${o.note}`, override: { note: o.note, by: o.setBy } };
  }
  return { ...e, factors };
}

/** What drives a rank: rules of thumb (common practice, no single source), as values for the board to word. */
function reasonsFor(a: FieldAssessment, soil: FieldSoilSummary, cellSizeM: number | null): BoardReason[] {
  const out: BoardReason[] = [];
  const e = a.estimate;
  if (e) {
    if (e.factors.ls.value >= 1.5) out.push({ kind: 'steep-slope', ls: e.factors.ls.value });
    if (e.factors.c.value >= 0.2) out.push({ kind: 'little-cover', c: e.factors.c.value });
    if (e.factors.k.us && e.factors.k.us.value >= 0.4) out.push({ kind: 'erodible-soil', kUs: e.factors.k.us.value });
    // Half or more of the design storm running off (common practice, no single source).
    const storm = e.runoff?.rainfallMm;
    if (a.runoffMm != null && storm && a.runoffMm >= 0.5 * storm) out.push({ kind: 'much-runoff', runoffMm: a.runoffMm, stormMm: storm });
  }
  if (a.concentratedFlowCells) out.push({ kind: 'concentrated-flow', cells: a.concentratedFlowCells, flowAreaHa: cellSizeM ? (a.concentratedFlowCells * cellSizeM ** 2) / M2_PER_HA : null });
  if (soil.problemClay) out.push({ kind: 'problem-clay', clayPct: soil.clayPct, textureClass: soil.textureClass });
  if (soil.notWorthAmending) out.push({ kind: 'wet-ground', depthToGrayCm: soil.depthToGrayCm, drainageClass: soil.drainageClass });
  return out;
}

type AssessedField = { estimateInput: EstimateInput | null; results: FieldAssessment; boardRow: StoredBoardFigures };

export function assessField(g: GatheredInputs, computedAt: Date): AssessedField {
  const { input, gaps, lines } = buildEstimateInput(g);
  const result = input ? estimate(input) : null;
  const ok = result && result.ok ? withOverrides(withSoilSources(result, g.soil), g.overrides) : null;
  const soil = g.soil;
  const results: FieldAssessment = {
    fieldId: g.field.id,
    farmId: g.field.farmId,
    name: g.field.name,
    season: g.season.label,
    areaHa: g.field.areaHa,
    inputs: lines,
    gaps,
    estimate: ok,
    failure: result && !result.ok ? result.reason : null,
    soilLossTPerHaYr: ok ? ok.soilLoss.tPerHaYr : null,
    toleranceTPerHaYr: ok ? ok.factors.t.value : null,
    aOverT: ok ? ok.aOverT : null,
    tonnesPerYr: ok ? (ok.soilLoss.tonnesPerYr ?? null) : null,
    runoffMm: ok?.runoff ? ok.runoff.runoffMm : null,
    runoffM3: ok?.runoff?.volumeM3 ?? null,
    riskClass: ok ? riskClassOf(ok.aOverT) : null,
    problemClay: soil.problemClay,
    problemClayReasons: soil.problemClayReasons,
    drainageClass: soil.drainageClass,
    groundAdvice: soil.notWorthAmending ? NOT_WORTH_AMENDING_ADVICE : null,
    lsSource: ok ? (input?.lsFromGrid ? 'elevation model' : 'typed slope') : null,
    concentratedFlowCells: g.terrain ? g.terrain.concentratedFlowCells : null,
    engineVersion: ENGINE_VERSION,
    computedAt: computedAt.toISOString(),
  };
  const boardRow: StoredBoardFigures = {
    soilLossTPerHaYr: results.soilLossTPerHaYr,
    toleranceTPerHaYr: results.toleranceTPerHaYr,
    aOverT: results.aOverT,
    tonnesPerYr: results.tonnesPerYr,
    runoffMm: results.runoffMm,
    riskClass: results.riskClass,
    problemClay: results.problemClay,
    gaps,
    reasons: reasonsFor(results, soil, g.terrain?.cellSizeM ?? null),
  };
  return { estimateInput: input, results, boardRow };
}
