// Fields: list, create, change and remove, each write in one transaction with the version check
// and an audit event, followed by what an input change calls for (terrain run, assessments).
// Routes call these; they never see req/res.
import type { Sequelize, Transaction } from 'sequelize';
import { FieldName, type FieldFeature, type FieldUpdate } from '../../shared/schemas/field';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import { Farm, Field, Membership, SoilPhoto } from '../models';
import { fieldWithSameOutline, selectFieldFeatureRows, type FieldFeatureFilter } from '../models/field.queries';
import { presentField } from '../presenters/field.presenter';
import { conflict, invalid, notFound } from '../lib/http-error';
import { checkGeometry } from './field-geometry';
import { recordEvent } from './audit';
import { afterInputsChange, type InputChangeDeps } from './input-changes.service';
import type { FileStorage } from './storage/file-storage';

type Actor = { userId: number };
type FieldInput = { geometry: AreaGeometry; name?: string | null; ownerMembershipId?: number | null };

/** Fields as API Features: of a farm, some ids, or one landowner's (see FieldFeatureFilter). */
export async function listFieldFeatures(sequelize: Sequelize, where: FieldFeatureFilter, transaction?: Transaction): Promise<FieldFeature[]> {
  return (await selectFieldFeatureRows(sequelize, where, transaction)).map(presentField);
}

/** A farm's fields as the member sees them: a landowner only their own, with overlaps among those. */
export async function listFarmFieldsFor(sequelize: Sequelize, member: Membership): Promise<FieldFeature[]> {
  const own = member.role === 'landowner' ? { ownerMembershipId: member.id, visibleToOwner: member.id } : {};
  return listFieldFeatures(sequelize, { farmId: member.farmId, ...own });
}

/** One field as the member sees it (field-access has already checked they may). */
export async function getFieldFor(sequelize: Sequelize, fieldId: number, member: Membership): Promise<FieldFeature> {
  const [f] = await listFieldFeatures(sequelize, { fieldIds: [fieldId], ...(member.role === 'landowner' ? { visibleToOwner: member.id } : {}) });
  if (!f) throw notFound('That field');
  return f;
}

async function nextDefaultName(farmId: number, transaction: Transaction): Promise<string> {
  const n = await Field.count({ where: { farmId }, transaction });
  return `Field ${n + 1}`;
}

async function checkOwner(farmId: number, ownerMembershipId: number | null | undefined, transaction: Transaction): Promise<void> {
  if (ownerMembershipId == null) return;
  const m = await Membership.findByPk(ownerMembershipId, { transaction });
  if (!m || m.farmId !== farmId || m.role !== 'landowner') {
    throw invalid('invalid_owner', 'ownerMembershipId must be a landowner member of this farm.');
  }
}

async function measured(sequelize: Sequelize, geometry: AreaGeometry, transaction: Transaction) {
  const check = await checkGeometry(sequelize, geometry, transaction);
  if (!check.ok) throw invalid(check.code, check.message, { repaired: check.repaired });
  return check;
}

/**
 * Inserts one field inside the caller's transaction; throws HttpError on bad geometry, and 409 when
 * the farm already has a field with this outline. A farm holds each outline once: that makes a
 * double-clicked save, a retried request or the same file imported twice store one field. The
 * farm's row is locked first so creations sent at the same moment are checked one after another.
 */
/**
 * Stores one field. A farm holds each outline once (ten identical creations at once store one),
 * unless the person asked for copies in an import (`allowSameOutline`).
 */
export async function insertField(
  sequelize: Sequelize, actor: Actor, farmId: number, input: FieldInput, transaction: Transaction, allowSameOutline = false,
): Promise<number> {
  const g = await measured(sequelize, input.geometry, transaction);
  await Farm.findByPk(farmId, { attributes: ['id'], lock: transaction.LOCK.UPDATE, transaction });
  const twin = allowSameOutline ? null : await fieldWithSameOutline(sequelize, farmId, g.geometry, transaction);
  if (twin) throw conflict('duplicate_field', `geometry: the farm already has this outline as field "${twin.name}" (id ${twin.id}); each outline is stored once.`, { fieldId: twin.id });
  await checkOwner(farmId, input.ownerMembershipId, transaction);
  // Imported names come from files: one that is not a usable name gives way to the default.
  const given = FieldName.safeParse(input.name ?? '');
  const name = given.success ? given.data : await nextDefaultName(farmId, transaction);
  const field = await Field.create(
    { farmId, name, geom: Field.storedGeometry(g.geometry), areaM2: g.areaM2, perimeterM: g.perimeterM, ownerMembershipId: input.ownerMembershipId ?? null },
    { transaction },
  );
  await recordEvent({ userId: actor.userId, farmId, entity: 'field', entityId: field.id, action: 'created', detail: { name, areaM2: g.areaM2 } }, transaction);
  return field.id;
}

/** A new field; its farm's terrain and assessments follow the new boundary. */
export async function createField(deps: InputChangeDeps, actor: Actor, farmId: number, input: FieldInput): Promise<FieldFeature> {
  const { sequelize } = deps;
  const feature = await sequelize.transaction(async (t) => {
    const id = await insertField(sequelize, actor, farmId, input, t);
    const [f] = await listFieldFeatures(sequelize, { fieldIds: [id] }, t);
    await afterInputsChange(deps, { kind: 'boundary', farmId, fieldIds: [f.id] }, actor, t);
    return f;
  });
  return feature;
}

/** Changes name, boundary or owner at the version the caller read (409 when stale). */
export async function updateField(deps: InputChangeDeps, actor: Actor, fieldId: number, patch: FieldUpdate): Promise<FieldFeature> {
  const { sequelize } = deps;
  const updated = await sequelize.transaction(async (t) => {
    const field = await Field.findByPk(fieldId, { transaction: t, lock: t.LOCK.UPDATE });
    if (!field) throw notFound('That field');
    if (field.version !== patch.version) {
      const [current] = await listFieldFeatures(sequelize, { fieldIds: [fieldId] }, t);
      throw conflict(
        'stale_version',
        `Someone changed this field since you opened it (you had version ${patch.version}, it is now ${field.version}). Reload it and make your change again.`,
        { current },
      );
    }
    const changes: Partial<Pick<Field, 'name' | 'geom' | 'areaM2' | 'perimeterM' | 'ownerMembershipId'>> = {};
    const changed: string[] = [];
    if (patch.name !== undefined) {
      changes.name = patch.name;
      changed.push('name');
    }
    if (patch.geometry !== undefined) {
      const g = await measured(sequelize, patch.geometry, t);
      Object.assign(changes, { geom: Field.storedGeometry(g.geometry), areaM2: g.areaM2, perimeterM: g.perimeterM });
      changed.push('geometry');
    }
    if (patch.ownerMembershipId !== undefined) {
      await checkOwner(field.farmId, patch.ownerMembershipId, t);
      changes.ownerMembershipId = patch.ownerMembershipId;
      changed.push('owner');
    }
    await field.update({ ...changes, version: field.version + 1 }, { transaction: t });
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'field', entityId: fieldId, action: 'updated', detail: { changed } }, t);
    const [f] = await listFieldFeatures(sequelize, { fieldIds: [fieldId] }, t);
    // A new boundary changes flow paths and per-field figures; a name or owner changes neither.
    const kind = patch.geometry !== undefined ? 'boundary' : 'field-details';
    await afterInputsChange(deps, { kind, farmId: field.farmId, fieldIds: [fieldId] }, actor, t);
    return f;
  });
  return updated;
}

/** Removes the field and its rows, then its files in storage (after the commit, so a rollback keeps them). */
export async function deleteField(deps: { sequelize: Sequelize; storage: FileStorage }, actor: Actor, fieldId: number): Promise<void> {
  const { sequelize, storage } = deps;
  const fileKeys = await sequelize.transaction(async (t) => {
    const field = await Field.findByPk(fieldId, { transaction: t, attributes: ['id', 'farmId', 'name'] });
    if (!field) throw notFound('That field');
    const photos = await SoilPhoto.findAll({ where: { fieldId }, attributes: ['imageKey', 'thumbnailKey'], transaction: t });
    const keys = photos.flatMap((p) => [p.imageKey, p.thumbnailKey]);
    await field.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'field', entityId: fieldId, action: 'deleted', detail: { name: field.name } }, t);
    return keys;
  });
  await Promise.all(fileKeys.map((k) => storage.remove(k).catch((e: unknown) => console.error(`could not remove ${k}:`, e))));
}
