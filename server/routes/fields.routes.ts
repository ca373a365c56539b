import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { FieldUpdate } from '../../shared/schemas/field';
import { validate } from '../middleware/validate';
import { requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { queryFields } from '../services/field-presenter';
import { deleteField, updateField } from '../services/fields.service';
import { afterInputsChange } from '../services/input-changes.service';
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
    const kind = req.body.geometry ? 'boundary' : 'field-details';
    await afterInputsChange({ sequelize, jobs }, { kind, farmId: updated.properties.farmId, fieldIds: [updated.id] }, { userId: req.user!.id });
    res.json(updated);
  });
  r.delete('/:fieldId', loadFieldMembership, requireRole('farmer'), async (req, res) => {
    const fileKeys = await deleteField(sequelize, { userId: req.user!.id }, res.locals.fieldId as number);
    await Promise.all(fileKeys.map((k) => storage.remove(k).catch((e: unknown) => console.error(`could not remove ${k}:`, e))));
    res.status(204).end();
  });
  return r;
}
