// One field's soil figures for other services (assessment, board) and GET /api/fields/:fieldId/soil-summary.
// Rules (summarise-soils.ts): lab samples averaged (mean sand/silt/clay/OM/pH/buffer pH, the
// shallowest depth to gray); a feel-test-only field gets its class and K from the engine's
// table by texture class and OM; the soil map's area-weighted K, T and soil-group mix win where
// mapped; T defaults to 5 t/ac/yr; problem clay when clay ≥ 40 %, a clay class, or not worth amending.
import type { Sequelize } from 'sequelize';
import type { FieldSoilSummary } from '../../../shared/schemas/soils';
import { aggregateMapUnits, fieldSoilMapUnits } from './field-soil-map';
import { sampleRows } from './soil-sample-presenter';
import { summariseSoils } from './summarise-soils';

export type { FieldSoilSummary } from '../../../shared/schemas/soils';

/** The soil summary of one field; a field with no samples and no map gets nulls and the default T. */
export async function fieldSoilSummary(sequelize: Sequelize, fieldId: number): Promise<FieldSoilSummary> {
  const [samples, units] = await Promise.all([sampleRows(sequelize, { fieldId }), fieldSoilMapUnits(sequelize, fieldId)]);
  return summariseSoils(samples, aggregateMapUnits(units));
}
