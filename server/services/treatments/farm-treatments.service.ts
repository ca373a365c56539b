// Treatment options of a farm's fields for a season: each field's stored assessment input, its
// soil summary, terrain figures and the farm's prices, read in a fixed number of queries, and
// the engine's options for each.
import type { Sequelize } from 'sequelize';
import { fieldTreatments } from '../../../shared/erosion';
import type { TreatmentOption } from '../../../shared/erosion/treatments/types';
import type { Units } from '../../../shared/schemas/auth';
import type { FarmTreatmentsAnswer, FieldTreatmentsAnswer } from '../../../shared/schemas/treatments';
import { Assessment, Field, FieldTerrain } from '../../models';
import { refreshAssessments } from '../assessments/refresh-assessments';
import { resolveSeason } from '../seasons.service';
import { fieldSoilSummaries } from '../soils/field-soil-summary';
import { readPrices } from './prices.service';
import { treatmentSiteOf } from './treatment-site';

/** units: the reader's, for the options' notes. */
type Scope = { farmId: number; seasonLabel?: string; fieldIds?: number[]; units: Units };

async function storedAssessments(sequelize: Sequelize, farmId: number, seasonId: number, fieldIds: number[]) {
  const read = () => Assessment.findAll({ where: { seasonId, fieldId: fieldIds }, attributes: ['fieldId', 'inputs', 'results'] });
  let rows = await read();
  if (rows.length < fieldIds.length) {
    const have = new Set(rows.map((r) => r.fieldId));
    await refreshAssessments(sequelize, { farmId, fieldIds: fieldIds.filter((id) => !have.has(id)) });
    rows = await read();
  }
  return new Map(rows.map((r) => [r.fieldId, r]));
}

/** The cheapest option under T; else the one saving the most soil per money; else the one saving the most. */
export function bestOption(options: TreatmentOption[]): TreatmentOption | null {
  const under = options.find((o) => o.cheapestUnderT);
  if (under) return under;
  const saving = options.filter((o) => o.tonnesSavedPerYr > 0);
  if (saving.length === 0) return null;
  const perMoney = saving.filter((o) => o.tonnesSavedPerMoney !== null);
  const pool = perMoney.length ? perMoney : saving;
  return pool.reduce((a, b) => ((b.tonnesSavedPerMoney ?? b.tonnesSavedPerYr) > (a.tonnesSavedPerMoney ?? a.tonnesSavedPerYr) ? b : a));
}

export async function farmTreatments(sequelize: Sequelize, scope: Scope): Promise<FarmTreatmentsAnswer> {
  const season = await resolveSeason(scope.farmId, scope.seasonLabel);
  const fields = await Field.findAll({
    where: { farmId: scope.farmId, ...(scope.fieldIds ? { id: scope.fieldIds } : {}) },
    attributes: ['id', 'name', 'areaM2', 'perimeterM'],
    order: [['name', 'ASC']],
  });
  const prices = await readPrices(scope.farmId);
  if (fields.length === 0) return { season: season.label, currency: prices.currency, fields: [] };
  const fieldIds = fields.map((f) => f.id);
  const assessments = await storedAssessments(sequelize, scope.farmId, season.id, fieldIds);
  const soils = await fieldSoilSummaries(sequelize, { farmId: scope.farmId, fieldIds });
  const terrain = new Map((await FieldTerrain.findAll({ where: { fieldId: fieldIds }, attributes: ['fieldId', 'stats'] })).map((t) => [t.fieldId, t.stats]));

  return {
    season: season.label,
    currency: prices.currency,
    fields: fields.map((f) => {
      const stored = assessments.get(f.id);
      const areaHa = f.areaM2 / 10_000;
      const base = { fieldId: f.id, season: season.label };
      const input = stored?.inputs.estimateInput ?? null;
      let answer: FieldTreatmentsAnswer;
      if (!stored || !input || !stored.results.estimate) {
        answer = {
          ...base,
          ok: false,
          reason: stored?.results.failure ?? 'The field cannot be assessed yet: fill in what is missing first.',
          gaps: stored?.results.gaps ?? [],
        };
      } else {
        const site = treatmentSiteOf({ estimateInput: input, areaHa, perimeterM: f.perimeterM, soil: soils.get(f.id)!, terrain: terrain.get(f.id) ?? null, prices, units: scope.units });
        const res = fieldTreatments(site);
        answer = res.ok ? { ...base, ok: true, site, ...res.value } : { ...base, ok: false, reason: res.reason, gaps: [] };
      }
      return { fieldId: f.id, name: f.name, areaHa, best: answer.ok ? bestOption(answer.options) : null, answer };
    }),
  };
}

/** GET /api/fields/:fieldId/treatments */
export async function fieldTreatmentsAnswer(sequelize: Sequelize, farmId: number, fieldId: number, seasonLabel: string | undefined, units: Units): Promise<FieldTreatmentsAnswer> {
  const farm = await farmTreatments(sequelize, { farmId, fieldIds: [fieldId], units, ...(seasonLabel ? { seasonLabel } : {}) });
  return farm.fields[0].answer;
}
