// Every soils change that feeds an assessment (a sample added, changed or removed, a CSV kept,
// a soil map uploaded, re-mapped or removed) leaves the field's stored assessment and the farm's
// board showing the new K, T and hydrologic soil group.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';
import { featureOf, type Box } from '../fixtures/soils/soil-fixtures';

const ctx = makeTestApp();
afterAll(() => ctx.close());

const FIELD: Box = [-91.78, 42.31, -91.776, 42.313];
const AROUND_FIELD: Box = [-91.79, 42.3, -91.77, 42.32];
/** 1 t/ac/yr in t/ha/yr (short tons: 907.185 kg per 4046.86 m²). */
const T_PER_HA_PER_T_PER_AC = 2.2417;
// Loam 40/40/20 with OC 1.5 % (OM = 1.5 × 1.724): Williams K 0.2604 US (Sharpley & Williams 1990
// eq. 2.96); its texture gives hydrologic group B (common practice); T is the 5 t/ac/yr default.
const loam = { kind: 'lab', sandPct: 40, siltPct: 40, clayPct: 20, organicMatterPct: 1.5 * 1.724 };
const LOAM = { kUs: 0.2604, tTonPerAcYr: 5, hsg: 'B' };
// A survey map unit over the whole field: its K, T and group win over the sample where mapped.
const survey = { type: 'FeatureCollection', features: [featureOf(AROUND_FIELD, { KFFACT: '0.32', TFACT: 3, HYDGRP: 'C' })] };
const SURVEY = { kUs: 0.32, tTonPerAcYr: 3, hsg: 'C' };

async function assessedField() {
  const { farm, users } = await makeFarm(['farmer']);
  const agent = await signedIn(ctx.app, users.farmer);
  await agent.put(`/api/farms/${farm.id}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 127 });
  const fieldId = (await agent.post(`/api/farms/${farm.id}/fields`).send(featureOf(FIELD, { name: 'Pasture hill' }))).body.id as number;
  await agent.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 6, slopeLengthM: 30.48 });
  expect((await agent.put(`/api/fields/${fieldId}/cropping`).send({ season: '2027', crop: 'pasture', groundCoverPct: 60 })).status).toBe(200);
  return { agent, farmId: farm.id, fieldId };
}
type Agent = Awaited<ReturnType<typeof assessedField>>['agent'];

/** K, T and soil group as the field's assessment shows them, after checking the board row agrees with it. */
async function soilFigures(agent: Agent, farmId: number, fieldId: number) {
  const a = (await agent.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
  const board = (await agent.get(`/api/farms/${farmId}/board?season=2027`)).body;
  const row = board.rows.find((r: { fieldId: number }) => r.fieldId === fieldId);
  expect(row).toMatchObject({ soilLossTPerHaYr: a.soilLossTPerHaYr, toleranceTPerHaYr: a.toleranceTPerHaYr, runoffMm: a.runoffMm, gaps: a.gaps });
  return {
    kUs: (a.estimate?.factors.k.us.value as number | undefined) ?? null,
    tTonPerAcYr: a.toleranceTPerHaYr === null ? null : a.toleranceTPerHaYr / T_PER_HA_PER_T_PER_AC,
    hsg: (a.inputs.find((i: { key: string }) => i.key === 'hsg')?.value as string | undefined) ?? null,
    gaps: (a.gaps as { key: string }[]).map((g) => g.key),
  };
}

function expectFigures(got: Awaited<ReturnType<typeof soilFigures>>, want: { kUs: number; tTonPerAcYr: number; hsg: string }) {
  expect(got.kUs).toBeCloseTo(want.kUs, 4);
  expect(got.tTonPerAcYr).toBeCloseTo(want.tTonPerAcYr, 3);
  expect(got.hsg).toBe(want.hsg);
}

describe('assessments follow soils changes', () => {
  it('a sample added gives the field its K and soil group', async () => {
    const { agent, farmId, fieldId } = await assessedField();
    const before = await soilFigures(agent, farmId, fieldId);
    expect(before.kUs).toBeNull();
    expect(before.gaps).toContain('erodibility');
    expect((await agent.post(`/api/fields/${fieldId}/soil-samples`).send(loam)).status).toBe(201);
    expectFigures(await soilFigures(agent, farmId, fieldId), LOAM);
  });

  it('a sample changed changes K and the soil group', async () => {
    const { agent, farmId, fieldId } = await assessedField();
    const made = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(loam);
    expectFigures(await soilFigures(agent, farmId, fieldId), LOAM);
    // Thien 1979: weak ribbon, very smooth → silt loam; K table after Stewart et al. 1975 at 2 % OM → 0.42 (US);
    // silt loam → group B (common practice). Gray at 40 cm: a water table within 60 cm → D (NEH 630 ch. 7 Table 7-1).
    const changed = await agent.patch(`/api/soil-samples/${made.body.id}`).send({ version: 0, kind: 'feel', balls: true, ribbonCm: 2, feel: 'smooth', organicMatterPct: 2, depthToGrayCm: 40 });
    expect(changed.status).toBe(200);
    expectFigures(await soilFigures(agent, farmId, fieldId), { kUs: 0.42, tTonPerAcYr: 5, hsg: 'D' });
  });

  it('a sample removed leaves the field without K again', async () => {
    const { agent, farmId, fieldId } = await assessedField();
    const made = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(loam);
    expectFigures(await soilFigures(agent, farmId, fieldId), LOAM);
    expect((await agent.delete(`/api/soil-samples/${made.body.id}`)).status).toBe(204);
    const after = await soilFigures(agent, farmId, fieldId);
    expect(after.kUs).toBeNull();
    expect(after.gaps).toContain('erodibility');
  });

  it('samples kept from a CSV give the field its K and soil group', async () => {
    const { agent, farmId, fieldId } = await assessedField();
    const csv = Buffer.from(`label,sand_pct,silt_pct,clay_pct,organic_matter_pct\nNorth end,40,40,20,${1.5 * 1.724}\n`);
    expect((await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', csv, 'samples.csv')).status).toBe(201);
    expectFigures(await soilFigures(agent, farmId, fieldId), LOAM);
  });

  it("a soil map uploaded gives the field the map's K, T and soil group", async () => {
    const { agent, farmId, fieldId } = await assessedField();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send(loam);
    expectFigures(await soilFigures(agent, farmId, fieldId), LOAM);
    expect((await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', Buffer.from(JSON.stringify(survey)), 'survey.geojson')).status).toBe(201);
    expectFigures(await soilFigures(agent, farmId, fieldId), SURVEY);
  });

  it("a changed attribute mapping changes the field's figures", async () => {
    const { agent, farmId, fieldId } = await assessedField();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send(loam);
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', Buffer.from(JSON.stringify(survey)), 'survey.geojson');
    expectFigures(await soilFigures(agent, farmId, fieldId), SURVEY);
    // Without the map's K and T, K comes from the sample again and T is the default.
    expect((await agent.put(`/api/farms/${farmId}/soil-map/mapping`).send({ k: null, t: null })).status).toBe(200);
    expectFigures(await soilFigures(agent, farmId, fieldId), { kUs: LOAM.kUs, tTonPerAcYr: 5, hsg: SURVEY.hsg });
  });

  it('a soil map removed gives the field its figures from the samples again', async () => {
    const { agent, farmId, fieldId } = await assessedField();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send(loam);
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', Buffer.from(JSON.stringify(survey)), 'survey.geojson');
    expectFigures(await soilFigures(agent, farmId, fieldId), SURVEY);
    expect((await agent.delete(`/api/farms/${farmId}/soil-map`)).status).toBe(204);
    expectFigures(await soilFigures(agent, farmId, fieldId), LOAM);
  });
});
