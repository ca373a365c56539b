import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { requireFile, singleUpload } from '../middleware/upload';
import { importFields } from '../services/import-fields.service';
import type { JobQueue } from '../services/jobs/job-queue';
import { BOUNDARY_IMPORT_MAX_BYTES } from '../../shared/limits';

const upload = singleUpload(BOUNDARY_IMPORT_MAX_BYTES, 'boundary file');

export function fieldImportRoutes({ sequelize, jobs }: { sequelize: Sequelize; jobs?: JobQueue }): Router {
  const r = Router();
  r.post('/:farmId/fields/import', loadFarmMembership, requireRole('farmer'), upload, requireFile('the boundary file'), async (req, res) => {
    const file = { buffer: req.file!.buffer, originalName: req.file!.originalname, mimeType: req.file!.mimetype };
    res.status(201).json(await importFields({ sequelize, jobs }, { userId: req.user!.id }, req.membership!.farmId, file));
  });
  return r;
}
