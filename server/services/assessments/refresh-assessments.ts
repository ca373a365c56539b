// Keeps stored assessments current: called whenever an input of some fields' assessments has
// changed (boundary, terrain, soils, cropping, ground, climate, a new season), so the board and
// the Risk tab read stored rows and never run the engine on a read.
import type { Sequelize, Transaction } from 'sequelize';
import { ENGINE_VERSION } from '../../../shared/erosion';
import { Assessment } from '../../models';
import { farmsWithStaleAssessments } from '../../models/assessment.queries';
import { assessField } from './assess-field';
import { gatherInputs, type AssessmentScope } from './gather-inputs';

export type { AssessmentScope } from './gather-inputs';

/** Recomputes and stores the assessments of the fields in scope for every season of their farm. */
export async function refreshAssessments(sequelize: Sequelize, scope: AssessmentScope, transaction?: Transaction): Promise<void> {
  const gathered = await gatherInputs(sequelize, scope, transaction);
  if (gathered.length === 0) return;
  const now = new Date();
  const rows = gathered.map((g) => {
    const a = assessField(g, now);
    return { fieldId: g.field.id, seasonId: g.season.id, inputs: { estimateInput: a.estimateInput }, results: a.results, boardRow: a.boardRow, engineVersion: ENGINE_VERSION, computedAt: now };
  });
  await Assessment.bulkCreate(rows, {
    conflictAttributes: ['fieldId', 'seasonId'],
    updateOnDuplicate: ['inputs', 'results', 'boardRow', 'engineVersion', 'computedAt'],
    transaction,
  });
}

/**
 * At start-up: stores the assessments missing for a field and season, and recomputes those an
 * older engine version worked out, farm by farm. Reads never recompute.
 */
export async function refreshStaleAssessments(sequelize: Sequelize): Promise<number> {
  const farmIds = await farmsWithStaleAssessments(sequelize, ENGINE_VERSION);
  for (const farmId of farmIds) await refreshAssessments(sequelize, { farmId });
  return farmIds.length;
}
