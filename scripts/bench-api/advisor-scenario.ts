// An invented scenario for the advisor's board: one advisor with many client farms, each with a
// farmer, a climate, and fields of realistic size (4–36 ha rectangles laid out in rows with
// lanes between them, farms 5 km apart in UTM zone 15N), each field with typed ground, a
// season's cropping and a lab soil sample. Written through the same services the API uses, then
// the stored assessments are refreshed farm by farm.
import proj4 from 'proj4';
import type { Sequelize } from 'sequelize';
import { Farm, Membership, User } from '../../server/models';
import { hashPassword } from '../../server/services/auth.service';
import { insertField } from '../../server/services/fields.service';
import { putClimate, putGround } from '../../server/services/climate-ground.service';
import { putCropping } from '../../server/services/seasons.service';
import { createSample } from '../../server/services/soils/soil-samples.service';
import { refreshAssessments } from '../../server/services/assessments/refresh-assessments';
import { SoilSampleCreate } from '../../shared/schemas/soils';
import type { CroppingUpdate } from '../../shared/schemas/season';

const UTM15N = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';
const SEASON = '2027';
const FIELDS_PER_ROW = 5;
const LANE_M = 12;

export type Scenario = { farms: number; fieldsPerFarm: number; advisorEmail: string; password: string };

const CROPPINGS: Omit<CroppingUpdate, 'season'>[] = [
  { crop: 'corn', tillage: 'moldboard plough', residuePct: 5, practice: 'none' },
  { crop: 'corn', tillage: 'chisel or mulch-till', residuePct: 30, practice: 'none' },
  { crop: 'corn', tillage: 'no-till', residuePct: 55, practice: 'contouring' },
  { crop: 'soybean', tillage: 'chisel or mulch-till', residuePct: 20, practice: 'contouring' },
  { crop: 'soybean', tillage: 'no-till', residuePct: 40, practice: 'none' },
  { crop: 'small grain', tillage: 'chisel or mulch-till', residuePct: 35, practice: 'strip cropping' },
  { crop: 'hay or meadow', practice: 'none' },
  { crop: 'pasture', groundCoverPct: 85, practice: 'none' },
];

/** Park–Miller minimal standard generator: the same scenario on every run. */
function generator(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
}

function ring(x0: number, y0: number, widthM: number, heightM: number): [number, number][] {
  const corners: [number, number][] = [[x0, y0], [x0 + widthM, y0], [x0 + widthM, y0 + heightM], [x0, y0 + heightM], [x0, y0]];
  return corners.map((p) => proj4(UTM15N, 'WGS84', p) as [number, number]);
}

async function makeFarm(sequelize: Sequelize, index: number, scenario: Scenario, advisorId: number, passwordHash: string): Promise<void> {
  const random = generator(1000 + index);
  const between = (lo: number, hi: number) => lo + (hi - lo) * random();
  const { farm, farmerId } = await sequelize.transaction(async (transaction) => {
    const farmer = await User.create({ email: `bench-farmer-${index}@fieldshed.test`, name: `Bench Farmer ${index}`, passwordHash }, { transaction });
    const farm = await Farm.create({ name: `Bench Farm ${String(index).padStart(3, '0')}` }, { transaction });
    await Membership.create({ userId: farmer.id, farmId: farm.id, role: 'farmer' }, { transaction });
    await Membership.create({ userId: advisorId, farmId: farm.id, role: 'advisor' }, { transaction });
    return { farm, farmerId: farmer.id };
  });
  const actor = { userId: farmerId };
  await putClimate(sequelize, actor, farm.id, { rFrom: 'precipitation', annualPrecipitationMm: Math.round(between(700, 1100)), designStormMm: Math.round(between(80, 120)) });
  const originX = 560_000 + (index % 20) * 5_000;
  const originY = 4_600_000 + Math.floor(index / 20) * 5_000;
  let x = originX;
  let y = originY;
  let rowHeight = 0;
  for (let i = 0; i < scenario.fieldsPerFarm; i++) {
    if (i > 0 && i % FIELDS_PER_ROW === 0) {
      x = originX;
      y += rowHeight + LANE_M;
      rowHeight = 0;
    }
    const widthM = between(200, 600);
    const heightM = between(200, 600);
    const geometry = { type: 'Polygon' as const, coordinates: [ring(x, y, widthM, heightM)] };
    x += widthM + LANE_M;
    rowHeight = Math.max(rowHeight, heightM);
    const id = await sequelize.transaction((t) => insertField(sequelize, actor, farm.id, { geometry, name: `Field ${i + 1}` }, t));
    const field = { id, farmId: farm.id };
    await putGround(sequelize, actor, field, { slopePct: Number(between(1, 14).toFixed(1)), slopeLengthM: Math.round(between(30, 120)) });
    await putCropping(sequelize, actor, field, { ...CROPPINGS[Math.floor(random() * CROPPINGS.length)], season: SEASON });
    const clayPct = Math.round(between(12, 42));
    const sandPct = Math.round(between(10, 70 - clayPct));
    const sample = {
      kind: 'lab',
      label: `F${i + 1}-A`,
      sandPct,
      siltPct: 100 - sandPct - clayPct,
      clayPct,
      organicMatterPct: Number(between(1.5, 5).toFixed(1)),
      ph: Number(between(5.4, 7.4).toFixed(1)),
      bufferPh: Number(between(6.2, 7.2).toFixed(1)),
      depthToGrayCm: random() < 0.3 ? Math.round(between(30, 90)) : null,
      describedToCm: 100,
    };
    await createSample(sequelize, actor, id, SoilSampleCreate.parse(sample));
  }
  await refreshAssessments(sequelize, { farmId: farm.id });
}

/** Makes the scenario, `concurrency` farms at a time, reporting each finished farm. */
export async function makeAdvisorScenario(sequelize: Sequelize, scenario: Scenario, progress: (done: number) => void, concurrency = 4): Promise<void> {
  const passwordHash = await hashPassword(scenario.password);
  const advisor = await User.create({ email: scenario.advisorEmail, name: 'Bench Advisor', passwordHash });
  let next = 0;
  let done = 0;
  const worker = async () => {
    while (next < scenario.farms) {
      const index = next++;
      await makeFarm(sequelize, index, scenario, advisor.id, passwordHash);
      progress(++done);
    }
  };
  await Promise.all(Array.from({ length: concurrency }, worker));
}
