// Create, change and remove fields: one transaction each, with the version check and an
// audit event. Routes call these; they never see req/res.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { FieldName, type FieldFeature, type FieldUpdate } from '../../shared/schemas/field';
import type { AreaGeometry } from '../../shared/schemas/geojson';
import { Field, Membership } from '../models';
import { conflict, invalid, notFound } from '../lib/http-error';
import { checkGeometry } from './field-geometry';
import { queryFields } from './field-presenter';
import { recordEvent } from './audit';

type Actor = { userId: number };

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

/** Inserts one field inside the caller's transaction; throws HttpError on bad geometry. */
export async function insertField(
  sequelize: Sequelize,
  actor: Actor,
  farmId: number,
  input: { geometry: AreaGeometry; name?: string | null; ownerMembershipId?: number | null },
  transaction: Transaction,
): Promise<number> {
  const g = await measured(sequelize, input.geometry, transaction);
  await checkOwner(farmId, input.ownerMembershipId, transaction);
  // Imported names come from files: one that is not a usable name gives way to the default.
  const given = FieldName.safeParse(input.name ?? '');
  const name = given.success ? given.data : await nextDefaultName(farmId, transaction);
  const [row] = await sequelize.query<{ id: number }>(
    `INSERT INTO fields (farm_id, name, geom, area_m2, perimeter_m, owner_membership_id)
     VALUES (:farmId, :name, ST_SetSRID(ST_GeomFromGeoJSON(:gj), 4326), :areaM2, :perimeterM, :owner)
     RETURNING id`,
    {
      replacements: { farmId, name, gj: JSON.stringify(g.geometry), areaM2: g.areaM2, perimeterM: g.perimeterM, owner: input.ownerMembershipId ?? null },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  await recordEvent({ userId: actor.userId, farmId, entity: 'field', entityId: row.id, action: 'created', detail: { name, areaM2: g.areaM2 } }, transaction);
  return row.id;
}

export async function createField(
  sequelize: Sequelize,
  actor: Actor,
  farmId: number,
  input: { geometry: AreaGeometry; name?: string | null; ownerMembershipId?: number | null },
): Promise<FieldFeature> {
  return sequelize.transaction(async (t) => {
    const id = await insertField(sequelize, actor, farmId, input, t);
    const [f] = await queryFields(sequelize, { fieldIds: [id] }, t);
    return f;
  });
}

export async function updateField(sequelize: Sequelize, actor: Actor, fieldId: number, patch: FieldUpdate): Promise<FieldFeature> {
  return sequelize.transaction(async (t) => {
    const field = await Field.findByPk(fieldId, { transaction: t, lock: t.LOCK.UPDATE });
    if (!field) throw notFound('That field');
    if (field.version !== patch.version) {
      const [current] = await queryFields(sequelize, { fieldIds: [fieldId] }, t);
      throw conflict(
        'stale_version',
        `Someone changed this field since you opened it (you had version ${patch.version}, it is now ${field.version}). Reload it and make your change again.`,
        { current },
      );
    }
    const sets: string[] = ['version = version + 1', 'updated_at = now()'];
    const rep: Record<string, unknown> = { id: fieldId };
    const changed: string[] = [];
    if (patch.name !== undefined) {
      sets.push('name = :name');
      rep.name = patch.name;
      changed.push('name');
    }
    if (patch.geometry !== undefined) {
      const g = await measured(sequelize, patch.geometry, t);
      sets.push('geom = ST_SetSRID(ST_GeomFromGeoJSON(:gj), 4326)', 'area_m2 = :areaM2', 'perimeter_m = :perimeterM');
      Object.assign(rep, { gj: JSON.stringify(g.geometry), areaM2: g.areaM2, perimeterM: g.perimeterM });
      changed.push('geometry');
    }
    if (patch.ownerMembershipId !== undefined) {
      await checkOwner(field.farmId, patch.ownerMembershipId, t);
      sets.push('owner_membership_id = :owner');
      rep.owner = patch.ownerMembershipId;
      changed.push('owner');
    }
    await sequelize.query(`UPDATE fields SET ${sets.join(', ')} WHERE id = :id`, { replacements: rep, transaction: t });
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'field', entityId: fieldId, action: 'updated', detail: { changed } }, t);
    const [f] = await queryFields(sequelize, { fieldIds: [fieldId] }, t);
    return f;
  });
}

/** Removes the field and its rows; returns the storage keys of its files for the caller to delete after commit. */
export async function deleteField(sequelize: Sequelize, actor: Actor, fieldId: number): Promise<string[]> {
  return sequelize.transaction(async (t) => {
    const field = await Field.findByPk(fieldId, { transaction: t });
    if (!field) throw notFound('That field');
    const photos = await sequelize.query<{ image_key: string; thumbnail_key: string }>(
      `SELECT image_key, thumbnail_key FROM soil_photos WHERE field_id = :fieldId`,
      { replacements: { fieldId }, type: QueryTypes.SELECT, transaction: t },
    );
    await field.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'field', entityId: fieldId, action: 'deleted', detail: { name: field.name } }, t);
    return photos.flatMap((p) => [p.image_key, p.thumbnail_key]);
  });
}
