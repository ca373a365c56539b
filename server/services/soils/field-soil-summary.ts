// Fields' soil figures for other services (assessment, board) and GET /api/fields/:fieldId/soil-summary.
// Rules (summarise-soils.ts): lab samples averaged (mean sand/silt/clay/OM/pH/buffer pH, the
// shallowest depth to gray); a feel-test-only field gets its class and K from the engine's
// table by texture class and OM; the soil map's area-weighted K, T and soil-group mix win where
// mapped; T defaults to 5 t/ac/yr; problem clay when clay ≥ 40 %, a clay class, or not worth amending.
import type { Sequelize, Transaction } from 'sequelize';
import type { FieldSoilSummary } from '../../../shared/schemas/soils';
import { Field, SoilSample } from '../../models';
import { aggregateMapUnits, soilMapUnitsOfFields } from './field-soil-map';
import { summariseSoils } from './summarise-soils';

export type { FieldSoilSummary } from '../../../shared/schemas/soils';

/**
 * The summaries of some fields from three queries whatever their number: the samples of all of
 * them, and the map units under all of them.
 */
async function summariesOf(sequelize: Sequelize, fields: { id: number; areaM2: number }[], transaction?: Transaction): Promise<Map<number, FieldSoilSummary>> {
  const fieldIds = fields.map((f) => f.id);
  const [samples, units] = await Promise.all([
    fieldIds.length ? SoilSample.scope('oldestFirst').findAll({ where: { fieldId: fieldIds }, transaction }) : [],
    soilMapUnitsOfFields(sequelize, fields, transaction),
  ]);
  const samplesOf = new Map<number, SoilSample[]>(fieldIds.map((id) => [id, []]));
  for (const s of samples) samplesOf.get(s.fieldId)!.push(s);
  return new Map(fieldIds.map((id) => [id, summariseSoils(samplesOf.get(id)!, aggregateMapUnits(units.get(id)!))]));
}

/** The soil summary of one field; a field with no samples and no map gets nulls and the default T. */
export async function fieldSoilSummary(sequelize: Sequelize, fieldId: number, transaction?: Transaction): Promise<FieldSoilSummary> {
  const field = await Field.findByPk(fieldId, { attributes: ['id', 'areaM2'], transaction });
  const summaries = await summariesOf(sequelize, [{ id: fieldId, areaM2: field?.areaM2 ?? 0 }], transaction);
  return summaries.get(fieldId)!;
}

/** The soil summaries of a farm's fields (or only some of them), keyed by field id; ids not on the farm are left out. */
export async function fieldSoilSummaries(
  sequelize: Sequelize,
  scope: { farmId: number; fieldIds?: number[] },
  transaction?: Transaction,
): Promise<Map<number, FieldSoilSummary>> {
  const fields = await Field.findAll({
    where: { farmId: scope.farmId, ...(scope.fieldIds ? { id: scope.fieldIds } : {}) },
    attributes: ['id', 'areaM2'],
    order: [['id', 'ASC']],
    transaction,
  });
  return summariesOf(sequelize, fields, transaction);
}
