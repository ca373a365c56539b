import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { SlopeClassesUpdate } from '../../shared/schemas/terrain';
import { singleUpload } from '../middleware/upload';
import { validate } from '../middleware/validate';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { loadJobForMember } from '../middleware/job-access';
import { badRequest } from '../lib/http-error';
import type { FileStorage } from '../services/storage/file-storage';
import type { JobQueue } from '../services/jobs/job-queue';
import { acceptDem, farmElevation } from '../services/elevation-models.service';
import { farmLayers, layerImage } from '../services/terrain-layers.service';
import { setSlopeClasses, slopeClassesOfFarm } from '../services/slope-classes.service';
import { fieldTerrain } from '../services/field-terrain.service';
import { presentFarmElevation, presentFarmLayers, presentFieldTerrain } from '../presenters/terrain.presenter';
import { presentJob } from '../presenters/job.presenter';
import { DEM_MAX_BYTES } from '../../shared/limits';

const upload = singleUpload(DEM_MAX_BYTES, 'elevation model');

type Deps = { sequelize: Sequelize; storage: FileStorage; jobs?: JobQueue; demMaxCells: number };

export function terrainRoutes(deps: Deps): { farms: Router; fields: Router; jobs: Router } {
  const farms = Router();
  farms.post('/:farmId/dems', loadFarmMembership, requireRole('farmer'), upload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the elevation model as the multipart part named "file".');
    const file = { buffer: req.file.buffer, originalName: req.file.originalname };
    res.status(202).json(await acceptDem(deps, { userId: req.user!.id }, req.membership!.farmId, file));
  });

  // A landowner sees only the fields they own, so not the farm-wide model and layers, which
  // show every field; their own fields' figures come with /fields/:id/terrain.
  farms.get('/:farmId/elevation', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    res.json(presentFarmElevation(await farmElevation(req.membership!.farmId)));
  });

  farms.get('/:farmId/layers', loadFarmMembership, async (req, res) => {
    const { farmId, role } = req.membership!;
    res.json(role === 'landowner' ? [] : presentFarmLayers(farmId, await farmLayers(deps.sequelize, farmId)));
  });

  farms.get('/:farmId/layers/:file', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    const kind = String(req.params.file).replace(/\.png$/, '');
    const season = typeof req.query.season === 'string' ? req.query.season : undefined;
    const image = await layerImage(deps, req.membership!.farmId, kind, season);
    res.type('png').set('Cache-Control', image.cacheControl).send(image.png);
  });

  farms.get('/:farmId/slope-classes', loadFarmMembership, async (req, res) => {
    res.json(await slopeClassesOfFarm(req.membership!.farmId));
  });
  farms.put('/:farmId/slope-classes', loadFarmMembership, requireRole('farmer', 'advisor'), validate(SlopeClassesUpdate), async (req, res) => {
    const { classes } = req.body as SlopeClassesUpdate;
    res.json(await setSlopeClasses(deps, { userId: req.user!.id }, req.membership!.farmId, classes));
  });

  const fields = Router();
  fields.get('/:fieldId/terrain', loadFieldMembership, async (req, res) => {
    res.json(presentFieldTerrain(await fieldTerrain({ id: res.locals.fieldId as number, farmId: req.membership!.farmId })));
  });

  const jobs = Router();
  jobs.get('/:jobId', loadJobForMember, (_req, res) => {
    res.json(presentJob(res.locals.job, res.locals.jobRole));
  });
  return { farms, fields, jobs };
}
