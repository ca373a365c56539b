// Assessments against hand-computed values, and the priority board's ranking.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

// Loam 40/40/20 with OC 1.5 % (OM = 1.5 × 1.724): Williams K = 0.2604 US (check value of
// Sharpley & Williams 1990 eq. 2.96); its texture gives hydrologic group B (common practice).
const loam = { kind: 'lab', sandPct: 40, siltPct: 40, clayPct: 20, organicMatterPct: 1.5 * 1.724, depthToGrayCm: null, describedToCm: 120 };

async function setUp() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const farmId = made.farm.id;
  await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 127 });
  const field = async (name: string, lng: number, slopePct: number, slopeLengthM: number) => {
    const id = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(lng, 42.31, 300, name))).body.id as number;
    expect((await farmer.post(`/api/fields/${id}/soil-samples`).send(loam)).status).toBe(201);
    await farmer.put(`/api/fields/${id}/ground`).send({ slopePct, slopeLengthM });
    return id;
  };
  return { ...made, farmer, farmId, field };
}

describe('assessment of a field for a season', () => {
  it('multiplies the factors it shows: A = R·K·LS·C·P, against T, with runoff', async () => {
    const { farmer, field } = await setUp();
    const id = await field('Pasture hill', -91.78, 6, 30.48);
    await farmer.put(`/api/fields/${id}/cropping`).send({ season: '2027', crop: 'pasture', groundCoverPct: 60 });
    const res = await farmer.get(`/api/fields/${id}/assessment?season=2027`);
    expect(res.status).toBe(200);
    const a = res.body;
    expect(a.gaps).toEqual([]);
    const f = a.estimate.factors;
    expect(f.r.value).toBe(2000);
    expect(f.k.us.value).toBeCloseTo(0.2604, 4); // Sharpley & Williams 1990 check value
    expect(f.ls.value).toBeCloseTo(0.78, 2); // AH-703 LS table: 6 %, 100 ft, moderate ratio
    expect(f.c.value).toBeCloseTo(0.042, 3); // AH-537 Table 10: grass, no canopy, 60 % cover
    expect(f.p.value).toBe(1);
    // Hand computation: 2000 × (0.2604 × 0.1317) × 0.78 × 0.042 × 1 ≈ 2.247 t/ha/yr (units: AH-703 app. A).
    expect(a.soilLossTPerHaYr).toBeCloseTo(2000 * 0.2604 * 0.1317 * 0.78 * 0.042, 1);
    expect(a.soilLossTPerHaYr).toBeCloseTo(f.r.value * f.k.value * f.ls.value * f.c.value * f.p.value, 9);
    // T = 5 t/ac/yr (deep-soil default, common practice) = 11.2085 t/ha/yr.
    expect(a.toleranceTPerHaYr).toBeCloseTo(5 * 2.2417, 3);
    expect(a.aOverT).toBeCloseTo(a.soilLossTPerHaYr / a.toleranceTPerHaYr, 9);
    expect(a.riskClass.key).toBe('holding');
    expect(a.tonnesPerYr).toBeCloseTo(a.soilLossTPerHaYr * a.areaHa, 6);
    // TR-55 Table 2-2c pasture, fair (50–75 % cover), group B: CN 69. TR-55 eq. 2-3 with
    // Ia = 0.2 S at P = 5 in: S = 1000/69 − 10, Q = (P − 0.2S)² / (P + 0.8S) ≈ 1.957 in.
    expect(a.estimate.runoff.cn.value).toBe(69);
    const S = 1000 / 69 - 10;
    expect(a.runoffMm).toBeCloseTo(((5 - 0.2 * S) ** 2 / (5 + 0.8 * S)) * 25.4, 1);
    expect(a.lsSource).toBe('typed slope');
    expect(a.inputs.find((i: { key: string }) => i.key === 'slope').origin).toEqual({ kind: 'typed', typedBy: 'Test farmer' });
  });

  it('lists what is missing instead of guessing', async () => {
    const { farmer, farmId } = await setUp();
    const id = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.70, 42.31, 300, 'Bare'))).body.id;
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2027' });
    const a = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body;
    expect(a.estimate).toBeNull();
    // Each gap is typed: what is missing, where it is filled, and a sentence for people.
    expect(a.gaps).toEqual([
      { key: 'erodibility', tab: 'soil', message: expect.stringMatching(/soil erodibility K/) },
      { key: 'slope', tab: 'ground', message: expect.stringMatching(/slope/) },
      { key: 'slope-length', tab: 'ground', message: expect.stringMatching(/slope length/) },
      { key: 'cropping', tab: 'cropping', message: 'cropping for season 2027' },
    ]);
  });

  it('recomputes when an input changes', async () => {
    const { farmer, field } = await setUp();
    const id = await field('Changing', -91.76, 6, 30.48);
    await farmer.put(`/api/fields/${id}/cropping`).send({ season: '2027', crop: 'pasture', groundCoverPct: 60 });
    const before = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body;
    await farmer.put(`/api/fields/${id}/ground`).send({ slopePct: 12, slopeLengthM: 30.48, version: 0 });
    const after = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body;
    expect(after.estimate.factors.ls.value).toBeGreaterThan(before.estimate.factors.ls.value);
    expect(after.soilLossTPerHaYr).toBeGreaterThan(before.soilLossTPerHaYr);
  });

  it('gives a wet clay field the problem-clay verdict and steers it away from amendments', async () => {
    const { farmer, farmId } = await setUp();
    const id = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.74, 42.31, 300, 'Wet clay'))).body.id;
    await farmer.post(`/api/fields/${id}/soil-samples`).send({ kind: 'lab', sandPct: 10, siltPct: 35, clayPct: 55, organicMatterPct: 4, depthToGrayCm: 18, describedToCm: 60 });
    await farmer.put(`/api/fields/${id}/ground`).send({ slopePct: 0.5, slopeLengthM: 40 });
    await farmer.put(`/api/fields/${id}/cropping`).send({ season: '2027', crop: 'soybean', tillage: 'moldboard plough' });
    const a = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body;
    expect(a.problemClay).toBe(true);
    expect(a.problemClayReasons.length).toBeGreaterThan(0);
    // Depth to gray < 25 cm: poorly drained (a state field key for redoximorphic features, published).
    expect(a.drainageClass).toBe('poorly drained');
    expect(a.groundAdvice).toMatch(/raised or no-dig beds/);
    expect(a.groundAdvice).toMatch(/will not fix/);
  });
});

describe('priority board', () => {
  it('ranks fields by A/T and moves a field when the advisor changes its cropping', async () => {
    const { farmer, users, farmId, field } = await setUp();
    const steep = await field('Steep corn', -91.78, 12, 60);
    const gentle = await field('Gentle corn', -91.77, 3, 60);
    const corn = { season: '2027', crop: 'corn', tillage: 'moldboard plough', residuePct: 5 };
    await farmer.put(`/api/fields/${steep}/cropping`).send(corn);
    await farmer.put(`/api/fields/${gentle}/cropping`).send(corn);
    const board = (await farmer.get(`/api/farms/${farmId}/board?season=2027`)).body;
    expect(board.season).toBe('2027');
    expect(board.rows.map((r: { name: string }) => r.name)).toEqual(['Steep corn', 'Gentle corn']);
    const top = board.rows[0];
    expect(top).toMatchObject({ fieldId: steep, problemClay: false, gaps: [] });
    expect(top.aOverT).toBeGreaterThan(board.rows[1].aOverT);
    expect(top.tonnesPerYr).toBeCloseTo(top.soilLossTPerHaYr * top.areaHa, 6);
    expect(top.reasons.join(' ')).toMatch(/LS|cover/);

    const advisor = await signedIn(ctx.app, users.advisor);
    const ver = (await advisor.get(`/api/fields/${steep}/cropping?season=2027`)).body.version;
    expect((await advisor.put(`/api/fields/${steep}/cropping`).send({ season: '2027', crop: 'hay or meadow', version: ver })).status).toBe(200);
    const moved = (await advisor.get(`/api/farms/${farmId}/board?season=2027`)).body;
    expect(moved.rows.map((r: { name: string }) => r.name)).toEqual(['Gentle corn', 'Steep corn']);

    const across = (await advisor.get('/api/board?season=2027')).body;
    expect(across.rows.filter((r: { farmId: number }) => r.farmId === farmId)).toHaveLength(2);
    expect(across.rows[0].farmName).toBeDefined();
  });

  it('shows a landowner only their own fields on the board', async () => {
    const { farmer, users, memberships, farmId, field } = await setUp();
    const mine = await field('Rented', -91.78, 6, 30);
    await field('Not theirs', -91.77, 6, 30);
    await farmer.patch(`/api/fields/${mine}`).send({ version: 0, ownerMembershipId: memberships.landowner.id });
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2027' });
    const landowner = await signedIn(ctx.app, users.landowner);
    const board = (await landowner.get(`/api/farms/${farmId}/board?season=2027`)).body;
    expect(board.rows.map((r: { name: string }) => r.name)).toEqual(['Rented']);
    expect((await landowner.get('/api/board')).body.rows).toEqual([]);
  });
});
