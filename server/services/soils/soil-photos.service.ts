// Soil profile photos: the type told from content (JPEG, PNG, WebP), a thumbnail made, both
// files stored under server-made keys; a row that cannot be written leaves no file behind.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { SoilPhoto } from '../../../shared/schemas/soils';
import { badRequest, invalid, notFound, unsupportedType } from '../../lib/http-error';
import { recordEvent } from '../audit';
import { newKey, type FileStorage } from '../storage/file-storage';
import { detectImageType } from './detect-image-type';
import { makeThumbnail } from './make-thumbnail';

type Deps = { sequelize: Sequelize; storage: FileStorage };
type Row = {
  id: number;
  field_id: number;
  sample_id: number | null;
  caption: string | null;
  image_key: string;
  thumbnail_key: string;
  content_type: string;
  byte_size: number;
  width: number;
  height: number;
  thumbnail_width: number;
  thumbnail_height: number;
  created_at: Date;
};

function present(r: Row): SoilPhoto {
  return {
    id: r.id,
    fieldId: r.field_id,
    sampleId: r.sample_id,
    caption: r.caption,
    contentType: r.content_type,
    byteSize: r.byte_size,
    width: r.width,
    height: r.height,
    thumbnailWidth: r.thumbnail_width,
    thumbnailHeight: r.thumbnail_height,
    url: `/api/soil-photos/${r.id}/image`,
    thumbnailUrl: `/api/soil-photos/${r.id}/thumbnail`,
    createdAt: new Date(r.created_at).toISOString(),
  };
}

async function photoRow(sequelize: Sequelize, photoId: number): Promise<Row | undefined> {
  const [row] = await sequelize.query<Row>('SELECT * FROM soil_photos WHERE id = :photoId', { replacements: { photoId }, type: QueryTypes.SELECT });
  return row;
}

export async function listPhotos(sequelize: Sequelize, fieldId: number): Promise<SoilPhoto[]> {
  const rows = await sequelize.query<Row>('SELECT * FROM soil_photos WHERE field_id = :fieldId ORDER BY id', { replacements: { fieldId }, type: QueryTypes.SELECT });
  return rows.map(present);
}

export async function uploadPhoto(
  deps: Deps,
  actor: { userId: number },
  fieldId: number,
  input: { buffer: Buffer; caption?: string; sampleId?: string },
): Promise<SoilPhoto> {
  const { sequelize, storage } = deps;
  if (input.buffer.length === 0) throw badRequest('empty_file', 'The file is empty (0 bytes): attach a JPEG, PNG or WebP photo.');
  const type = detectImageType(input.buffer);
  if (!type) throw unsupportedType('A soil photo must be a JPEG, PNG or WebP image; this file is none of those (its content was checked, not its name).');
  const caption = input.caption?.trim().slice(0, 500) || null;
  let sampleId: number | null = null;
  if (input.sampleId !== undefined && input.sampleId !== '') {
    sampleId = Number(input.sampleId);
    const [s] = Number.isInteger(sampleId) && sampleId > 0 && sampleId <= 2_147_483_647
      ? await sequelize.query<{ id: number }>('SELECT id FROM soil_samples WHERE id = :sampleId AND field_id = :fieldId', { replacements: { sampleId, fieldId }, type: QueryTypes.SELECT })
      : [];
    if (!s) throw invalid('invalid_sample', 'sampleId must be a soil sample of this field.');
  }
  const thumb = await makeThumbnail(input.buffer);
  if (!thumb.ok) throw invalid('invalid_image', `The ${type.mime.slice(6).toUpperCase()} image could not be read (${thumb.reason}); it may be damaged or incomplete.`);

  const imageKey = newKey('soil-photos', type.ext);
  const thumbnailKey = newKey('soil-photos/thumbnails', '.jpg');
  try {
    await storage.put(imageKey, input.buffer);
    await storage.put(thumbnailKey, thumb.thumbnail);
    return await sequelize.transaction(async (t) => {
      const [row] = await sequelize.query<Row>(
        `INSERT INTO soil_photos (field_id, sample_id, caption, image_key, thumbnail_key, content_type, byte_size, width, height, thumbnail_width, thumbnail_height, created_by)
         VALUES (:fieldId, :sampleId, :caption, :imageKey, :thumbnailKey, :mime, :size, :w, :h, :tw, :th, :userId) RETURNING *`,
        {
          replacements: {
            fieldId, sampleId, caption, imageKey, thumbnailKey, mime: type.mime, size: input.buffer.length,
            w: thumb.width, h: thumb.height, tw: thumb.thumbnailWidth, th: thumb.thumbnailHeight, userId: actor.userId,
          },
          type: QueryTypes.SELECT,
          transaction: t,
        },
      );
      const [f] = await sequelize.query<{ farm_id: number }>('SELECT farm_id FROM fields WHERE id = :fieldId', { replacements: { fieldId }, type: QueryTypes.SELECT, transaction: t });
      await recordEvent({ userId: actor.userId, farmId: f.farm_id, entity: 'soil_photo', entityId: row.id, action: 'uploaded', detail: { fieldId, contentType: type.mime } }, t);
      return present(row);
    });
  } catch (e) {
    // No orphan files when the row could not be written.
    await Promise.all([storage.remove(imageKey), storage.remove(thumbnailKey)]);
    throw e;
  }
}

/** The photo's bytes (or its thumbnail's) with their content type. */
export async function photoFile(deps: Deps, photoId: number, which: 'image' | 'thumbnail'): Promise<{ body: Buffer; contentType: string }> {
  const row = await photoRow(deps.sequelize, photoId);
  if (!row) throw notFound('That soil photo');
  if (which === 'thumbnail') return { body: await deps.storage.get(row.thumbnail_key), contentType: 'image/jpeg' };
  return { body: await deps.storage.get(row.image_key), contentType: row.content_type };
}

/** Removes the row, then its files (a file left by a failed removal is harmless; a row without its file is not). */
export async function deletePhoto(deps: Deps, actor: { userId: number }, photoId: number): Promise<void> {
  const { sequelize, storage } = deps;
  const row = await sequelize.transaction(async (t) => {
    const [r] = await sequelize.query<Row & { farm_id: number }>(
      'DELETE FROM soil_photos p USING fields f WHERE p.id = :photoId AND f.id = p.field_id RETURNING p.*, f.farm_id',
      { replacements: { photoId }, type: QueryTypes.SELECT, transaction: t },
    );
    if (!r) throw notFound('That soil photo');
    await recordEvent({ userId: actor.userId, farmId: r.farm_id, entity: 'soil_photo', entityId: photoId, action: 'deleted', detail: { fieldId: r.field_id } }, t);
    return r;
  });
  await Promise.all([storage.remove(row.image_key), storage.remove(row.thumbnail_key)]);
}
