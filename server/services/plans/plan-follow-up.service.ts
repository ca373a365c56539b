// Follow-up on a plan's actions: the farmer (or the advisor) records that the work was done, on
// which day, how much was actually applied, with an optional photo; the advisor then marks it
// checked. These are records of what happened, not changes to the plan: the plan's version,
// state and revision stay as they are, so an approved plan needs no new approval. The action's
// own version moves, so someone editing it from an older read gets 409.
import type { Sequelize } from 'sequelize';
import { badRequest, invalid, notFound, unsupportedType } from '../../lib/http-error';
import { PlanAction } from '../../models';
import { recordEvent } from '../audit';
import { detectImageType } from '../soils/detect-image-type';
import { makeThumbnail } from '../soils/make-thumbnail';
import { newKey, type FileStorage } from '../storage/file-storage';
import { answer, lockAction, type ActionAnswer } from './plan-actions.service';
import type { Actor } from './plans.service';

type Deps = { sequelize: Sequelize; storage: FileStorage };
type DoneInput = { version: number; doneOn: string; appliedQuantity?: number; note?: string };

/** The photo checked by its content (JPEG, PNG, WebP) and its thumbnail made, before anything is stored. */
async function readPhoto(buffer: Buffer) {
  if (buffer.length === 0) throw badRequest('empty_file', 'The photo is empty (0 bytes): attach a JPEG, PNG or WebP photo.');
  const type = detectImageType(buffer);
  if (!type) throw unsupportedType('A photo of the work must be a JPEG, PNG or WebP image; this file is none of those (its content was checked, not its name).');
  const thumb = await makeThumbnail(buffer);
  if (!thumb.ok) throw invalid('invalid_image', `The ${type.mime.slice(6).toUpperCase()} image could not be read (${thumb.reason}); it may be damaged or incomplete.`);
  return { type, thumbnail: thumb.thumbnail };
}

/** POST /api/plan-actions/:actionId/done */
export async function markDone(deps: Deps, actor: Actor, actionId: number, input: DoneInput, photo?: Buffer): Promise<ActionAnswer> {
  const { sequelize, storage } = deps;
  const checked = photo ? await readPhoto(photo) : null;
  const keys = checked ? { image: newKey('plan-photos', checked.type.ext), thumbnail: newKey('plan-photos/thumbnails', '.jpg') } : null;
  let old: { image: string | null; thumbnail: string | null } = { image: null, thumbnail: null };
  try {
    if (checked && keys) {
      await storage.put(keys.image, photo!);
      await storage.put(keys.thumbnail, checked.thumbnail);
    }
    const result = await sequelize.transaction(async (t) => {
      const { action, plan } = await lockAction(actionId, input.version, t);
      if (action.status === 'checked') throw invalid('already_checked', 'The advisor has already checked this work; it cannot be marked done again.');
      old = { image: keys ? action.photoKey : null, thumbnail: keys ? action.photoThumbnailKey : null };
      await action.update(
        {
          status: 'done',
          doneOn: input.doneOn,
          appliedQuantity: input.appliedQuantity ?? null,
          doneNote: input.note ?? null,
          doneByUser: actor.userId,
          doneAt: new Date(),
          ...(checked && keys ? { photoKey: keys.image, photoThumbnailKey: keys.thumbnail, photoContentType: checked.type.mime } : {}),
          version: action.version + 1,
        },
        // updated_at and updated_by stay the last change to the plan's work, not to its follow-up.
        { transaction: t, silent: true },
      );
      await recordEvent(
        { userId: actor.userId, farmId: plan.farmId, entity: 'plan_action', entityId: actionId, action: 'done', detail: { planId: plan.id, doneOn: input.doneOn, photo: Boolean(checked) } },
        t,
      );
      return answer(plan.id, actionId, t);
    });
    // A photo replaced: its old files go once the new row is written.
    await Promise.all([old.image, old.thumbnail].filter((k): k is string => Boolean(k)).map((k) => storage.remove(k)));
    return result;
  } catch (e) {
    // No orphan files when the row could not be written.
    if (keys) await Promise.all([storage.remove(keys.image), storage.remove(keys.thumbnail)]);
    throw e;
  }
}

/** POST /api/plan-actions/:actionId/check (advisor only, by route). */
export async function markChecked(sequelize: Sequelize, actor: Actor, actionId: number, version: number): Promise<ActionAnswer> {
  return sequelize.transaction(async (t) => {
    const { action, plan } = await lockAction(actionId, version, t);
    if (action.status === 'planned') throw invalid('not_done', 'Only work marked done can be checked: the farmer records it done first.');
    if (action.status === 'checked') return answer(plan.id, actionId, t);
    await action.update({ status: 'checked', checkedBy: actor.userId, checkedAt: new Date(), version: action.version + 1 }, { transaction: t, silent: true });
    await recordEvent({ userId: actor.userId, farmId: plan.farmId, entity: 'plan_action', entityId: actionId, action: 'checked', detail: { planId: plan.id } }, t);
    return answer(plan.id, actionId, t);
  });
}

/** GET /api/plan-actions/:actionId/photo (and /photo/thumbnail). */
export async function actionPhoto(deps: Deps, actionId: number, which: 'image' | 'thumbnail'): Promise<{ body: Buffer; contentType: string }> {
  const action = await PlanAction.findByPk(actionId, { attributes: ['id', 'photoKey', 'photoThumbnailKey', 'photoContentType'] });
  if (!action?.photoKey || !action.photoThumbnailKey) throw notFound('A photo of that work');
  if (which === 'thumbnail') return { body: await deps.storage.get(action.photoThumbnailKey), contentType: 'image/jpeg' };
  return { body: await deps.storage.get(action.photoKey), contentType: action.photoContentType ?? 'application/octet-stream' };
}
