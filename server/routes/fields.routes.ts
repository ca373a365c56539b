import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { FieldUpdate } from '../../shared/schemas/field';
import { validate } from '../middleware/validate';
import { requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { queryFields } from '../services/field-presenter';
import { deleteField, updateField } from '../services/fields.service';
import { refreshTerrainIfAny } from '../services/terrain-refresh';
import type { JobQueue } from '../services/jobs/job-queue';
import type { FileStorage } from '../services/storage/file-storage';

export function fieldsRoutes({ sequelize, jobs, storage }: { sequelize: Sequelize; jobs?: JobQueue; storage: FileStorage }): Router {
  const r = Router();
  r.get('/:fieldId', loadFieldMembership, async (req, res) => {
    const m = req.membership!;
    const [f] = await queryFields(sequelize, { fieldIds: [res.locals.fieldId as number], ...(m.role === 'landowner' ? { visibleToOwner: m.id } : {}) });
    res.json(f);
  });
  r.patch('/:fieldId', loadFieldMembership, requireRole('farmer'), validate(FieldUpdate), async (req, res) => {
    const updated = await updateField(sequelize, { userId: req.user!.id }, res.locals.fieldId as number, req.body);
    if (req.body.geometry) await refreshTerrainIfAny({ sequelize, jobs }, updated.properties.farmId, req.user!.id);
    res.json(updated);
  });
  r.delete('/:fieldId', loadFieldMembership, requireRole('farmer'), async (req, res) => {
    const fileKeys = await deleteField(sequelize, { userId: req.user!.id }, res.locals.fieldId as number);
    await Promise.all(fileKeys.map((k) => storage.remove(k).catch((e: unknown) => console.error(`could not remove ${k}:`, e))));
    res.status(204).end();
  });
  return r;
}
