import { QueryTypes, type Sequelize } from 'sequelize';
import type { Farm as FarmDto, FarmSummary, Role } from '../../shared/schemas/auth';
import { Farm, Membership, User } from '../models';

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
  const [box] = await sequelize.query<{ w: number | null; s: number; e: number; n: number }>(
    `SELECT ST_XMin(b) AS w, ST_YMin(b) AS s, ST_XMax(b) AS e, ST_YMax(b) AS n
       FROM (SELECT ST_Extent(geom)::geometry AS b FROM fields
              WHERE farm_id = :farmId ${ownFieldsOnly ? 'AND owner_membership_id = :mid' : ''}) x`,
    { replacements: { farmId: farm.id, mid: membership.id }, type: QueryTypes.SELECT },
  );
  // A landowner sees only the people who run the farm, not other landowners.
  const ms = await Membership.findAll({ where: { farmId: farm.id }, include: [{ model: User, as: 'user' }], order: [['id', 'ASC']] });
  const members = ms
    .filter((m) => !ownFieldsOnly || m.role !== 'landowner' || m.id === membership.id)
    .map((m) => ({ membershipId: m.id, userId: m.userId, name: (m as Membership & { user: User }).user.name, role: m.role as Role }));
  return {
    id: farm.id,
    name: farm.name,
    role: membership.role,
    bbox: box && box.w !== null ? [box.w, box.s, box.e, box.n] : null,
    members,
  };
}
