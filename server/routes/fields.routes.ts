import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { FieldUpdate } from '../../shared/schemas/field';
import { validate } from '../middleware/validate';
import { requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { deleteField, getFieldFor, updateField } from '../services/fields.service';
import type { JobQueue } from '../services/jobs/job-queue';
import type { FileStorage } from '../services/storage/file-storage';

export function fieldsRoutes({ sequelize, jobs, storage }: { sequelize: Sequelize; jobs?: JobQueue; storage: FileStorage }): Router {
  const r = Router();
  r.get('/:fieldId', loadFieldMembership, async (req, res) => {
    res.json(await getFieldFor(sequelize, res.locals.fieldId as number, req.membership!));
  });
  r.patch('/:fieldId', loadFieldMembership, requireRole('farmer'), validate(FieldUpdate), async (req, res) => {
    res.json(await updateField({ sequelize, jobs }, { userId: req.user!.id }, res.locals.fieldId as number, req.body));
  });
  r.delete('/:fieldId', loadFieldMembership, requireRole('farmer'), async (req, res) => {
    await deleteField({ sequelize, storage }, { userId: req.user!.id }, res.locals.fieldId as number);
    res.status(204).end();
  });
  return r;
}
