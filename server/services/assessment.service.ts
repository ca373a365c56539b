// One field's assessment for one season: the engine on the gathered inputs, stored with its
// inputs, results and engine version. It is recomputed whenever any input has changed (the
// stored inputs' hash no longer matches) or the engine version moved on.
import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import { estimate, riskClassOf, ENGINE_VERSION } from '../../shared/erosion';
import type { FieldAssessment } from '../../shared/schemas/assessment';
import type { FieldFeature } from '../../shared/schemas/field';
import type { EstimateSuccess } from '../../shared/schemas/estimate';
import type { FieldSoilSummary } from './soils/field-soil-summary';
import { buildEstimateInput, gatherInputs } from './assessment-inputs';

/** DESIGN.md "The job": gray, mottled subsoil means a high water table; amendments will not fix it. */
export const NOT_WORTH_AMENDING_ADVICE =
  'Gray or mottled subsoil near the surface means the ground stays wet: gypsum, lime or organic matter will not fix it. ' +
  'Consider raised or no-dig beds, permanent cover, or drainage designed to local standards by a qualified person ' +
  '(check for buried utilities before any digging, and follow local drainage rules).';

const hashOf = (x: unknown) => createHash('sha256').update(JSON.stringify(x)).digest('hex');

/** K and T reach the engine as plain values; name where they really came from. */
function withSoilSources(e: EstimateSuccess, soil: FieldSoilSummary): EstimateSuccess {
  const k = soil.kSource ? { ...e.factors.k, source: soil.kSource, method: "from the field's soil checks or soil map" } : e.factors.k;
  const t = soil.tSource ? { ...e.factors.t, source: soil.tSource, method: soil.tSource.includes('[practice]') ? 'default' : "from the field's soil map", ...(soil.tSource.includes('[practice]') ? { flag: 'practice' as const } : {}) } : e.factors.t;
  return { ...e, factors: { ...e.factors, k, t } };
}

export async function assessField(sequelize: Sequelize, field: FieldFeature, season: { id: number; label: string }): Promise<FieldAssessment> {
  const gathered = await gatherInputs(sequelize, field, season);
  const hash = hashOf({ gathered, engine: ENGINE_VERSION });
  const [stored] = await sequelize.query<{ inputs_hash: string; results: FieldAssessment }>(
    `SELECT inputs_hash, results FROM assessments WHERE field_id = :fieldId AND season_id = :seasonId`,
    { replacements: { fieldId: field.id, seasonId: season.id }, type: QueryTypes.SELECT },
  );
  if (stored && stored.inputs_hash === hash) return stored.results;

  const { input, gaps, lines } = buildEstimateInput(gathered);
  const result = input ? estimate(input) : null;
  const ok = result && result.ok ? withSoilSources(result, gathered.soil) : null;
  const soil = gathered.soil;
  const assessment: FieldAssessment = {
    fieldId: field.id,
    farmId: gathered.field.farmId,
    name: gathered.field.name,
    season: season.label,
    areaHa: gathered.field.areaHa,
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
    concentratedFlowCells: gathered.terrain ? gathered.terrain.concentratedFlowCells : null,
    engineVersion: ENGINE_VERSION,
    computedAt: new Date().toISOString(),
  };
  await sequelize.query(
    `INSERT INTO assessments (field_id, season_id, inputs_hash, inputs, results, engine_version) VALUES (:fieldId, :seasonId, :hash, :inputs, :results, :v)
     ON CONFLICT (field_id, season_id) DO UPDATE SET inputs_hash = EXCLUDED.inputs_hash, inputs = EXCLUDED.inputs, results = EXCLUDED.results,
       engine_version = EXCLUDED.engine_version, computed_at = now()`,
    { replacements: { fieldId: field.id, seasonId: season.id, hash, inputs: JSON.stringify({ gathered, estimateInput: input }), results: JSON.stringify(assessment), v: ENGINE_VERSION } },
  );
  return assessment;
}
