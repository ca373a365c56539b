// Files made from a farm and its season plan: the fields export (GeoJSON, zipped shapefile, CSV)
// and the plan report (PDF). Every member reads them; a landowner's hold only their own fields.
import { Router, type Request } from 'express';
import type { Sequelize } from 'sequelize';
import { ExportQuery } from '../../shared/schemas/exports';
import { loadFarmMembership } from '../middleware/farm-access';
import { validateQuery } from '../middleware/validate';
import { sendDownload } from '../lib/download';
import { farmExport } from '../services/exports/farm-export.service';
import { planReport } from '../services/reports/plan-report.service';
import type { FileStorage } from '../services/storage/file-storage';
import { loadPlanMembership } from '../middleware/plan-access';
import type { PlanViewer } from '../services/plans/plan-read.service';

const viewerOf = (req: Request): PlanViewer => ({ farmId: req.membership!.farmId, membershipId: req.membership!.id, role: req.membership!.role, units: req.user!.units });

export function exportsRoutes(deps: { sequelize: Sequelize; storage: FileStorage }): { farms: Router; plans: Router } {
  const { sequelize } = deps;
  const farms = Router();
  farms.get('/:farmId/export', loadFarmMembership, validateQuery(ExportQuery), async (req, res) => {
    sendDownload(res, await farmExport(sequelize, viewerOf(req), res.locals.query as ExportQuery));
  });

  const plans = Router();
  plans.get('/:planId/report.pdf', loadPlanMembership, async (req, res) => {
    sendDownload(res, await planReport(deps, viewerOf(req), { name: req.user!.name, units: req.user!.units }, res.locals.planId as number));
  });
  return { farms, plans };
}
