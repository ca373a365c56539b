// Soil summaries of many fields at once (fieldSoilSummaries), for the assessments of a whole
// farm: the same figures as the one-field summary, read in a fixed number of queries.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';
import { featureOf, type Box } from '../fixtures/soils/soil-fixtures';
import { fieldSoilSummaries, fieldSoilSummary } from '../../server/services/soils/field-soil-summary';

const ctx = makeTestApp();
afterAll(() => ctx.close());

const UNIT_A: Box = [-91.785, 42.305, -91.7776, 42.32];
const UNIT_B: Box = [-91.7776, 42.305, -91.77, 42.32];
const soilMap = {
  type: 'FeatureCollection',
  features: [
    featureOf(UNIT_A, { KFFACT: '0.43', TFACT: 5, HYDGRP: 'C/D', TEXTURE: 'silty clay loam', DRAINAGECL: 'Somewhat poorly drained' }),
    featureOf(UNIT_B, { KFFACT: '0.24', TFACT: 3, HYDGRP: 'B', TEXTURE: 'Loam', DRAINAGECL: 'Well drained' }),
  ],
};

const FIELDS: Record<string, Box> = {
  'Across both units': [-91.78, 42.31, -91.776, 42.313],
  'Inside unit A, with a feel test': [-91.784, 42.314, -91.78, 42.317],
  'Inside unit B, with lab samples': [-91.774, 42.314, -91.77, 42.317],
  'Off the map, with a feel test': [-91.76, 42.31, -91.756, 42.313],
  'Off the map, nothing known': [-91.75, 42.31, -91.746, 42.313],
};

async function mappedFarm() {
  const { farm, users } = await makeFarm(['farmer']);
  const agent = await signedIn(ctx.app, users.farmer);
  const ids: Record<string, number> = {};
  for (const [name, box] of Object.entries(FIELDS)) {
    const res = await agent.post(`/api/farms/${farm.id}/fields`).send(featureOf(box, { name }));
    expect(res.status).toBe(201);
    ids[name] = res.body.id;
  }
  expect((await agent.post(`/api/farms/${farm.id}/soil-map`).attach('file', Buffer.from(JSON.stringify(soilMap)), 'survey.geojson')).status).toBe(201);
  const sample = async (field: string, body: Record<string, unknown>) => expect((await agent.post(`/api/fields/${ids[field]}/soil-samples`).send(body)).status).toBe(201);
  await sample('Inside unit A, with a feel test', { kind: 'feel', balls: true, ribbonCm: 6, feel: 'smooth', depthToGrayCm: 40 });
  await sample('Inside unit B, with lab samples', { kind: 'lab', sandPct: 44, siltPct: 38, clayPct: 18, organicMatterPct: 2.1, sampledOn: '2026-04-01' });
  await sample('Inside unit B, with lab samples', { kind: 'lab', sandPct: 36, siltPct: 42, clayPct: 22, organicMatterPct: 3.1, cecCmolPerKg: 14 });
  await sample('Off the map, with a feel test', { kind: 'feel', balls: true, ribbonCm: 2, feel: 'smooth', organicMatterPct: 2 });
  await sample('Off the map, with a feel test', { kind: 'feel', balls: true, ribbonCm: 4, feel: 'neither', describedToCm: 120 });
  return { farmId: farm.id, ids };
}

/** How many SQL statements a call sends. */
async function queriesOf(run: () => Promise<unknown>): Promise<number> {
  let n = 0;
  const count = () => {
    n++;
  };
  ctx.sequelize.addHook('beforeQuery', 'count', count);
  try {
    await run();
  } finally {
    ctx.sequelize.removeHook('beforeQuery', 'count');
  }
  return n;
}

describe('soil summaries of many fields', () => {
  it("gives every field of the farm the same summary as the one-field summary", async () => {
    const { farmId, ids } = await mappedFarm();
    const all = await fieldSoilSummaries(ctx.sequelize, { farmId });
    expect([...all.keys()].sort((a, b) => a - b)).toEqual(Object.values(ids).sort((a, b) => a - b));
    for (const [name, id] of Object.entries(ids)) expect(all.get(id), name).toEqual(await fieldSoilSummary(ctx.sequelize, id));
    // The cases differ, so the comparison above compares something: the map's mix, samples, defaults.
    expect(all.get(ids['Across both units'])!.hsgShares.map((h) => h.group)).toEqual(['C/D', 'B']);
    expect(all.get(ids['Inside unit A, with a feel test'])).toMatchObject({ textureClass: 'silty clay', kUs: 0.43, tTonPerAcYr: 5, hsg: 'C/D' });
    expect(all.get(ids['Inside unit B, with lab samples'])).toMatchObject({ sampleCount: 2, textureClass: 'loam', kUs: 0.24, tTonPerAcYr: 3, hsg: 'B' });
    expect(all.get(ids['Off the map, with a feel test'])).toMatchObject({ sampleCount: 2, tSource: { kind: 'default', source: { title: expect.stringMatching(/deep-soil T/) } }, drainageClass: 'well drained' });
    expect(all.get(ids['Off the map, nothing known'])).toMatchObject({ sampleCount: 0, kUs: null, hsg: null, tTonPerAcYr: 5 });
  });

  it('gives only the fields asked for, and only those of the farm', async () => {
    const { farmId, ids } = await mappedFarm();
    const other = await mappedFarm();
    const someIds = [ids['Across both units'], ids['Off the map, with a feel test'], other.ids['Across both units']];
    const some = await fieldSoilSummaries(ctx.sequelize, { farmId, fieldIds: someIds });
    expect([...some.keys()].sort((a, b) => a - b)).toEqual(someIds.slice(0, 2).sort((a, b) => a - b));
    expect(some.get(ids['Off the map, with a feel test'])).toEqual(await fieldSoilSummary(ctx.sequelize, ids['Off the map, with a feel test']));
    expect((await fieldSoilSummaries(ctx.sequelize, { farmId, fieldIds: [] })).size).toBe(0);
  });

  it('reads five fields in as many queries as one', async () => {
    const { farmId, ids } = await mappedFarm();
    const one = await queriesOf(() => fieldSoilSummaries(ctx.sequelize, { farmId, fieldIds: [ids['Across both units']] }));
    const five = await queriesOf(() => fieldSoilSummaries(ctx.sequelize, { farmId }));
    expect(five).toBe(one);
    // The fields, their samples, and the map units under them.
    expect(five).toBe(3);
  });
});
