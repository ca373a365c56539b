// The demo farm's 2027 season (data/demo/season-2027.json): climate, cropping and typed slope
// length per field, and the soil checks of data/demo/soils-2027.json. Run once with the demo farm.
import { readFileSync } from 'node:fs';
import type { Sequelize } from 'sequelize';
import { Farm, Field, User } from '../../models';
import { putClimate, putGround } from '../../services/climate-ground.service';
import { putCropping } from '../../services/seasons.service';
import { demoFields, DEMO_ACCOUNTS, DEMO_FARM_NAME } from './demo-farm';
import type { ClimateUpdate, CroppingUpdate } from '../../../shared/schemas/season';
import { SoilSampleCreate } from '../../../shared/schemas/soils';
import { createSample } from '../../services/soils/soil-samples.service';

type SeasonFile = {
  season: string;
  climate: ClimateUpdate;
  fields: Record<string, { cropping: Omit<CroppingUpdate, 'season'>; slopeLengthM: number }>;
};

export async function seedDemoSeason(sequelize: Sequelize): Promise<void> {
  const data = JSON.parse(readFileSync('data/demo/season-2027.json', 'utf8')) as SeasonFile;
  const soils = JSON.parse(readFileSync('data/demo/soils-2027.json', 'utf8')) as { samples: Record<string, unknown[]> };
  const farm = (await Farm.findOne({ where: { name: DEMO_FARM_NAME } }))!;
  const farmer = (await User.findOne({ where: { email: DEMO_ACCOUNTS[0].email } }))!;
  const actor = { userId: farmer.id };
  await putClimate(sequelize, actor, farm.id, data.climate);
  const keyByName = new Map(demoFields().map((f) => [f.properties.name, (f.properties as { key?: string }).key ?? '']));
  for (const f of await Field.findAll({ where: { farmId: farm.id }, attributes: ['id', 'name'], order: [['name', 'ASC']] })) {
    const spec = data.fields[keyByName.get(f.name) ?? ''];
    if (!spec) continue;
    const field = { id: f.id, farmId: farm.id };
    await putCropping(sequelize, actor, field, { ...spec.cropping, season: data.season });
    await putGround(sequelize, actor, field, { slopePct: null, slopeLengthM: spec.slopeLengthM });
    for (const raw of soils.samples[keyByName.get(f.name) ?? ''] ?? []) {
      await createSample(sequelize, actor, f.id, SoilSampleCreate.parse(raw));
    }
  }
}
