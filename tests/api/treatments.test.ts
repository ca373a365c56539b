// Treatment options per field, the farm's price list and the budget planner, on a real
// database: options come from the field's stored assessment, priced from the farm's list.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

// Silt loam 10/68/22, OM 1.8 %, pH 5.6 with SMP buffer pH 6.4: an acid Midwest upland soil
// (invented figures in the ranges met on such farms).
const siltLoam = { kind: 'lab', sandPct: 10, siltPct: 68, clayPct: 22, organicMatterPct: 1.8, ph: 5.6, bufferPh: 6.4, bufferMethod: 'smp', depthToGrayCm: null, describedToCm: 110 };

type Option = { id: string; title: string; treatments: string[]; soilLossTPerHaYr: number; aOverT: number; tonnesSavedPerYr: number; reachesT: boolean; cheapestUnderT: boolean; cost: { total: number; currency: string; lines: { total: number }[] }; quantities: { item: string; amount: number; unit: string }[]; cautions: string[] };

async function setUp() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const farmId = made.farm.id;
  await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2500, designStormMm: 110 });
  let lng = -91.9;
  const field = async (name: string, cropping: Record<string, unknown>, slopePct = 9, slopeLengthM = 60, soil: Record<string, unknown> = siltLoam) => {
    lng += 0.01;
    const id = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(lng, 42.3, 300, name))).body.id as number;
    expect((await farmer.post(`/api/fields/${id}/soil-samples`).send(soil)).status).toBe(201);
    await farmer.put(`/api/fields/${id}/ground`).send({ slopePct, slopeLengthM });
    await farmer.put(`/api/fields/${id}/cropping`).send({ season: '2027', ...cropping });
    return id;
  };
  return { ...made, farmer, farmId, field };
}

const ploughedCorn = { crop: 'corn', tillage: 'moldboard plough' };

describe('treatment options for a field', () => {
  it('starts from the stored assessment and offers options with loss, cost and tonnes saved', async () => {
    const { farmer, field } = await setUp();
    const id = await field('Steep corn', ploughedCorn);
    const a = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body;
    const res = await farmer.get(`/api/fields/${id}/treatments?season=2027`);
    expect(res.status).toBe(200);
    const t = res.body;
    expect(t.ok).toBe(true);
    expect(t.current.soilLossTPerHaYr).toBeCloseTo(a.soilLossTPerHaYr, 9);
    expect(t.current.aOverT).toBeGreaterThan(1);
    expect(t.options.length).toBeGreaterThan(3);
    for (const o of t.options as Option[]) {
      // tonnes saved = (A now − A after) × area, and cost = the sum of its lines
      expect(o.tonnesSavedPerYr).toBeCloseTo((t.current.soilLossTPerHaYr - o.soilLossTPerHaYr) * t.site.areaHa, 6);
      expect(o.cost.total).toBeCloseTo(o.cost.lines.reduce((s, l) => s + l.total, 0), 6);
      expect(o.cost.currency).toBe('USD');
      expect(o.reachesT).toBe(o.aOverT <= 1);
    }
    const under = (t.options as Option[]).filter((o) => o.reachesT);
    expect(under.length).toBeGreaterThan(0);
    const cheapest = (t.options as Option[]).filter((o) => o.cheapestUnderT);
    expect(cheapest).toHaveLength(1);
    expect(cheapest[0].cost.total).toBe(Math.min(...under.map((o) => o.cost.total)));
    // the what-if in the browser reruns the engine from the same site
    expect(t.site.input).toEqual(expect.objectContaining({ slopePct: 9, slopeLengthM: 60 }));
  });

  it('gives lime a quantity from the soil check, and names the check when it is missing', async () => {
    const { farmer, field } = await setUp();
    const withCheck = await field('Limed', ploughedCorn);
    const lime = ((await farmer.get(`/api/fields/${withCheck}/treatments?season=2027`)).body.options as Option[]).find((o) => o.treatments.length === 1 && o.treatments[0] === 'lime');
    expect(lime).toBeDefined();
    expect(lime!.quantities.find((q) => q.unit === 't')!.amount).toBeGreaterThan(0);
    expect(lime!.cautions.join(' ')).toMatch(/dust|label/i);
    const noBuffer = await field('No buffer', ploughedCorn, 9, 60, { ...siltLoam, bufferPh: null, bufferMethod: null });
    const t = (await farmer.get(`/api/fields/${noBuffer}/treatments?season=2027`)).body;
    expect((t.options as Option[]).some((o) => o.treatments.includes('lime'))).toBe(false);
    expect(t.unavailable.find((u: { key: string }) => u.key === 'lime').reason).toMatch(/buffer pH/);
  });

  it('says what is missing when the field cannot be assessed yet', async () => {
    const { farmer, farmId } = await setUp();
    const id = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.5, 42.3, 300, 'Bare'))).body.id;
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2027' });
    const t = (await farmer.get(`/api/fields/${id}/treatments?season=2027`)).body;
    expect(t.ok).toBe(false);
    expect(t.gaps.map((g: { key: string }) => g.key)).toContain('cropping');
  });

  it('lets farmers and advisors plan; a landowner may not, and others do not see the field', async () => {
    const { farmer, field, farmId, users, memberships } = await setUp();
    const id = await field('Owned', ploughedCorn);
    await farmer.patch(`/api/fields/${id}`).send({ ownerMembershipId: memberships.landowner.id, version: 0 });
    const advisor = await signedIn(ctx.app, users.advisor);
    expect((await advisor.get(`/api/fields/${id}/treatments?season=2027`)).status).toBe(200);
    const landowner = await signedIn(ctx.app, users.landowner);
    expect((await landowner.get(`/api/fields/${id}/treatments?season=2027`)).status).toBe(403);
    expect((await landowner.get(`/api/farms/${farmId}/prices`)).status).toBe(403);
    expect((await landowner.post(`/api/farms/${farmId}/budget-plan`).send({ season: '2027', budget: 1000 })).status).toBe(403);
    const other = await makeFarm(['farmer']);
    const stranger = await signedIn(ctx.app, other.users.farmer);
    expect((await stranger.get(`/api/fields/${id}/treatments`)).status).toBe(404);
    expect((await stranger.get(`/api/farms/${farmId}/treatments`)).status).toBe(404);
    expect((await farmer.get(`/api/fields/${id}/treatments?season=1999`)).body).toMatchObject({ error: 'not_found', message: expect.stringMatching(/1999/) });
  });
});

describe('the farm price list', () => {
  it('starts from example figures, saves the farm’s own, and refuses a stale version', async () => {
    const { farmer, users, farmId, field } = await setUp();
    const first = (await farmer.get(`/api/farms/${farmId}/prices`)).body;
    expect(first).toMatchObject({ examples: true, version: 0, currency: 'USD' });
    expect(first.exampleKeys).toContain('cover-crop-per-ha');
    const id = await field('Priced', ploughedCorn);
    const coverCost = async () => ((await farmer.get(`/api/fields/${id}/treatments?season=2027`)).body.options as Option[]).find((o) => o.treatments.join() === 'cover-crop')!.cost.total;
    const before = await coverCost();
    const prices = { ...first.prices, 'cover-crop-per-ha': first.prices['cover-crop-per-ha'] * 2 };
    const saved = await farmer.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'USD', prices });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ version: 1, examples: false, updatedBy: 'Test farmer' });
    expect(saved.body.exampleKeys).not.toContain('cover-crop-per-ha');
    // costs are kept to the cent
    expect(await coverCost()).toBeCloseTo(before * 2, 1);
    const advisor = await signedIn(ctx.app, users.advisor);
    const stale = await advisor.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'USD', prices });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toMatch(/version 0, it is now 1/);
  });

  it('refuses a negative or missing price by name and changes nothing', async () => {
    const { farmer, farmId } = await setUp();
    const { prices } = (await farmer.get(`/api/farms/${farmId}/prices`)).body;
    const bad = await farmer.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'USD', prices: { ...prices, 'lime-per-t': -3 } });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/lime-per-t must be at least 0/);
    const { 'gypsum-per-t': _gone, ...missing } = prices;
    expect((await farmer.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'USD', prices: missing })).status).toBe(400);
    expect((await farmer.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'dollars', prices })).body.message).toMatch(/three-letter/);
    expect((await farmer.get(`/api/farms/${farmId}/prices`)).body.version).toBe(0);
  });
});

describe('the budget planner', () => {
  it('chooses at most one option per field within the budget and explains itself', async () => {
    const { farmer, farmId, field } = await setUp();
    await field('Steep corn', ploughedCorn, 10, 80);
    await field('Beans', { crop: 'soybean', tillage: 'moldboard plough' }, 7, 60);
    await field('Hay', { crop: 'hay or meadow' }, 4, 40);
    const farm = (await farmer.get(`/api/farms/${farmId}/treatments?season=2027`)).body;
    const needing = farm.fields.filter((f: { answer: { ok: boolean; current?: { aOverT: number } } }) => f.answer.ok && f.answer.current!.aOverT > 1);
    expect(needing.length).toBe(2);
    const budget = 3000;
    const res = await farmer.post(`/api/farms/${farmId}/budget-plan`).send({ season: '2027', budget });
    expect(res.status).toBe(200);
    const plan = res.body;
    expect(plan.spent).toBeLessThanOrEqual(budget);
    expect(plan.spent).toBeCloseTo(plan.choices.reduce((s: number, c: { cost: number }) => s + c.cost, 0), 6);
    expect(plan.tonnesSavedPerYr).toBeCloseTo(plan.choices.reduce((s: number, c: { tonnesSavedPerYr: number }) => s + c.tonnesSavedPerYr, 0), 6);
    expect(new Set(plan.choices.map((c: { fieldId: number }) => c.fieldId)).size).toBe(plan.choices.length);
    expect(plan.explanation.join(' ')).toMatch(/Hay already loses less soil than T/);
    // More money never saves less soil.
    for (let i = 1; i < plan.curve.length; i++) expect(plan.curve[i].tonnesSavedPerYr).toBeGreaterThanOrEqual(plan.curve[i - 1].tonnesSavedPerYr - 1e-9);
    const none = (await farmer.post(`/api/farms/${farmId}/budget-plan`).send({ season: '2027', budget: 0 })).body;
    expect(none.spent).toBe(0);
    const fields = (await farmer.post(`/api/farms/${farmId}/budget-plan`).send({ season: '2027', budget, goal: 'most-fields-under-t' })).body;
    expect(fields.fieldsUnderT).toBeGreaterThanOrEqual(plan.fieldsUnderT);
  });

  it('refuses a budget that is not a number, or a goal it does not know, by name', async () => {
    const { farmer, farmId } = await setUp();
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2027' });
    const a = await farmer.post(`/api/farms/${farmId}/budget-plan`).send({ season: '2027', budget: 'lots' });
    expect([a.status, a.body.message]).toEqual([400, expect.stringMatching(/budget must be a number/)]);
    const b = await farmer.post(`/api/farms/${farmId}/budget-plan`).send({ season: '2027', budget: 100, goal: 'fastest' });
    expect([b.status, b.body.message]).toEqual([400, expect.stringMatching(/goal must be/)]);
  });
});

describe('the farm’s lime and gypsum products', () => {
  it('start as examples and, once typed, set the lime to order: product rate = pure rate ÷ effective CCE', async () => {
    const { farmer, farmId, field } = await setUp();
    const id = await field('Acid corn', ploughedCorn);
    const list = (await farmer.get(`/api/farms/${farmId}/prices`)).body;
    expect(list.amendmentExamples).toBe(true);
    const limeT = async () => ((await farmer.get(`/api/fields/${id}/treatments?season=2027`)).body.options as Option[]).find((o) => o.treatments.join() === 'lime')!.quantities.find((q) => q.unit === 't')!.amount;
    const before = await limeT();
    // All finer than 100 mesh: fineness efficiency 1 by the New York rule; CCE 100 % vs the example's.
    const fine = { ...list.amendments, limeCcePct: 100, limePassing20MeshPct: 100, limePassing60MeshPct: 100, limePassing100MeshPct: 100 };
    const saved = await farmer.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'USD', prices: list.prices, amendments: fine });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ amendmentExamples: false, amendments: fine });
    const ex = list.amendments;
    const exampleEcce = (ex.limeCcePct / 100) * (((ex.limePassing20MeshPct - ex.limePassing60MeshPct) * 0.4 + (ex.limePassing60MeshPct - ex.limePassing100MeshPct) * 0.8 + ex.limePassing100MeshPct) / 100);
    expect(await limeT()).toBeCloseTo(before * exampleEcce, 1);
  });

  it('refuses a sieve analysis where a finer sieve passes more, by name, and keeps the list', async () => {
    const { farmer, farmId } = await setUp();
    const list = (await farmer.get(`/api/farms/${farmId}/prices`)).body;
    const bad = await farmer.put(`/api/farms/${farmId}/prices`).send({ version: 0, currency: 'USD', prices: list.prices, amendments: { ...list.amendments, limePassing100MeshPct: 99 } });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/finer sieve/);
    expect((await farmer.get(`/api/farms/${farmId}/prices`)).body.version).toBe(0);
  });
});
