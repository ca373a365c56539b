// Soil samples typed in: lab results (texture class by the SSM ch. 3 triangle, renormalised
// within 98–102 %) and feel tests (Thien 1979 key), drainage from depth to gray, version checks.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

async function fieldWithAgent(role: 'farmer' | 'advisor' = 'farmer') {
  const { farm, users } = await makeFarm(['farmer', 'advisor']);
  const farmer = await signedIn(ctx.app, users.farmer);
  const field = await farmer.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200, 'Soil field'));
  expect(field.status).toBe(201);
  const agent = role === 'farmer' ? farmer : await signedIn(ctx.app, users.advisor);
  return { agent, fieldId: field.body.id as number, farmId: farm.id };
}

const lab = (sand: number, silt: number, clay: number, extra: Record<string, unknown> = {}) => ({ kind: 'lab', sandPct: sand, siltPct: silt, clayPct: clay, ...extra });

describe('typed lab samples', () => {
  // Each point checked against the SSM ch. 3 class inequalities.
  const triangle: [number, number, number, string][] = [
    [40, 40, 20, 'loam'], // SSM ch. 3 texture triangle: 40/40/20 → loam
    [92, 4, 4, 'sand'], // SSM ch. 3: silt + 1.5 clay = 10 < 15
    [82, 12, 6, 'loamy sand'], // SSM ch. 3: silt + 1.5 clay = 21 ≥ 15, silt + 2 clay = 24 < 30
    [65, 25, 10, 'sandy loam'], // SSM ch. 3: 7 ≤ clay < 20, sand > 52, silt + 2 clay ≥ 30
    [20, 65, 15, 'silt loam'], // SSM ch. 3: silt ≥ 50, 12 ≤ clay < 27
    [5, 88, 7, 'silt'], // SSM ch. 3: silt ≥ 80, clay < 12
    [60, 15, 25, 'sandy clay loam'], // SSM ch. 3: 20 ≤ clay < 35, silt < 28, sand > 45
    [30, 38, 32, 'clay loam'], // SSM ch. 3: 27 ≤ clay < 40, 20 < sand ≤ 45
    [10, 57, 33, 'silty clay loam'], // SSM ch. 3: 27 ≤ clay < 40, sand ≤ 20
    [50, 8, 42, 'sandy clay'], // SSM ch. 3: clay ≥ 35, sand > 45
    [5, 50, 45, 'silty clay'], // SSM ch. 3: clay ≥ 40, silt ≥ 40
    [20, 20, 60, 'clay'], // SSM ch. 3: clay ≥ 40, sand ≤ 45, silt < 40
  ];
  it('stores each sample with its USDA texture class from the triangle', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    for (const [sand, silt, clay, cls] of triangle) {
      const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(sand, silt, clay, { label: cls }));
      expect(res.status, `${sand}/${silt}/${clay}`).toBe(201);
      expect(res.body.textureClass, `${sand}/${silt}/${clay}`).toBe(cls);
      expect(res.body.textureSource).toMatch(/Soil Survey Manual ch\. 3/);
    }
    const list = await agent.get(`/api/fields/${fieldId}/soil-samples`);
    expect(list.status).toBe(200);
    expect(list.body.map((s: { label: string }) => s.label).sort()).toEqual(triangle.map((t) => t[3]).sort());
  });

  it('renormalises sand, silt and clay that add up to 98–102 % and keeps what was typed', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    // 39.2 + 39.2 + 19.6 = 98 → 40/40/20, loam (SSM ch. 3: renormalise the fine earth to 100 %)
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(39.2, 39.2, 19.6));
    expect(res.status).toBe(201);
    expect(res.body.sandPct).toBeCloseTo(40, 9);
    expect(res.body.siltPct).toBeCloseTo(40, 9);
    expect(res.body.clayPct).toBeCloseTo(20, 9);
    expect(res.body.separatesSumPct).toBeCloseTo(98, 9);
    expect(res.body.textureClass).toBe('loam');
    const high = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(41, 41, 20));
    expect(high.status).toBe(201);
    expect(high.body.sandPct + high.body.siltPct + high.body.clayPct).toBeCloseTo(100, 9);
  });

  for (const [sand, silt, clay, total] of [[30, 40, 20, 90], [40, 42, 21, 103]] as const) {
    it(`refuses sand + silt + clay adding up to ${total} % with a message saying so`, async () => {
      const { agent, fieldId } = await fieldWithAgent();
      const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(sand, silt, clay));
      expect(res.status).toBe(400);
      expect(res.body.error).toBe('invalid_input');
      expect(res.body.message).toMatch(new RegExp(`sandPct: sand \\+ silt \\+ clay add up to ${total} %`));
      expect((await agent.get(`/api/fields/${fieldId}/soil-samples`)).body).toHaveLength(0);
    });
  }

  it('refuses only some of sand, silt and clay, naming the missing one', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', sandPct: 40, siltPct: 40 });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^clayPct: clayPct is needed too/);
  });

  it('stores a routine soil test without texture, with pH, buffer pH, OM, bulk density, CEC and ESP', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({
      kind: 'lab', label: 'Routine test', sampledOn: '2026-04-12', depthTopCm: 0, depthBottomCm: 15,
      organicMatterPct: 3.1, ph: 5.6, bufferPh: 6.4, bulkDensity: 1.32, cecCmolPerKg: 18.5, espPct: 2.1,
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ textureClass: null, sandPct: null, ph: 5.6, bufferPh: 6.4, bulkDensity: 1.32, cecCmolPerKg: 18.5, espPct: 2.1, sampledOn: '2026-04-12', depthBottomCm: 15, version: 0 });
  });

  it('names the field in a 400 for out-of-range values and a depth range upside down', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const ph = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', ph: 15 });
    expect(ph.status).toBe(400);
    expect(ph.body.message).toMatch(/^ph: ph must be at most 11/);
    const depth = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', depthTopCm: 20, depthBottomCm: 10 });
    expect(depth.status).toBe(400);
    expect(depth.body.message).toMatch(/^depthBottomCm:/);
    const kind = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'guess' });
    expect(kind.status).toBe(400);
    expect(kind.body.message).toMatch(/kind must be 'lab' or 'feel'/);
  });
});

describe('feel tests', () => {
  // Thien (1979) texture-by-feel key: no ball → sand; ball, no ribbon → loamy sand; ribbon
  // < 2.5 cm weak, 2.5–5 cm medium, > 5 cm strong, crossed with gritty / smooth / neither.
  const key: [Record<string, unknown>, string][] = [
    [{ balls: false }, 'sand'],
    [{ balls: true, ribbonCm: 0 }, 'loamy sand'],
    [{ balls: true, ribbonCm: 2, feel: 'gritty' }, 'sandy loam'],
    [{ balls: true, ribbonCm: 2, feel: 'smooth' }, 'silt loam'],
    [{ balls: true, ribbonCm: 2, feel: 'neither' }, 'loam'],
    [{ balls: true, ribbonCm: 3, feel: 'gritty' }, 'sandy clay loam'],
    [{ balls: true, ribbonCm: 4, feel: 'smooth' }, 'silty clay loam'],
    [{ balls: true, ribbonCm: 5, feel: 'neither' }, 'clay loam'],
    [{ balls: true, ribbonCm: 6, feel: 'gritty' }, 'sandy clay'],
    [{ balls: true, ribbonCm: 6, feel: 'smooth' }, 'silty clay'],
    [{ balls: true, ribbonCm: 7, feel: 'neither' }, 'clay'],
  ];
  it('gives each answer of the key its texture class (Thien 1979)', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    for (const [answers, cls] of key) {
      const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', ...answers });
      expect(res.status, JSON.stringify(answers)).toBe(201);
      expect(res.body.textureClass, JSON.stringify(answers)).toBe(cls);
      expect(res.body.textureSource).toMatch(/Thien \(1979\)/);
      expect(res.body.feelTest.balls).toBe(answers.balls);
    }
  });

  it('asks for the ribbon length when the soil balls, and the feel when it ribbons', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const noRibbon = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: true });
    expect(noRibbon.status).toBe(400);
    expect(noRibbon.body.message).toMatch(/^ribbonCm: ribbonCm is needed when the soil balls/);
    const noFeel = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: true, ribbonCm: 3 });
    expect(noFeel.status).toBe(400);
    expect(noFeel.body.message).toMatch(/^feel: feel is needed/);
  });
});

describe('drainage from depth to gray', () => {
  // The field key in data/reference/drainage-key.json (one state's published field key): none within
  // 100 cm well; 50–100 moderately well; 25–50 somewhat poorly; < 25 cm poorly.
  const cases: [Record<string, unknown>, string, boolean][] = [
    [{ depthToGrayCm: 20 }, 'poorly drained', true],
    [{ depthToGrayCm: 40 }, 'somewhat poorly drained', true],
    [{ depthToGrayCm: 70 }, 'moderately well drained', false],
    [{ depthToGrayCm: null, describedToCm: 120 }, 'well drained', false],
  ];
  for (const [given, cls, notWorth] of cases) {
    it(`calls ${JSON.stringify(given)} ${cls}${notWorth ? ', not worth amending' : ''}`, async () => {
      const { agent, fieldId } = await fieldWithAgent();
      const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: true, ribbonCm: 6, feel: 'neither', ...given });
      expect(res.status).toBe(201);
      expect(res.body.drainageClass).toBe(cls);
      expect(res.body.notWorthAmending).toBe(notWorth);
    });
  }

  it('gives no drainage class when neither gray nor a profile depth was recorded', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(40, 40, 20));
    expect(res.body.drainageClass).toBeNull();
  });
});

describe('changing and removing samples', () => {
  it('changes a sample with its version, re-deriving the class, and answers 409 when stale', async () => {
    const { agent, fieldId } = await fieldWithAgent('advisor');
    const made = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(40, 40, 20));
    const id = made.body.id;
    // 20/20/60 → clay (SSM ch. 3: clay ≥ 40, sand ≤ 45, silt < 40)
    const changed = await agent.patch(`/api/soil-samples/${id}`).send({ version: 0, sandPct: 20, siltPct: 20, clayPct: 60, depthToGrayCm: 20 });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ version: 1, textureClass: 'clay', drainageClass: 'poorly drained' });
    const stale = await agent.patch(`/api/soil-samples/${id}`).send({ version: 0, label: 'late' });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toBe('stale_version');
    expect(stale.body.details.current.version).toBe(1);
    const cleared = await agent.patch(`/api/soil-samples/${id}`).send({ version: 1, depthToGrayCm: null });
    expect(cleared.body.drainageClass).toBeNull();
  });

  it('turns a lab sample into a feel test and refuses a change that breaks the sum', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const made = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(40, 40, 20));
    const bad = await agent.patch(`/api/soil-samples/${made.body.id}`).send({ version: 0, clayPct: 35 });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/add up to 115 %/);
    const feel = await agent.patch(`/api/soil-samples/${made.body.id}`).send({ version: 0, kind: 'feel', balls: true, ribbonCm: 4, feel: 'smooth' });
    expect(feel.status).toBe(200);
    expect(feel.body).toMatchObject({ kind: 'feel', textureClass: 'silty clay loam', sandPct: null });
  });

  it('removes a sample', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const made = await agent.post(`/api/fields/${fieldId}/soil-samples`).send(lab(40, 40, 20));
    expect((await agent.delete(`/api/soil-samples/${made.body.id}`)).status).toBe(204);
    expect((await agent.get(`/api/fields/${fieldId}/soil-samples`)).body).toHaveLength(0);
    expect((await agent.delete(`/api/soil-samples/${made.body.id}`)).status).toBe(404);
  });
});
