// Soils (DESIGN.md capability 3): samples, CSV upload, profile photos, the farm's soil map and a
// field's soil summary. Farmer and advisor change soils; a landowner reads the samples, photos
// and summary of the fields they own; non-members get 404.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { singleUpload } from '../middleware/upload';
import { SoilMapMapping, SoilSampleCreate, SoilSampleUpdate } from '../../shared/schemas/soils';
import { badRequest } from '../lib/http-error';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { validate } from '../middleware/validate';
import type { FileStorage } from '../services/storage/file-storage';
import { fieldSoilSummary } from '../services/soils/field-soil-summary';
import { fieldSoilMapUnits } from '../services/soils/field-soil-map';
import { importSoilCsv } from '../services/soils/import-soil-csv.service';
import { loadPhotoMembership, loadSampleMembership } from '../services/soils/soil-access';
import { deleteSoilMap, setSoilMapMapping, soilMapInfo, uploadSoilMap } from '../services/soils/soil-map.service';
import { deletePhoto, listPhotos, photoFile, uploadPhoto } from '../services/soils/soil-photos.service';
import { createSample, deleteSample, updateSample } from '../services/soils/soil-samples.service';
import { querySamples } from '../services/soils/soil-sample-presenter';
import { PHOTO_MAX_BYTES, SOIL_CSV_MAX_BYTES, SOIL_MAP_MAX_BYTES } from '../../shared/limits';

// Memory storage: uploads are checked in memory and stored only under server-made keys.
const csvUpload = singleUpload(SOIL_CSV_MAX_BYTES, 'soil sample CSV');
const photoUpload = singleUpload(PHOTO_MAX_BYTES, 'photo');
const mapUpload = singleUpload(SOIL_MAP_MAX_BYTES, 'soil map');

/** Who may change soils on a farm (issue 5 item 6: the advisor edits soils too). */
const editsSoils = requireRole('farmer', 'advisor');

type Deps = { sequelize: Sequelize; storage: FileStorage };

/** Mounted at /api: routes under /fields, /farms, /soil-samples and /soil-photos. */
export function soilsRoutes({ sequelize, storage }: Deps): Router {
  const r = Router();
  const sampleAccess = loadSampleMembership(sequelize);
  const photoAccess = loadPhotoMembership(sequelize);
  const actor = (req: { user?: { id: number } }) => ({ userId: req.user!.id });
  const fieldId = (res: { locals: Record<string, unknown> }) => res.locals.fieldId as number;

  // ---- samples
  r.get('/fields/:fieldId/soil-samples', loadFieldMembership, async (_req, res) => {
    res.json(await querySamples(sequelize, { fieldId: fieldId(res) }));
  });
  r.post('/fields/:fieldId/soil-samples', loadFieldMembership, editsSoils, validate(SoilSampleCreate), async (req, res) => {
    res.status(201).json(await createSample(sequelize, actor(req), fieldId(res), req.body));
  });
  r.post('/fields/:fieldId/soil-samples/import', loadFieldMembership, editsSoils, csvUpload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the CSV as the multipart part named "file".');
    const accept = String(req.body?.acceptGoodRows ?? req.query.acceptGoodRows ?? '') === 'true';
    const result = await importSoilCsv(sequelize, actor(req), fieldId(res), { buffer: req.file.buffer, originalName: req.file.originalname }, { acceptGoodRows: accept });
    res.status(201).json(result);
  });
  r.patch('/soil-samples/:sampleId', sampleAccess, editsSoils, validate(SoilSampleUpdate), async (req, res) => {
    res.json(await updateSample(sequelize, actor(req), res.locals.sampleId as number, req.body));
  });
  r.delete('/soil-samples/:sampleId', sampleAccess, editsSoils, async (req, res) => {
    await deleteSample(sequelize, actor(req), res.locals.sampleId as number);
    res.status(204).end();
  });

  // ---- photos
  r.get('/fields/:fieldId/soil-photos', loadFieldMembership, async (_req, res) => {
    res.json(await listPhotos(sequelize, fieldId(res)));
  });
  r.post('/fields/:fieldId/soil-photos', loadFieldMembership, editsSoils, photoUpload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the photo as the multipart part named "file".');
    const body = (req.body ?? {}) as { caption?: unknown; sampleId?: unknown };
    const photo = await uploadPhoto({ sequelize, storage }, actor(req), fieldId(res), {
      buffer: req.file.buffer,
      caption: typeof body.caption === 'string' ? body.caption : undefined,
      sampleId: typeof body.sampleId === 'string' ? body.sampleId : undefined,
    });
    res.status(201).json(photo);
  });
  for (const which of ['image', 'thumbnail'] as const) {
    r.get(`/soil-photos/:photoId/${which}`, photoAccess, async (_req, res) => {
      const f = await photoFile({ sequelize, storage }, res.locals.photoId as number, which);
      res.type(f.contentType).set('Cache-Control', 'private, max-age=3600').send(f.body);
    });
  }
  r.delete('/soil-photos/:photoId', photoAccess, editsSoils, async (req, res) => {
    await deletePhoto({ sequelize, storage }, actor(req), res.locals.photoId as number);
    res.status(204).end();
  });

  // ---- soil map (farm) and a field's map units
  r.get('/farms/:farmId/soil-map', loadFarmMembership, editsSoils, async (req, res) => {
    res.json(await soilMapInfo(sequelize, req.membership!.farmId));
  });
  r.post('/farms/:farmId/soil-map', loadFarmMembership, editsSoils, mapUpload, async (req, res) => {
    if (!req.file) throw badRequest('no_file', 'Attach the soil map as the multipart part named "file".');
    res.status(201).json(await uploadSoilMap(sequelize, actor(req), req.membership!.farmId, { buffer: req.file.buffer, originalName: req.file.originalname }));
  });
  r.put('/farms/:farmId/soil-map/mapping', loadFarmMembership, editsSoils, validate(SoilMapMapping), async (req, res) => {
    res.json(await setSoilMapMapping(sequelize, actor(req), req.membership!.farmId, req.body));
  });
  r.delete('/farms/:farmId/soil-map', loadFarmMembership, editsSoils, async (req, res) => {
    await deleteSoilMap(sequelize, actor(req), req.membership!.farmId);
    res.status(204).end();
  });
  r.get('/fields/:fieldId/soil-map-units', loadFieldMembership, async (_req, res) => {
    res.json(await fieldSoilMapUnits(sequelize, fieldId(res)));
  });

  // ---- summary
  r.get('/fields/:fieldId/soil-summary', loadFieldMembership, async (_req, res) => {
    res.json(await fieldSoilSummary(sequelize, fieldId(res)));
  });
  return r;
}
