// The people of a farm: who they are, their role, a landowner's fields; the farmer changes a
// role or removes someone. A removal takes effect on the person's next request, because every
// request reads the caller's memberships afresh (User.findSignedIn).
import type { Sequelize } from 'sequelize';
import type { People } from '../../../shared/schemas/people';
import type { MembershipUpdate } from '../../../shared/schemas/people';
import { Field, Invitation, Membership, User } from '../../models';
import { badRequest, invalid, notFound } from '../../lib/http-error';
import { presentInvitation, presentPeople } from '../../presenters/people.presenter';
import { recordEvent } from '../audit';

/** GET /api/farms/:farmId/people: members for farmer and advisor; open invitations for the farmer. */
export async function listPeople(viewer: Membership): Promise<People> {
  const farmId = viewer.farmId;
  const [members, owned] = await Promise.all([Membership.ofFarmWithUsers(farmId), Field.ownersOfFarm(farmId)]);
  if (viewer.role !== 'farmer') return { people: presentPeople(members, owned, viewer.userId), invitations: [] };
  const open = await Invitation.openOfFarm(farmId);
  const names = new Map(members.map((m) => [m.userId, m.user.name]));
  const inviters = await User.findAll({ attributes: ['id', 'name'], where: { id: open.map((i) => i.invitedBy).filter((id): id is number => id != null && !names.has(id)) } });
  for (const u of inviters) names.set(u.id, u.name);
  return {
    people: presentPeople(members, owned, viewer.userId),
    invitations: open.map((i) => presentInvitation(i, i.invitedBy != null ? (names.get(i.invitedBy) ?? null) : null)),
  };
}

const LAST_FARMER = 'A farm needs at least one farmer; make someone else farmer first.';

/** PATCH /api/farms/:farmId/people/:membershipId (farmer). */
export async function changeRole(sequelize: Sequelize, actor: { userId: number }, farmId: number, membershipId: number, input: MembershipUpdate): Promise<void> {
  await sequelize.transaction(async (t) => {
    const m = await Membership.findOne({ where: { id: membershipId, farmId }, transaction: t, lock: t.LOCK.UPDATE });
    if (!m) throw notFound('That member');
    const fieldIds = [...new Set(input.fieldIds ?? [])];
    if (fieldIds.length && (await Field.countOfFarm(farmId, fieldIds, t)) !== fieldIds.length) {
      throw badRequest('invalid_input', 'fieldIds: every field must be a field of this farm', { issues: [{ path: 'fieldIds', message: 'every field must be a field of this farm' }] });
    }
    if (m.role === 'farmer' && input.role !== 'farmer' && (await Membership.countFarmers(farmId, t)) <= 1) throw invalid('last_farmer', LAST_FARMER);
    const before = m.role;
    await m.update({ role: input.role }, { transaction: t });
    await Field.setOwnedFields(farmId, m.id, input.role === 'landowner' ? fieldIds : [], t);
    await recordEvent({ userId: actor.userId, farmId, entity: 'membership', entityId: m.id, action: 'role-changed', detail: { from: before, to: input.role, fieldIds } }, t);
  });
}

/** DELETE /api/farms/:farmId/people/:membershipId (farmer): the person loses the farm at once. */
export async function removePerson(sequelize: Sequelize, actor: { userId: number }, farmId: number, membershipId: number): Promise<void> {
  await sequelize.transaction(async (t) => {
    const m = await Membership.findOne({ where: { id: membershipId, farmId }, transaction: t, lock: t.LOCK.UPDATE });
    if (!m) throw notFound('That member');
    if (m.role === 'farmer' && (await Membership.countFarmers(farmId, t)) <= 1) throw invalid('last_farmer', LAST_FARMER);
    // Their fields stay on the farm without an owner (fields.owner_membership_id is ON DELETE SET NULL).
    await m.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'membership', entityId: m.id, action: 'removed', detail: { userId: m.userId, role: m.role } }, t);
  });
}
