// Keeps stored assessments current: called whenever an input of some fields' assessments has
// changed (boundary, terrain, soils, cropping, ground, climate), so the board reads stored rows.
import type { Sequelize, Transaction } from 'sequelize';
import { listFieldFeatures } from '../fields.service';
import { listSeasons } from '../seasons.service';
import { assessField } from '../assessment.service';

export type AssessmentScope = { farmId: number; /** Only these fields; every field of the farm when omitted. */ fieldIds?: number[] };

/** Recomputes the assessments of the fields in scope for every season of their farm. */
export async function refreshAssessments(sequelize: Sequelize, scope: AssessmentScope, _transaction?: Transaction): Promise<void> {
  const seasons = await listSeasons(sequelize, scope.farmId);
  if (!seasons.length) return;
  const fields = await listFieldFeatures(sequelize, { farmId: scope.farmId, ...(scope.fieldIds ? { fieldIds: scope.fieldIds } : {}) });
  for (const season of seasons) for (const f of fields) await assessField(sequelize, f, season);
}
