// Reading assessments: the Risk tab's one field, a farm's priority board, and an advisor's board
// across client farms. Each reads stored rows in a fixed number of queries, whatever the number
// of fields or farms; a field with no stored row yet (rare: refreshes store one for every field
// and season) is stored first.
import type { Sequelize } from 'sequelize';
import type { Board, FieldAssessment, StoredBoardFigures } from '../../../shared/schemas/assessment';
import type { Units } from '../../../shared/schemas/auth';
import type { EstimateSuccess } from '../../../shared/schemas/estimate';
import { Assessment } from '../../models';
import { advisorBoardRecords, farmBoardRecords, type BoardRecord } from '../../models/assessment.queries';
import { presentBoard } from '../../presenters/board.presenter';
import { resolveSeason, seasonNotFound } from '../seasons.service';
import { refreshAssessments } from './refresh-assessments';

type Viewer = { farmId: number; membershipId: number; role: string };

/** GET /api/fields/:fieldId/assessment: the stored assessment of the field for the season (or the newest). */
export async function fieldAssessment(sequelize: Sequelize, viewer: Viewer, fieldId: number, seasonLabel: string | undefined): Promise<FieldAssessment> {
  const season = await resolveSeason(viewer.farmId, seasonLabel);
  const stored = await Assessment.findOne({ where: { fieldId, seasonId: season.id }, attributes: ['results'] });
  if (stored) return stored.results;
  await refreshAssessments(sequelize, { farmId: viewer.farmId, fieldIds: [fieldId] });
  return (await Assessment.findOne({ where: { fieldId, seasonId: season.id }, attributes: ['results'], rejectOnEmpty: true })).results;
}

type Complete = BoardRecord & { boardRow: StoredBoardFigures };
const complete = (rs: BoardRecord[]): rs is Complete[] => rs.every((r) => r.boardRow !== null);

/** Stores what is missing among the records, then reads them again. */
async function withMissingStored(sequelize: Sequelize, records: BoardRecord[], reread: () => Promise<BoardRecord[]>): Promise<Complete[]> {
  if (complete(records)) return records;
  const missingByFarm = new Map<number, number[]>();
  for (const r of records) if (r.boardRow === null) missingByFarm.set(r.farmId, [...(missingByFarm.get(r.farmId) ?? []), r.fieldId]);
  for (const [farmId, fieldIds] of missingByFarm) await refreshAssessments(sequelize, { farmId, fieldIds });
  const again = await reread();
  return again.filter((r): r is Complete => r.boardRow !== null);
}

/** GET /api/farms/:farmId/board: every field of the farm (a landowner's own only), ranked; one query when all are stored. */
export async function farmBoard(sequelize: Sequelize, viewer: Viewer, seasonLabel: string | undefined, units: Units): Promise<Board> {
  const owner = viewer.role === 'landowner' ? { ownerMembershipId: viewer.membershipId } : {};
  const read = () => farmBoardRecords(sequelize, { farmId: viewer.farmId, ...owner, ...(seasonLabel ? { seasonLabel } : {}) });
  const first = await read();
  if (!first.season) throw seasonNotFound(seasonLabel);
  const records = await withMissingStored(sequelize, first.records, async () => (await read()).records);
  return presentBoard(first.season.label, records, false, units);
}

/** GET /api/board: every field of every farm the user advises, each farm's season by that label or its newest. */
export async function advisorBoard(sequelize: Sequelize, userId: number, seasonLabel: string | undefined, units: Units): Promise<Board> {
  const read = () => advisorBoardRecords(sequelize, { userId, seasonLabel });
  const first = await read();
  const records = await withMissingStored(sequelize, first.records, async () => (await read()).records);
  return presentBoard(seasonLabel ?? [...first.seasons].sort().reverse().join(', '), records, true, units);
}

/** Each field's stored estimate for a season (for the per-cell soil-loss layer), storing any missing first. */
export async function storedEstimates(sequelize: Sequelize, farmId: number, seasonId: number): Promise<Map<number, EstimateSuccess | null>> {
  const read = () => Assessment.findAll({ where: { seasonId }, attributes: ['fieldId', 'results'] });
  let rows = await read();
  if (rows.length === 0) {
    await refreshAssessments(sequelize, { farmId });
    rows = await read();
  }
  return new Map(rows.map((r) => [r.fieldId, r.results.estimate]));
}

/** The stored assessments of some fields for one season, storing any missing first; by field id. */
export async function seasonAssessments(sequelize: Sequelize, farmId: number, seasonId: number, fieldIds: number[]): Promise<Map<number, FieldAssessment>> {
  const read = () => Assessment.findAll({ where: { seasonId, fieldId: fieldIds }, attributes: ['fieldId', 'results'] });
  let rows = await read();
  if (rows.length < fieldIds.length) {
    const have = new Set(rows.map((r) => r.fieldId));
    await refreshAssessments(sequelize, { farmId, fieldIds: fieldIds.filter((id) => !have.has(id)) });
    rows = await read();
  }
  return new Map(rows.map((r) => [r.fieldId, r.results]));
}
