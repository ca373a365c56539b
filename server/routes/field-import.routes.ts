import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { requireFile, singleUpload } from '../middleware/upload';
import { validate } from '../middleware/validate';
import { importFields } from '../services/import-fields.service';
import { previewImport } from '../services/import-preview.service';
import type { JobQueue } from '../services/jobs/job-queue';
import { BOUNDARY_IMPORT_MAX_BYTES } from '../../shared/limits';
import { ImportBody } from '../../shared/schemas/field-import';

const upload = singleUpload(BOUNDARY_IMPORT_MAX_BYTES, 'boundary file');

const fileOf = (file: Express.Multer.File) => ({ buffer: file.buffer, originalName: file.originalname, mimeType: file.mimetype });

export function fieldImportRoutes({ sequelize, jobs }: { sequelize: Sequelize; jobs?: JobQueue }): Router {
  const r = Router();
  // Parses and checks the file against the farm's fields; stores nothing.
  r.post('/:farmId/fields/import/preview', loadFarmMembership, requireRole('farmer'), upload, requireFile('the boundary file'), async (req, res) => {
    res.json(await previewImport(sequelize, req.membership!.farmId, fileOf(req.file!)));
  });
  // Stores the file's features; the multipart text part `options` (JSON) carries the preview's choices.
  r.post('/:farmId/fields/import', loadFarmMembership, requireRole('farmer'), upload, requireFile('the boundary file'), validate(ImportBody), async (req, res) => {
    const { options } = req.body as ImportBody;
    res.status(201).json(await importFields({ sequelize, jobs }, { userId: req.user!.id }, req.membership!.farmId, fileOf(req.file!), options));
  });
  return r;
}
