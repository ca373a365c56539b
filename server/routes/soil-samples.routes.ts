// Soil samples of a field: list, add (typed or a CSV of lab results), change, remove.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { SoilSampleCreate, SoilSampleUpdate } from '../../shared/schemas/soils';
import { loadFieldMembership } from '../middleware/field-access';
import { loadSampleMembership } from '../middleware/soil-access';
import { requireFile, singleUpload } from '../middleware/upload';
import { validate } from '../middleware/validate';
import { presentSample, presentSamples } from '../presenters/soil-sample.presenter';
import { importSoilCsv, SOIL_CSV_LIMIT_BYTES } from '../services/soils/import-soil-csv.service';
import { createSample, deleteSample, listSamples, updateSample } from '../services/soils/soil-samples.service';
import { actorOf, editsSoils, fieldIdOf } from './soils-route-helpers';

// Memory storage: uploads are checked in memory and stored only under server-made keys.
const csvUpload = singleUpload(SOIL_CSV_LIMIT_BYTES, 'soil sample CSV');

export function soilSamplesRoutes(sequelize: Sequelize): Router {
  const r = Router();
  r.get('/fields/:fieldId/soil-samples', loadFieldMembership, async (_req, res) => {
    res.json(presentSamples(await listSamples(fieldIdOf(res))));
  });
  r.post('/fields/:fieldId/soil-samples', loadFieldMembership, editsSoils, validate(SoilSampleCreate), async (req, res) => {
    res.status(201).json(presentSample(await createSample(sequelize, actorOf(req), fieldIdOf(res), req.body)));
  });
  r.post('/fields/:fieldId/soil-samples/import', loadFieldMembership, editsSoils, csvUpload, requireFile('the CSV'), async (req, res) => {
    const acceptGoodRows = String(req.body?.acceptGoodRows ?? req.query.acceptGoodRows ?? '') === 'true';
    const file = { buffer: req.file!.buffer, originalName: req.file!.originalname };
    const { created, rejected } = await importSoilCsv(sequelize, actorOf(req), fieldIdOf(res), file, { acceptGoodRows });
    res.status(201).json({ created: presentSamples(created), rejected });
  });
  r.patch('/soil-samples/:sampleId', loadSampleMembership, editsSoils, validate(SoilSampleUpdate), async (req, res) => {
    res.json(presentSample(await updateSample(sequelize, actorOf(req), res.locals.sampleId as number, req.body)));
  });
  r.delete('/soil-samples/:sampleId', loadSampleMembership, editsSoils, async (req, res) => {
    await deleteSample(sequelize, actorOf(req), res.locals.sampleId as number);
    res.status(204).end();
  });
  return r;
}
