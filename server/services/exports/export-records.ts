// What a farm's export holds: every field the caller may see (a landowner's own only), its area
// and outline, its stored assessment for the season, and the season plan's actions on it (a
// landowner sees the approved revision only, as the plan routes show it). A fixed number of
// queries, however many fields.
import type { Sequelize } from 'sequelize';
import type { MultiPolygon } from 'geojson';
import type { BoardRow } from '../../../shared/schemas/assessment';
import type { PlanAction } from '../../../shared/schemas/plans';
import { HttpError } from '../../lib/http-error';
import { Farm } from '../../models';
import { visibleFields } from '../visible-fields';
import { farmBoard } from '../assessments/read-assessments';
import { planForSeason, type PlanViewer } from '../plans/plan-read.service';

export type ExportField = {
  fieldId: number;
  name: string;
  areaHa: number;
  geometry: MultiPolygon;
  /** The stored assessment's figures for the season (null figures when it cannot be assessed yet). */
  figures: BoardRow | null;
  actions: PlanAction[];
};

export type ExportRecords = { farmName: string; season: string; currency: string | null; fields: ExportField[] };

/** The season plan's actions the viewer may read, or none when there is no (approved, for a landowner) plan. */
async function plannedActions(viewer: PlanViewer, season: string): Promise<{ actions: PlanAction[]; currency: string | null }> {
  try {
    const plan = await planForSeason(viewer, season);
    return { actions: plan.actions, currency: plan.currency };
  } catch (e) {
    if (e instanceof HttpError && e.code === 'no_plan') return { actions: [], currency: null };
    throw e;
  }
}

export async function farmExportRecords(sequelize: Sequelize, viewer: PlanViewer, seasonLabel: string | undefined): Promise<ExportRecords> {
  // The exports carry figures, not the board's reasons, so the reasons' units do not matter here.
  const board = await farmBoard(sequelize, viewer, seasonLabel, 'ha');
  const farm = await Farm.findByPk(viewer.farmId, { attributes: ['name'], rejectOnEmpty: true });
  const fields = await visibleFields(sequelize, viewer);
  const { actions, currency } = await plannedActions(viewer, board.season);
  const figures = new Map(board.rows.map((r) => [r.fieldId, r]));
  return {
    farmName: farm.name,
    season: board.season,
    currency,
    fields: fields.map((f) => ({
      fieldId: f.fieldId,
      name: f.name,
      areaHa: f.areaHa,
      geometry: f.geometry,
      figures: figures.get(f.fieldId) ?? null,
      actions: actions.filter((a) => a.fieldId === f.fieldId),
    })),
  };
}
