import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { makeTestApp, makeUser, signedIn } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

describe('POST /api/estimate', () => {
  it('returns every factor with its source, and A in t/ha/yr and US t/ac/yr', async () => {
    const agent = await signedIn(ctx.app, await makeUser());
    const res = await agent.post('/api/estimate').send({
      r: { from: 'precipitation', annualPrecipitationMm: 1000 },
      // AH-537 nomograph worked example: silt+vfs 65 %, sand 5 %, OM 2.8 %, structure 2, permeability 4 → K ≈ 0.31 (US).
      k: { from: 'nomograph', siltVfsPct: 65, sandPct: 5, organicMatterPct: 2.8, structure: 2, permeability: 4 },
      slopePct: 10,
      slopeLengthM: 91.44, // 300 ft: AH-703 LS table 2.44 (moderate rill/interrill)
      c: { from: 'value', value: 0.2 },
      p: { from: 'practice', practice: 'none' },
      areaHa: 10,
      runoff: { rainfallMm: 127, cn: 80 }, // TR-55 Table 2-1: P 5 in, CN 80 → Q 2.89 in
    });
    expect(res.status).toBe(200);
    const f = res.body.factors;
    // Renard & Freimund (1994) [memory]: P 1000 mm → R 3473.8 MJ·mm/(ha·h·yr).
    expect(f.r.value).toBeCloseTo(3473.8, 0);
    expect(f.k.us.value).toBeCloseTo(0.31, 2);
    expect(f.ls.value).toBeCloseTo(2.44, 2);
    for (const key of ['r', 'k', 'l', 's', 'ls', 'c', 'p', 't']) expect(f[key].source.length).toBeGreaterThan(3);
    const a = f.r.value * f.k.value * f.ls.value * f.c.value * f.p.value;
    expect(res.body.soilLoss.tPerHaYr).toBeCloseTo(a, 6);
    // 1 short ton/acre = 2.2417 t/ha (AH-703 app. A units).
    expect(res.body.soilLoss.tonPerAcYr).toBeCloseTo(a / 2.2417, 2);
    expect(res.body.runoff.runoffIn).toBeCloseTo(2.89, 2);
    expect(res.body.cautions.join(' ')).toMatch(/sheet and rill/);
  });

  it('names the field when an input is out of range', async () => {
    const agent = await signedIn(ctx.app, await makeUser());
    const res = await agent.post('/api/estimate').send({ r: { from: 'value', value: 3000 }, k: { from: 'value', value: 0.3 }, slopePct: 150, slopeLengthM: 50, c: { from: 'value', value: 0.2 } });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^slopePct/);
  });

  it('answers 422 with the reason when the texture does not add up to 100 %', async () => {
    const agent = await signedIn(ctx.app, await makeUser());
    const res = await agent.post('/api/estimate').send({
      r: { from: 'value', value: 3000 },
      k: { from: 'texture', sandPct: 20, siltPct: 20, clayPct: 20, organicMatterPct: 2 },
      slopePct: 5,
      slopeLengthM: 50,
      c: { from: 'value', value: 0.2 },
    });
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/100/);
  });

  it('needs a signed-in user', async () => {
    expect((await request(ctx.app).post('/api/estimate').send({})).status).toBe(401);
  });
});
