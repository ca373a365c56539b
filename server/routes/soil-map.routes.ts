// A farm's soil map (read, upload, attribute mapping, removal) and the map units under a field.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { SoilMapMapping } from '../../shared/schemas/soils';
import { loadFarmMembership } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { requireFile, singleUpload } from '../middleware/upload';
import { validate } from '../middleware/validate';
import { presentSoilMap, presentSoilMapUpload } from '../presenters/soil-map.presenter';
import { fieldSoilMapUnits } from '../services/soils/field-soil-map';
import { SOIL_MAP_LIMIT_BYTES } from '../services/soils/read-soil-map-file';
import { deleteSoilMap, setSoilMapMapping, soilMapInfo, uploadSoilMap } from '../services/soils/soil-map.service';
import { actorOf, editsSoils, fieldIdOf } from './soils-route-helpers';

const mapUpload = singleUpload(SOIL_MAP_LIMIT_BYTES, 'soil map');

export function soilMapRoutes(sequelize: Sequelize): Router {
  const r = Router();
  r.get('/farms/:farmId/soil-map', loadFarmMembership, editsSoils, async (req, res) => {
    res.json(presentSoilMap(await soilMapInfo(sequelize, req.membership!.farmId)));
  });
  r.post('/farms/:farmId/soil-map', loadFarmMembership, editsSoils, mapUpload, requireFile('the soil map'), async (req, res) => {
    const file = { buffer: req.file!.buffer, originalName: req.file!.originalname };
    res.status(201).json(presentSoilMapUpload(await uploadSoilMap(sequelize, actorOf(req), req.membership!.farmId, file)));
  });
  r.put('/farms/:farmId/soil-map/mapping', loadFarmMembership, editsSoils, validate(SoilMapMapping), async (req, res) => {
    res.json(presentSoilMap(await setSoilMapMapping(sequelize, actorOf(req), req.membership!.farmId, req.body)));
  });
  r.delete('/farms/:farmId/soil-map', loadFarmMembership, editsSoils, async (req, res) => {
    await deleteSoilMap(sequelize, actorOf(req), req.membership!.farmId);
    res.status(204).end();
  });
  r.get('/fields/:fieldId/soil-map-units', loadFieldMembership, async (_req, res) => {
    res.json(await fieldSoilMapUnits(sequelize, fieldIdOf(res)));
  });
  return r;
}
