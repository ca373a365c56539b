// Per-field overrides of R, K, C and P with their notes. Setting or removing one refreshes the
// field's stored assessments, which then use the typed figure and say who typed it and why.
import type { Sequelize } from 'sequelize';
import type { FactorOverride, FactorOverrideUpdate, OverrideFactor } from '../../shared/schemas/overrides';
import { HttpError } from '../lib/http-error';
import { FieldFactorOverride, User } from '../models';
import { presentFactorOverride } from '../presenters/factor-override.presenter';
import { recordEvent } from './audit';
import { afterInputsChange } from './input-changes.service';

const withSetter = { model: User, as: 'setter', attributes: ['name'] };
const ORDER: OverrideFactor[] = ['r', 'k', 'c', 'p'];

export async function listOverrides(fieldId: number): Promise<FactorOverride[]> {
  const rows = await FieldFactorOverride.findAll({ where: { fieldId }, include: [withSetter] });
  return rows.map(presentFactorOverride).sort((a, b) => ORDER.indexOf(a.factor) - ORDER.indexOf(b.factor));
}

/** Sets (or replaces) one factor's override for the field. */
export async function putOverride(
  sequelize: Sequelize,
  actor: { userId: number },
  field: { id: number; farmId: number },
  input: FactorOverrideUpdate,
): Promise<FactorOverride> {
  return sequelize.transaction(async (t) => {
    const values = { value: input.value, note: input.note, setBy: actor.userId };
    const existing = await FieldFactorOverride.findOne({ where: { fieldId: field.id, factor: input.factor }, transaction: t, lock: t.LOCK.UPDATE });
    const row = existing
      ? await existing.update(values, { transaction: t })
      : await FieldFactorOverride.create({ fieldId: field.id, factor: input.factor, ...values }, { transaction: t });
    await recordEvent(
      { userId: actor.userId, farmId: field.farmId, entity: 'factor-override', entityId: field.id, action: existing ? 'updated' : 'created', detail: { factor: input.factor, value: input.value } },
      t,
    );
    await afterInputsChange({ sequelize }, { kind: 'overrides', farmId: field.farmId, fieldIds: [field.id] }, actor, t);
    // Read back: REAL columns round what was sent, and the answer should match a later GET.
    const shown = await FieldFactorOverride.findByPk(row.id, { include: [withSetter], transaction: t });
    return presentFactorOverride(shown!);
  });
}

/** Removes one factor's override; the worked-out figure comes back. */
export async function deleteOverride(sequelize: Sequelize, actor: { userId: number }, field: { id: number; farmId: number }, factor: OverrideFactor): Promise<void> {
  await sequelize.transaction(async (t) => {
    const removed = await FieldFactorOverride.destroy({ where: { fieldId: field.id, factor }, transaction: t });
    if (removed === 0) throw new HttpError(404, 'no_override', `This field has no override of ${factor.toUpperCase()}.`);
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'factor-override', entityId: field.id, action: 'removed', detail: { factor } }, t);
    await afterInputsChange({ sequelize }, { kind: 'overrides', farmId: field.farmId, fieldIds: [field.id] }, actor, t);
  });
}
