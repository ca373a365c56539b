// Soil profile photos: the type told from content (JPEG, PNG, WebP), a thumbnail made, both
// files stored under server-made keys; a row that cannot be written leaves no file behind.
// Photos are evidence for the person, not an input of any assessment.
import { UniqueConstraintError, type Sequelize } from 'sequelize';
import { ClientKey } from '../../../shared/schemas/soils';
import { badRequest, conflict, invalid, notFound, unsupportedType } from '../../lib/http-error';
import { Field, SoilPhoto, SoilSample } from '../../models';
import { recordEvent } from '../audit';
import { newKey, type FileStorage } from '../storage/file-storage';
import { detectImageType } from './detect-image-type';
import { makeThumbnail } from './make-thumbnail';

const MAX_ID = 2_147_483_647;

type Deps = { sequelize: Sequelize; storage: FileStorage };

export async function listPhotos(fieldId: number): Promise<SoilPhoto[]> {
  return SoilPhoto.findAll({ where: { fieldId }, order: [['id', 'ASC']] });
}

/** The sample a photo is attached to: it must be one of the same field's samples. */
async function sampleOfField(fieldId: number, sampleId: string | undefined): Promise<number | null> {
  if (sampleId === undefined || sampleId === '') return null;
  const id = Number(sampleId);
  const sample = Number.isInteger(id) && id > 0 && id <= MAX_ID ? await SoilSample.findOne({ where: { id, fieldId }, attributes: ['id'] }) : null;
  if (!sample) throw invalid('invalid_sample', 'sampleId must be a soil sample of this field.');
  return sample.id;
}

/** The photo stored earlier under this browser key, if any; a key used on another field is refused. */
async function photoWithKey(fieldId: number, clientKey: string | null): Promise<SoilPhoto | null> {
  if (!clientKey) return null;
  const earlier = await SoilPhoto.findOne({ where: { clientKey } });
  if (earlier && earlier.fieldId !== fieldId) throw conflict('client_key_used', 'clientKey was already used for a photo of another field: make a new key for each photo.');
  return earlier;
}

/** The optional multipart clientKey part, checked as the JSON routes check it. */
function clientKeyOf(raw: string | undefined): string | null {
  if (raw === undefined || raw === '') return null;
  const parsed = ClientKey.safeParse(raw);
  if (!parsed.success) throw badRequest('invalid_input', 'clientKey: clientKey must be a UUID', { issues: [{ path: 'clientKey', message: 'clientKey must be a UUID' }] });
  return parsed.data;
}

/** Stores a photo; with a clientKey, a photo already stored under it is answered instead (a resend after a lost answer). */
export async function uploadPhoto(
  deps: Deps,
  actor: { userId: number },
  fieldId: number,
  input: { buffer: Buffer; caption?: string; sampleId?: string; clientKey?: string },
): Promise<SoilPhoto> {
  const { sequelize, storage } = deps;
  const clientKey = clientKeyOf(input.clientKey);
  const earlier = await photoWithKey(fieldId, clientKey);
  if (earlier) return earlier;
  if (input.buffer.length === 0) throw badRequest('empty_file', 'The file is empty (0 bytes): attach a JPEG, PNG or WebP photo.');
  const type = detectImageType(input.buffer);
  if (!type) throw unsupportedType('A soil photo must be a JPEG, PNG or WebP image; this file is none of those (its content was checked, not its name).');
  const caption = input.caption?.trim().slice(0, 500) || null;
  const sampleId = await sampleOfField(fieldId, input.sampleId);
  const thumb = await makeThumbnail(input.buffer);
  if (!thumb.ok) throw invalid('invalid_image', `The ${type.mime.slice(6).toUpperCase()} image could not be read (${thumb.reason}); it may be damaged or incomplete.`);

  const imageKey = newKey('soil-photos', type.ext);
  const thumbnailKey = newKey('soil-photos/thumbnails', '.jpg');
  try {
    await storage.put(imageKey, input.buffer);
    await storage.put(thumbnailKey, thumb.thumbnail);
    return await sequelize.transaction(async (t) => {
      const photo = await SoilPhoto.create(
        {
          fieldId, sampleId, caption, imageKey, thumbnailKey, contentType: type.mime, byteSize: input.buffer.length,
          width: thumb.width, height: thumb.height, thumbnailWidth: thumb.thumbnailWidth, thumbnailHeight: thumb.thumbnailHeight, clientKey, createdBy: actor.userId,
        },
        { transaction: t },
      );
      const field = await Field.findByPk(fieldId, { attributes: ['farmId'], transaction: t, rejectOnEmpty: true });
      await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'soil_photo', entityId: photo.id, action: 'uploaded', detail: { fieldId, contentType: type.mime } }, t);
      return photo;
    });
  } catch (e) {
    // No orphan files when the row could not be written.
    await Promise.all([storage.remove(imageKey), storage.remove(thumbnailKey)]);
    const winner = e instanceof UniqueConstraintError ? await photoWithKey(fieldId, clientKey) : null;
    if (winner) return winner;
    throw e;
  }
}

/** The photo's bytes (or its thumbnail's) with their content type. */
export async function photoFile(deps: Deps, photoId: number, which: 'image' | 'thumbnail'): Promise<{ body: Buffer; contentType: string }> {
  const photo = await SoilPhoto.findByPk(photoId);
  if (!photo) throw notFound('That soil photo');
  if (which === 'thumbnail') return { body: await deps.storage.get(photo.thumbnailKey), contentType: 'image/jpeg' };
  return { body: await deps.storage.get(photo.imageKey), contentType: photo.contentType };
}

/** Removes the row, then its files (a file left by a failed removal is harmless; a row without its file is not). */
export async function deletePhoto(deps: Deps, actor: { userId: number }, photoId: number): Promise<void> {
  const { sequelize, storage } = deps;
  const photo = await sequelize.transaction(async (t) => {
    const photo = await SoilPhoto.findByPk(photoId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!photo) throw notFound('That soil photo');
    const field = await Field.findByPk(photo.fieldId, { attributes: ['farmId'], transaction: t, rejectOnEmpty: true });
    await photo.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'soil_photo', entityId: photoId, action: 'deleted', detail: { fieldId: photo.fieldId } }, t);
    return photo;
  });
  await Promise.all([storage.remove(photo.imageKey), storage.remove(photo.thumbnailKey)]);
}
