// The priority board reads stored assessments: the number of SQL statements behind a board does
// not grow with the number of fields on the farm, nor with the number of an advisor's farms.
import { afterAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import request from 'supertest';
import { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels, Membership } from '../../server/models';
import { makeFarm, makeUser, signedIn, squareFeature } from '../helpers/test-app';

let counting = false;
let statements = 0;
const sequelize = new Sequelize(inject('databaseUrl'), {
  dialect: 'postgres',
  define: { underscored: true },
  logging: () => {
    if (counting) statements++;
  },
});
initModels(sequelize);
const app = createApp({ sequelize, config: loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'count-secret-count-secret' }), clientDir: '/nonexistent' });
afterAll(() => sequelize.close());

async function statementsOf(call: () => Promise<request.Response>): Promise<{ count: number; body: { rows: unknown[] } }> {
  statements = 0;
  counting = true;
  const res = await call();
  counting = false;
  expect(res.status).toBe(200);
  return { count: statements, body: res.body };
}

/** A farm with `n` fields, a climate, one cropped field and a season; the advisor is a member. */
async function farmWith(n: number, lng0: number, advisor?: { userId: number }) {
  const made = await makeFarm(['farmer']);
  const farmer = await signedIn(app, made.users.farmer);
  const farmId = made.farm.id;
  if (advisor) await Membership.create({ userId: advisor.userId, farmId, role: 'advisor' });
  await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 100 });
  const ids: number[] = [];
  for (let i = 0; i < n; i++) ids.push((await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(lng0 + i * 0.004, 42.31, 150, `F${i}`))).body.id);
  await farmer.put(`/api/fields/${ids[0]}/ground`).send({ slopePct: 6, slopeLengthM: 40 });
  await farmer.put(`/api/fields/${ids[0]}/cropping`).send({ season: '2027', crop: 'corn', tillage: 'no-till', residuePct: 40 });
  return { farmId, farmer };
}

describe('board reads', () => {
  it('takes the same number of statements for 3 fields as for 30', async () => {
    const small = await farmWith(3, -92.5);
    const large = await farmWith(30, -92.3);
    const a = await statementsOf(() => small.farmer.get(`/api/farms/${small.farmId}/board?season=2027`));
    const b = await statementsOf(() => large.farmer.get(`/api/farms/${large.farmId}/board?season=2027`));
    expect(a.body.rows).toHaveLength(3);
    expect(b.body.rows).toHaveLength(30);
    expect(b.count).toBe(a.count);
    // The session (user and memberships) and the board with its season: two statements.
    expect(a.count).toBe(2);
  });

  it("takes the same number of statements for an advisor's one farm as for three", async () => {
    const one = await makeUser();
    const three = await makeUser();
    await farmWith(2, -92.0, { userId: one.id });
    for (const lng of [-91.9, -91.8, -91.7]) await farmWith(2, lng, { userId: three.id });
    const a = await statementsOf(async () => (await signedIn(app, one)).get('/api/board'));
    const b = await statementsOf(async () => (await signedIn(app, three)).get('/api/board'));
    expect(a.body.rows).toHaveLength(2);
    expect(b.body.rows).toHaveLength(6);
    expect(b.count).toBe(a.count);
  });
});
