// Who gets a notice: the farm's members in the given roles (or the given users) who have not
// turned that kind of notice off.
import type { Transaction } from 'sequelize';
import type { Role } from '../../../shared/schemas/auth';
import type { NoticeKind } from '../../../shared/schemas/people';
import { Membership, NoticeSetting, User } from '../../models';

export type Recipient = { userId: number; email: string; name: string };

export async function noticeRecipients(kind: NoticeKind, who: { farmId: number; roles: Role[] } | { userIds: number[] }, transaction?: Transaction): Promise<Recipient[]> {
  const ids = 'userIds' in who ? who.userIds : await Membership.userIdsOfFarm(who.farmId, who.roles, transaction);
  const unique = [...new Set(ids)];
  if (!unique.length) return [];
  const off = await NoticeSetting.turnedOff(unique, kind);
  const users = await User.findAll({ attributes: ['id', 'email', 'name'], where: { id: unique.filter((id) => !off.has(id)) }, order: [['id', 'ASC']], transaction });
  return users.map((u) => ({ userId: u.id, email: u.email, name: u.name }));
}
