// GET /api/plans/:planId/report.pdf: the season plan on paper. The plan as its reader may see it
// (a landowner: the newest approved revision, their own fields only), the season's assessments
// of the fields shown, and the farm's shaded relief, drawn into a PDF. Drawing takes 0.3–1 s for
// the demo farm (fonts subset, pages compressed), so it runs on a worker thread, off the API's
// event loop.
import type { Sequelize } from 'sequelize';
import type { Units } from '../../../shared/schemas/auth';
import { exportFileName } from '../../../shared/exports/file-names';
import type { DownloadFile } from '../../lib/download';
import { Farm, Season, TerrainLayer } from '../../models';
import { visibleFields } from '../visible-fields';
import type { FileStorage } from '../storage/file-storage';
import { seasonAssessments } from '../assessments/read-assessments';
import { readPlan, type PlanViewer } from '../plans/plan-read.service';
import type { ReliefPicture, ReportData } from './report-data';
import { renderInWorker } from './render-in-worker';

export type ReportReader = { name: string; units: Units };

async function relief(storage: FileStorage, farmId: number): Promise<ReliefPicture | null> {
  const [layer] = await TerrainLayer.ofFarm(farmId, 'hillshade');
  return layer ? { png: await storage.get(layer.fileKey), bounds: layer.bounds } : null;
}

/** What the report prints, read in a fixed number of queries. */
export async function planReportData(deps: { sequelize: Sequelize; storage: FileStorage }, viewer: PlanViewer, reader: ReportReader, planId: number, now: Date): Promise<ReportData> {
  const plan = await readPlan(viewer, planId);
  const farm = await Farm.findByPk(viewer.farmId, { attributes: ['name'], rejectOnEmpty: true });
  const season = await Season.findOne({ where: { farmId: viewer.farmId, label: plan.season }, attributes: ['id'], rejectOnEmpty: true });
  const fields = await visibleFields(deps.sequelize, viewer);
  const assessments = await seasonAssessments(deps.sequelize, viewer.farmId, season.id, fields.map((f) => f.fieldId));
  return {
    farmName: farm.name,
    plan,
    fields: fields.map(({ centroid, ...f }) => ({ ...f, labelAt: centroid, assessment: assessments.get(f.fieldId) ?? null })),
    relief: await relief(deps.storage, viewer.farmId),
    reader: { ...reader, role: viewer.role },
    madeAt: now.toISOString(),
  };
}

export async function planReport(deps: { sequelize: Sequelize; storage: FileStorage }, viewer: PlanViewer, reader: ReportReader, planId: number): Promise<DownloadFile> {
  const data = await planReportData(deps, viewer, reader, planId, new Date());
  return {
    body: await renderInWorker(data),
    contentType: 'application/pdf',
    fileName: exportFileName(data.farmName, data.plan.season, 'season-plan', 'pdf'),
  };
}
