import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { FieldCreate } from '../../shared/schemas/field';
import { validate } from '../middleware/validate';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { getFarm, listFarms } from '../services/farms.service';
import { createField, listFarmFieldsFor } from '../services/fields.service';
import { presentFieldCollection } from '../presenters/field.presenter';
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
    res.json(presentFieldCollection(await listFarmFieldsFor(sequelize, req.membership!)));
  });

  r.post('/:farmId/fields', loadFarmMembership, requireRole('farmer'), validate(FieldCreate), async (req, res) => {
    const body = req.body as FieldCreate;
    const input = {
      geometry: body.geometry,
      name: typeof body.properties?.name === 'string' ? body.properties.name : null,
      ownerMembershipId: body.properties?.ownerMembershipId ?? null,
    };
    res.status(201).json(await createField({ sequelize, jobs }, { userId: req.user!.id }, req.membership!.farmId, input));
  });
  return r;
}
