import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { FieldCreate } from '../../shared/schemas/field';
import type { FieldCollection } from '../../shared/schemas/field';
import { validate } from '../middleware/validate';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { getFarm, listFarms } from '../services/farms.service';
import { queryFields } from '../services/field-presenter';
import { createField } from '../services/fields.service';
import { afterInputsChange } from '../services/input-changes.service';
import type { JobQueue } from '../services/jobs/job-queue';

export function farmsRoutes({ sequelize, jobs }: { sequelize: Sequelize; jobs?: JobQueue }): Router {
  const r = Router();
  r.get('/', async (req, res) => {
    res.json(await listFarms(req.user!.id));
  });

  r.get('/:farmId', loadFarmMembership, async (req, res) => {
    res.json(await getFarm(sequelize, req.membership!));
  });

  r.get('/:farmId/fields', loadFarmMembership, async (req, res) => {
    const m = req.membership!;
    const features = await queryFields(sequelize, { farmId: m.farmId, ...(m.role === 'landowner' ? { ownerMembershipId: m.id, visibleToOwner: m.id } : {}) });
    const body: FieldCollection = { type: 'FeatureCollection', features };
    res.json(body);
  });

  r.post('/:farmId/fields', loadFarmMembership, requireRole('farmer'), validate(FieldCreate), async (req, res) => {
    const body = req.body as FieldCreate;
    const feature = await createField(sequelize, { userId: req.user!.id }, req.membership!.farmId, {
      geometry: body.geometry,
      name: typeof body.properties?.name === 'string' ? body.properties.name : null,
      ownerMembershipId: body.properties?.ownerMembershipId ?? null,
    });
    await afterInputsChange({ sequelize, jobs }, { kind: 'boundary', farmId: feature.properties.farmId, fieldIds: [feature.id] }, { userId: req.user!.id });
    res.status(201).json(feature);
  });
  return r;
}
