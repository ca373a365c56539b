// Soils: samples, CSV upload, profile photos, the farm's soil map and a field's soil summary.
// Farmer and advisor change soils; a landowner reads the samples, photos and summary of the
// fields they own; non-members get 404.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { loadFieldMembership } from '../middleware/field-access';
import type { FileStorage } from '../services/storage/file-storage';
import { fieldSoilSummary } from '../services/soils/field-soil-summary';
import { soilMapRoutes } from './soil-map.routes';
import { soilPhotosRoutes } from './soil-photos.routes';
import { soilSamplesRoutes } from './soil-samples.routes';
import { fieldIdOf } from './soils-route-helpers';

/** Mounted at /api: routes under /fields, /farms, /soil-samples and /soil-photos. */
export function soilsRoutes({ sequelize, storage }: { sequelize: Sequelize; storage: FileStorage }): Router {
  const r = Router();
  r.use(soilSamplesRoutes(sequelize));
  r.use(soilPhotosRoutes({ sequelize, storage }));
  r.use(soilMapRoutes(sequelize));
  r.get('/fields/:fieldId/soil-summary', loadFieldMembership, async (_req, res) => {
    res.json(await fieldSoilSummary(sequelize, fieldIdOf(res)));
  });
  return r;
}
