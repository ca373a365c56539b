import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { singleUpload } from '../middleware/upload';
import { badRequest } from '../lib/http-error';
import { IMPORT_LIMIT_BYTES, importFields } from '../services/import-fields.service';
import { afterInputsChange } from '../services/input-changes.service';
import type { JobQueue } from '../services/jobs/job-queue';

const upload = singleUpload(IMPORT_LIMIT_BYTES, 'boundary file');

export function fieldImportRoutes({ sequelize, jobs }: { sequelize: Sequelize; jobs?: JobQueue }): Router {
  const r = Router();
  r.post('/:farmId/fields/import', loadFarmMembership, requireRole('farmer'), upload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the boundary file as the multipart part named "file".');
    const result = await importFields(sequelize, { userId: req.user!.id }, req.membership!.farmId, {
      buffer: req.file.buffer,
      originalName: req.file.originalname,
      mimeType: req.file.mimetype,
    });
    const fieldIds = result.created.map((f) => f.id);
    await afterInputsChange({ sequelize, jobs }, { kind: 'boundary', farmId: req.membership!.farmId, fieldIds }, { userId: req.user!.id });
    res.status(201).json(result);
  });
  return r;
}
