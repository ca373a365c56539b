// A second invented client farm of the demo advisor (data/demo/birch-hollow.json), with typed
// slopes instead of an elevation model, so the advisor's board spans two farms.
import { readFileSync } from 'node:fs';
import proj4 from 'proj4';
import type { Sequelize } from 'sequelize';
import { Farm, Membership, User } from '../../models';
import { hashPassword } from '../../services/auth.service';
import { insertField } from '../../services/fields.service';
import { putClimate, putGround } from '../../services/climate-ground.service';
import { putCropping } from '../../services/seasons.service';
import { createSample } from '../../services/soils/soil-samples.service';
import { SoilSampleCreate } from '../../../shared/schemas/soils';
import type { ClimateUpdate, CroppingUpdate } from '../../../shared/schemas/season';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-farm';

const UTM15N = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';

type Spec = {
  farm: string;
  farmer: { email: string; name: string };
  season: string;
  climate: ClimateUpdate;
  fields: { name: string; ringUtm: [number, number][]; ground: { slopePct: number; slopeLengthM: number }; cropping: Omit<CroppingUpdate, 'season'>; soil: unknown }[];
};

export async function seedDemoSecondFarm(sequelize: Sequelize): Promise<void> {
  const spec = JSON.parse(readFileSync('data/demo/birch-hollow.json', 'utf8')) as Spec;
  if (await Farm.findOne({ where: { name: spec.farm } })) return;
  const advisor = (await User.findOne({ where: { email: DEMO_ACCOUNTS[1].email } }))!;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const { farm, farmerId } = await sequelize.transaction(async (t) => {
    const farmer = await User.create({ email: spec.farmer.email, name: spec.farmer.name, passwordHash }, { transaction: t });
    const farm = await Farm.create({ name: spec.farm }, { transaction: t });
    await Membership.create({ userId: farmer.id, farmId: farm.id, role: 'farmer' }, { transaction: t });
    await Membership.create({ userId: advisor.id, farmId: farm.id, role: 'advisor' }, { transaction: t });
    return { farm, farmerId: farmer.id };
  });
  const actor = { userId: farmerId };
  await putClimate(sequelize, actor, farm.id, spec.climate);
  for (const f of spec.fields) {
    const ring = f.ringUtm.map((p) => proj4(UTM15N, 'WGS84', p) as [number, number]);
    ring.push(ring[0]);
    const id = await sequelize.transaction((t) => insertField(sequelize, actor, farm.id, { geometry: { type: 'Polygon', coordinates: [ring] }, name: f.name }, t));
    const field = { id, farmId: farm.id };
    await putGround(sequelize, actor, field, f.ground);
    await putCropping(sequelize, actor, field, { ...f.cropping, season: spec.season });
    await createSample(sequelize, actor, id, SoilSampleCreate.parse(f.soil));
  }
}
