// A field's soil summary (fieldSoilSummary): samples averaged, feel tests as the fallback,
// K by the engine, the problem-clay verdict with its reasons in words.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';
import { fieldSoilSummary } from '../../server/services/soils/field-soil-summary';

const ctx = makeTestApp();
afterAll(() => ctx.close());

async function fieldWithAgent() {
  const { farm, users } = await makeFarm(['farmer']);
  const agent = await signedIn(ctx.app, users.farmer);
  const field = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200));
  return { agent, fieldId: field.body.id as number };
}

describe('field soil summary', () => {
  it('calls a clay field with gray mottles at 20 cm problem clay, not worth amending, with reasons', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', label: 'Bottom', sandPct: 15, siltPct: 35, clayPct: 50, organicMatterPct: 3.4, ph: 5.4, bufferPh: 6.3, depthToGrayCm: 20 });
    const res = await agent.get(`/api/fields/${fieldId}/soil-summary`);
    expect(res.status).toBe(200);
    const s = res.body;
    // SSM ch. 3: 15/35/50 → clay (clay ≥ 40, sand ≤ 45, silt < 40)
    expect(s.textureClass).toBe('clay');
    // drainage key (drainage-key.json): gray < 25 cm → poorly drained, not worth amending [practice]
    expect(s).toMatchObject({ sampleCount: 1, depthToGrayCm: 20, drainageClass: 'poorly drained', notWorthAmending: true, problemClay: true });
    // Problem clay names the clay only (SSM ch. 3: the clay classes start at 40 % clay); the gray
    // colours give the separate not-worth-amending verdict above.
    expect(s.problemClayReasons).toEqual(['clay 50 % (40 % or more)', 'texture class clay']);
    // NEH 630 ch. 7 Table 7-1: water table (gray) within 60 cm, not drained → D
    expect(s.hsg).toBe('D');
    expect(s.hsgShares).toEqual([{ group: 'D', share: 1 }]);
    // NSSH part 618 T: 5 t/ac/yr for a deep soil when no survey T is known (common practice)
    expect(s.tTonPerAcYr).toBe(5);
    expect(s.tSource).toEqual({ kind: 'default', source: { title: expect.stringMatching(/deep-soil T, common practice/) } });
    // Same answer when another service calls the function directly.
    expect(await fieldSoilSummary(ctx.sequelize, fieldId)).toEqual(s);
  });

  it('averages lab samples and takes the shallowest gray; K from the Williams (EPIC) equation', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    // Two samples whose mean is 40/40/20 with OM 2.586 % = OC 1.5 % (van Bemmelen 1.724).
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', sandPct: 44, siltPct: 38, clayPct: 18, organicMatterPct: 2.086, ph: 6.0, bufferPh: 6.8, depthToGrayCm: 90, cecCmolPerKg: 10 });
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', sandPct: 36, siltPct: 42, clayPct: 22, organicMatterPct: 3.086, ph: 6.4, bufferPh: 7.0, depthToGrayCm: 70, cecCmolPerKg: 14 });
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    expect(s.sampleCount).toBe(2);
    expect(s.sandPct).toBeCloseTo(40, 9);
    expect(s.siltPct).toBeCloseTo(40, 9);
    expect(s.clayPct).toBeCloseTo(20, 9);
    expect(s.organicMatterPct).toBeCloseTo(2.586, 9);
    expect(s.ph).toBeCloseTo(6.2, 9);
    expect(s.bufferPh).toBeCloseTo(6.9, 9);
    expect(s.cecCmolPerKg).toBeCloseTo(12, 9);
    expect(s.depthToGrayCm).toBe(70);
    // SSM ch. 3: 40/40/20 → loam; drainage key: gray 50–100 cm → moderately well drained
    expect(s.textureClass).toBe('loam');
    expect(s.drainageClass).toBe('moderately well drained');
    // Sharpley & Williams 1990 eq. 2.96, check value: 40/40/20, OC 1.5 % → K 0.2604 (US)
    expect(s.kUs).toBeCloseTo(0.2604, 4);
    expect(s.kSource).toEqual({ kind: 'derived', source: { title: expect.stringMatching(/Williams \(EPIC\).*Sharpley & Williams 1990, eq\. 2\.96/) }, detail: 'from the mean of 2 lab samples' });
    // Texture default [practice]: loam → B (gray deeper than 60 cm, so not the water-table rule)
    expect(s.hsg).toBe('B');
    expect(s.problemClay).toBe(false);
    expect(s.problemClayReasons).toEqual([]);
  });

  it('does not call a wet silty clay loam problem clay: the gray colours give the wet-ground verdict alone', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', label: 'Toe slope', sandPct: 8, siltPct: 58, clayPct: 34, organicMatterPct: 3, depthToGrayCm: 22 });
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    // SSM ch. 3: 8/58/34 → silty clay loam (27 ≤ clay < 40, sand ≤ 20), below the 40 % where the clay classes start.
    expect(s.textureClass).toBe('silty clay loam');
    // drainage key (drainage-key.json): gray < 25 cm → poorly drained, not worth amending [practice]
    expect(s).toMatchObject({ drainageClass: 'poorly drained', notWorthAmending: true, problemClay: false, problemClayReasons: [] });
  });

  it('calls a silty clay problem clay at 40 % clay, where the SSM clay classes start', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', label: 'Flat', sandPct: 10, siltPct: 50, clayPct: 40, organicMatterPct: 3 });
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    // SSM ch. 3: 10/50/40 → silty clay (clay ≥ 40, silt ≥ 40)
    expect(s).toMatchObject({ textureClass: 'silty clay', problemClay: true, problemClayReasons: ['clay 40 % (40 % or more)', 'texture class silty clay'] });
  });

  it('gives a feel-test-only field its class and K from the table by texture and OM', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    // Thien 1979: weak ribbon, very smooth → silt loam
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: true, ribbonCm: 2, feel: 'smooth', organicMatterPct: 2 });
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    expect(s.textureClass).toBe('silt loam');
    expect(s.sandPct).toBeNull();
    // K table after Stewart et al. 1975 (as reproduced in soil survey guides): silt loam at 2 % OM → 0.42 (US)
    expect(s.kUs).toBeCloseTo(0.42, 9);
    expect(s.kSource).toEqual({ kind: 'published-table', source: { title: expect.stringMatching(/Stewart et al\. \(1975\)/) }, detail: 'silt loam, organic matter 2 %' });
    // Texture default [practice]: silt loam → B
    expect(s.hsg).toBe('B');
  });

  it('says when organic matter is unknown and a value was assumed for the K table', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    // Thien 1979: medium ribbon, neither gritty nor smooth → clay loam
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: true, ribbonCm: 4, feel: 'neither' });
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    expect(s.textureClass).toBe('clay loam');
    // K table after Stewart et al. 1975: clay loam at 2 % OM → 0.25 (US)
    expect(s.kUs).toBeCloseTo(0.25, 9);
    // An assumed OM makes the table's K a rule of thumb.
    expect(s.kSource).toMatchObject({ kind: 'rule-of-thumb', detail: 'clay loam, organic matter unknown, 2 % assumed (rule of thumb)' });
  });

  it('calls a silty clay feel test problem clay by its class alone', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    // Thien 1979: strong ribbon, very smooth → silty clay
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: true, ribbonCm: 6, feel: 'smooth', describedToCm: 120 });
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    expect(s).toMatchObject({ textureClass: 'silty clay', drainageClass: 'well drained', notWorthAmending: false, problemClay: true, problemClayReasons: ['texture class silty clay'] });
  });

  it('never averages buffer pH across buffer methods: the newest named method and its readings', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', ph: 5.6, bufferPh: 6.4, bufferMethod: 'smp' }).expect(201);
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', ph: 5.4, bufferPh: 6.2, bufferMethod: 'mehlich' }).expect(201);
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', ph: 5.5, bufferPh: 6.0, bufferMethod: 'mehlich' }).expect(201);
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    expect(s.bufferMethod).toBe('mehlich');
    expect(s.bufferPh).toBeCloseTo(6.1, 9);
  });

  it('refuses a buffer method it does not know, naming it', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', ph: 5.6, bufferPh: 6.4, bufferMethod: 'woodruff' });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/bufferMethod must be 'smp' or 'mehlich'/);
    expect((await agent.get(`/api/fields/${fieldId}/soil-samples`)).body).toHaveLength(0);
  });

  it('gives an empty field nulls, no problem clay and the default T', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const s = (await agent.get(`/api/fields/${fieldId}/soil-summary`)).body;
    expect(s).toEqual({
      sampleCount: 0, sandPct: null, siltPct: null, clayPct: null, organicMatterPct: null, textureClass: null, ph: null, bufferPh: null, bufferMethod: null,
      depthToGrayCm: null, drainageClass: null, notWorthAmending: false, kUs: null, kSource: null, tTonPerAcYr: 5, tSource: { kind: 'default', source: { title: expect.stringMatching(/deep-soil T/) } },
      hsg: null, hsgShares: [], bulkDensity: null, cecCmolPerKg: null, espPct: null, problemClay: false, problemClayReasons: [],
    });
  });
});
