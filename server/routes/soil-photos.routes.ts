// Soil profile photos of a field: list, upload, the image and its thumbnail, remove.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { loadFieldMembership } from '../middleware/field-access';
import { loadPhotoMembership } from '../middleware/soil-access';
import { requireFile, singleUpload } from '../middleware/upload';
import { presentPhoto, presentPhotos } from '../presenters/soil-photo.presenter';
import type { FileStorage } from '../services/storage/file-storage';
import { deletePhoto, listPhotos, photoFile, uploadPhoto } from '../services/soils/soil-photos.service';
import { PHOTO_MAX_BYTES } from '../../shared/limits';
import { actorOf, editsSoils, fieldIdOf } from './soils-route-helpers';

const photoUpload = singleUpload(PHOTO_MAX_BYTES, 'photo');

export function soilPhotosRoutes(deps: { sequelize: Sequelize; storage: FileStorage }): Router {
  const r = Router();
  r.get('/fields/:fieldId/soil-photos', loadFieldMembership, async (_req, res) => {
    res.json(presentPhotos(await listPhotos(fieldIdOf(res))));
  });
  r.post('/fields/:fieldId/soil-photos', loadFieldMembership, editsSoils, photoUpload, requireFile('the photo'), async (req, res) => {
    const body = (req.body ?? {}) as { caption?: unknown; sampleId?: unknown; clientKey?: unknown };
    const photo = await uploadPhoto(deps, actorOf(req), fieldIdOf(res), {
      buffer: req.file!.buffer,
      caption: typeof body.caption === 'string' ? body.caption : undefined,
      sampleId: typeof body.sampleId === 'string' ? body.sampleId : undefined,
      clientKey: typeof body.clientKey === 'string' ? body.clientKey : undefined,
    });
    res.status(201).json(presentPhoto(photo));
  });
  for (const which of ['image', 'thumbnail'] as const) {
    r.get(`/soil-photos/:photoId/${which}`, loadPhotoMembership, async (_req, res) => {
      const f = await photoFile(deps, res.locals.photoId as number, which);
      res.type(f.contentType).set('Cache-Control', 'private, max-age=3600').send(f.body);
    });
  }
  r.delete('/soil-photos/:photoId', loadPhotoMembership, editsSoils, async (req, res) => {
    await deletePhoto(deps, actorOf(req), res.locals.photoId as number);
    res.status(204).end();
  });
  return r;
}
