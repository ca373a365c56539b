// Seeds the invented demo scenario (data/demo) once: three demo accounts, Alder Run Farm and
// its fields, some of them owned by the demo landowner.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { AreaGeometry } from '../../../shared/schemas/geojson';
import { Farm, Membership, User } from '../../models';
import { hashPassword } from '../../services/auth.service';
import { insertField } from '../../services/fields.service';

export const DEMO_PASSWORD = 'fieldshed-demo';
export const DEMO_ACCOUNTS = [
  { email: 'farmer@fieldshed.test', name: 'Mara Kettleby', role: 'farmer' as const },
  { email: 'advisor@fieldshed.test', name: 'Teo Lindqvist', role: 'advisor' as const },
  { email: 'landowner@fieldshed.test', name: 'Ines Harrowgate', role: 'landowner' as const },
];
export const DEMO_FARM_NAME = 'Alder Run Farm';

type DemoFeature = { properties: { name: string; ownedByLandowner: boolean }; geometry: AreaGeometry };

export function demoFields(root = process.cwd()): DemoFeature[] {
  const fc = JSON.parse(readFileSync(path.join(root, 'data/demo/fields.geojson'), 'utf8')) as { features: DemoFeature[] };
  return fc.features;
}

/** Returns false when the demo was already there. */
export async function seedDemoFarm(sequelize: Sequelize): Promise<boolean> {
  if (await User.findOne({ where: { email: DEMO_ACCOUNTS[0].email } })) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (t) => {
    const farm = await Farm.create({ name: DEMO_FARM_NAME }, { transaction: t });
    const members: Record<string, Membership> = {};
    for (const a of DEMO_ACCOUNTS) {
      const u = await User.create({ email: a.email, name: a.name, passwordHash }, { transaction: t });
      members[a.role] = await Membership.create({ userId: u.id, farmId: farm.id, role: a.role }, { transaction: t });
    }
    const farmer = members.farmer.userId;
    for (const f of demoFields()) {
      await insertField(
        sequelize,
        { userId: farmer },
        farm.id,
        { geometry: f.geometry, name: f.properties.name, ownerMembershipId: f.properties.ownedByLandowner ? members.landowner.id : null },
        t,
      );
    }
  });
  return true;
}
