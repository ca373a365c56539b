// A farm made per test from the demo scenario's own files (data/demo/season-2027.json and
// soils-2027.json): the demo's climate, and some of its fields with their cropping and soil
// checks. Slope is typed (the demo's comes from its elevation model, which a browser test does
// not wait for).
import { readFileSync } from 'node:fs';
import type { Sequelize } from 'sequelize';
import { createField } from '../../server/services/fields.service';
import { putClimate, putGround } from '../../server/services/climate-ground.service';
import { putCropping } from '../../server/services/seasons.service';
import { createSample } from '../../server/services/soils/soil-samples.service';
import type { ClimateUpdate, CroppingUpdate } from '../../shared/schemas/season';
import { SoilSampleCreate } from '../../shared/schemas/soils';
import { makeFarm, squareFeature } from './test-app';

type SeasonFile = { season: string; climate: ClimateUpdate; fields: Record<string, { cropping: Omit<CroppingUpdate, 'season'>; slopeLengthM: number }> };

const season = JSON.parse(readFileSync('data/demo/season-2027.json', 'utf8')) as SeasonFile;
const soils = JSON.parse(readFileSync('data/demo/soils-2027.json', 'utf8')) as { samples: Record<string, unknown[]> };

/** A demo field by its key in the demo files, with the slope typed for it. */
export type DemoLikeField = { key: string; name: string; slopePct: number };

/** The demo's worst field (a long slope in chisel-tilled continuous corn) and two milder ones. */
export const DEMO_LIKE_FIELDS: DemoLikeField[] = [
  { key: 'long-slope', name: 'Long Slope', slopePct: 8 },
  { key: 'mill-hill', name: 'Mill Hill', slopePct: 7 },
  { key: 'hay-ground', name: 'Hay Ground', slopePct: 5 },
];

export async function makeDemoLikeFarm(sequelize: Sequelize, fields = DEMO_LIKE_FIELDS) {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const { farm, users } = made;
  const actor = { userId: users.farmer.id };
  await putClimate(sequelize, actor, farm.id, season.climate);
  const ids: Record<string, number> = {};
  for (const [i, f] of fields.entries()) {
    const spec = season.fields[f.key];
    const created = await createField({ sequelize }, actor, farm.id, { geometry: squareFeature(-91.6 + i * 0.01, 42.3, 300).geometry, name: f.name });
    ids[f.name] = created.id;
    const field = { id: created.id, farmId: farm.id };
    await putGround(sequelize, actor, field, { slopePct: f.slopePct, slopeLengthM: spec.slopeLengthM });
    await putCropping(sequelize, actor, field, { ...spec.cropping, season: season.season });
    for (const s of soils.samples[f.key] ?? []) await createSample(sequelize, actor, created.id, SoilSampleCreate.parse(s));
  }
  return { ...made, ids, season: season.season };
}
