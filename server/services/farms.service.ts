import type { Sequelize } from 'sequelize';
import type { Farm as FarmDto, FarmSummary, Role } from '../../shared/schemas/auth';
import { Farm, Membership, User } from '../models';
import { farmFieldsExtent } from '../models/field.queries';

export async function listFarms(userId: number): Promise<FarmSummary[]> {
  const ms = await Membership.findAll({ where: { userId }, include: [{ model: Farm, as: 'farm' }], order: [['farmId', 'ASC']] });
  return ms.map((m) => {
    const farm = (m as Membership & { farm: Farm }).farm;
    return { id: farm.id, name: farm.name, role: m.role };
  });
}

export async function getFarm(sequelize: Sequelize, membership: Membership): Promise<FarmDto> {
  const farm = (await Farm.findByPk(membership.farmId))!;
  const ownFieldsOnly = membership.role === 'landowner';
  const bbox = await farmFieldsExtent(sequelize, farm.id, ownFieldsOnly ? membership.id : undefined);
  // A landowner sees only the people who run the farm, not other landowners.
  const ms = await Membership.findAll({ where: { farmId: farm.id }, include: [{ model: User, as: 'user' }], order: [['id', 'ASC']] });
  const members = ms
    .filter((m) => !ownFieldsOnly || m.role !== 'landowner' || m.id === membership.id)
    .map((m) => ({ membershipId: m.id, userId: m.userId, name: (m as Membership & { user: User }).user.name, role: m.role as Role }));
  return {
    id: farm.id,
    name: farm.name,
    role: membership.role,
    bbox,
    members,
  };
}
