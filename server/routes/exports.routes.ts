// Files made from a farm and its season plan: the fields export (GeoJSON, zipped shapefile, CSV)
// and the plan report (PDF). Every member reads them; a landowner's hold only their own fields.
import { Router, type Request } from 'express';
import type { Sequelize } from 'sequelize';
import { ExportQuery } from '../../shared/schemas/exports';
import { loadFarmMembership } from '../middleware/farm-access';
import { validateQuery } from '../middleware/validate';
import { sendDownload } from '../lib/download';
import { farmExport } from '../services/exports/farm-export.service';
import type { PlanViewer } from '../services/plans/plan-read.service';

const viewerOf = (req: Request): PlanViewer => ({ farmId: req.membership!.farmId, membershipId: req.membership!.id, role: req.membership!.role });

export function exportsRoutes(sequelize: Sequelize): { farms: Router } {
  const farms = Router();
  farms.get('/:farmId/export', loadFarmMembership, validateQuery(ExportQuery), async (req, res) => {
    sendDownload(res, await farmExport(sequelize, viewerOf(req), res.locals.query as ExportQuery));
  });
  return { farms };
}
