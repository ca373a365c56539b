// Strip cropping by rotation (AH-537 table 14) and drained dual-group soils (NEH 630 ch. 7),
// from the Cropping and Ground records through to the assessment.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';
import { featureOf, type Box } from '../fixtures/soils/soil-fixtures';

const ctx = makeTestApp();
afterAll(() => ctx.close());

const UNIT: Box = [-91.79, 42.3, -91.76, 42.33];
const FIELD: Box = [-91.784, 42.314, -91.78, 42.317];
// A mapped C/D soil: silty clay loam, K 0.43 (US), T 5.
const soilMap = { type: 'FeatureCollection', features: [featureOf(UNIT, { KFFACT: '0.43', TFACT: 5, HYDGRP: 'C/D', TEXTURE: 'silty clay loam', DRAINAGECL: 'Somewhat poorly drained' })] };
const corn = { season: '2027', crop: 'corn', tillage: 'no-till', residuePct: 0 };

async function mappedField() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const farmId = made.farm.id;
  const fieldId = (await farmer.post(`/api/farms/${farmId}/fields`).send(featureOf(FIELD, { name: 'Low ground' }))).body.id as number;
  expect((await farmer.post(`/api/farms/${farmId}/soil-map`).attach('file', Buffer.from(JSON.stringify(soilMap)), 'survey.geojson')).status).toBe(201);
  await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 127 });
  return { ...made, farmer, farmId, fieldId };
}

describe('strip cropping by rotation', () => {
  it('asks for the rotation with strip cropping, naming the field, and stores nothing', async () => {
    const { farmer, fieldId } = await mappedField();
    const res = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, practice: 'strip cropping' });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^stripRotation: stripRotation is required with strip cropping/);
    expect((await farmer.get(`/api/fields/${fieldId}/cropping?season=2027`)).status).toBe(404);
    const bad = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, practice: 'strip cropping', stripRotation: 'D' });
    expect(bad.body.message).toMatch(/^stripRotation/);
  });

  it("gives each rotation its own column of AH-537 table 14 (values recalled) and warns of strips too wide", async () => {
    const { farmer, fieldId } = await mappedField();
    await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 7, slopeLengthM: 60 });
    const pOf = async (stripRotation: string, version?: number, stripWidthM?: number) => {
      const put = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, practice: 'strip cropping', stripRotation, stripWidthM, version });
      expect(put.status).toBe(200);
      expect(put.body).toMatchObject({ stripRotation, stripWidthM: stripWidthM ?? null });
      return (await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
    };
    // AH-537 table 14, 6–8 % slopes: A 0.25, B 0.38, C 0.50; strips up to 100 ft (30.5 m).
    expect((await pOf('A')).estimate.factors.p.value).toBe(0.25);
    expect((await pOf('B', 0)).estimate.factors.p.value).toBe(0.38);
    const c = await pOf('C', 1, 40);
    expect(c.estimate.factors.p.value).toBe(0.5);
    expect(c.estimate.warnings.join(' ')).toMatch(/40 m wide are wider than the 30 m/); // 100 ft = 30.48 m, to the whole metre
    expect(c.inputs.find((i: { key: string }) => i.key === 'practice').value).toMatch(/strips of row crop alternating with strips of winter grain, strips 40 m wide/);
  });
});

describe('a drained field on a dual-group soil (NEH 630 ch. 7)', () => {
  it('takes D until the drained water-table depth is given and at least 60 cm, and says why', async () => {
    const { farmer, fieldId } = await mappedField();
    await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, practice: 'none' });
    const cnOf = async () => (await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
    // TR-55 Table 2-2b: row crops, straight row, good condition (no-till) — C 85, D 89.
    expect((await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 2, slopeLengthM: 60 })).body).toMatchObject({ drained: false, drainedWaterTableDepthCm: null });
    const undrained = await cnOf();
    expect(undrained.estimate.runoff.cn.value).toBe(89);
    await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 2, slopeLengthM: 60, drained: true, version: 0 });
    const noDepth = await cnOf();
    expect(noDepth.estimate.runoff.cn.value).toBe(89);
    expect(noDepth.estimate.warnings.join(' ')).toMatch(/C\/D taken as D although the field is drained: the depth .* is not given/);
    expect(noDepth.inputs.find((i: { key: string }) => i.key === 'drainage').value).toBe('drained, water-table depth not given');
    const deep = await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 2, slopeLengthM: 60, drained: true, drainedWaterTableDepthCm: 90, version: 1 });
    expect(deep.body).toMatchObject({ drained: true, drainedWaterTableDepthCm: 90, version: 2 });
    const drained = await cnOf();
    expect(drained.estimate.runoff.cn.value).toBe(85);
    expect(drained.estimate.runoff.cn.method).toMatch(/group C \(dual C\/D, drained, water table kept at 90 cm\)/);
  });

  it('refuses a water-table depth for an undrained field, naming the field', async () => {
    const { farmer, fieldId } = await mappedField();
    const res = await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 2, slopeLengthM: 60, drainedWaterTableDepthCm: 90 });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^drainedWaterTableDepthCm/);
    expect((await farmer.get(`/api/fields/${fieldId}/ground`)).body.version).toBeNull();
  });
});
