import { describe, expect, it } from 'vitest';
import { CAUTION_SHEET_AND_RILL, CAUTION_TERRACES, estimate, ftToM, rusleLS } from '../../../shared/erosion';
import { EstimateInput } from '../../../shared/schemas/estimate';

const base = {
  r: { from: 'value', value: 3000 },
  k: { from: 'nomograph', siltVfsPct: 65, sandPct: 5, organicMatterPct: 2.8, structure: 2, permeability: 4 },
  slopePct: 6,
  slopeLengthM: ftToM(100),
  c: { from: 'value', value: 0.2 },
} as const;

describe('estimate(): a whole estimate from the shared schema', () => {
  it('returns every factor with its provenance, A in t/ha/yr and t/ac/yr, and A/T', () => {
    const r = estimate(base);
    if (!r.ok) throw new Error(r.reason);
    expect(r.factors.k.us?.value).toBeCloseTo(0.311, 3); // AH-537 worked example
    expect(r.factors.k.source).toMatch(/AH-537/);
    expect(r.factors.ls.value.toFixed(2)).toBe('0.78'); // AH-703 LS table
    expect(r.factors.p.value).toBe(1);
    const a = 3000 * r.factors.k.value * r.factors.ls.value * 0.2;
    expect(r.soilLoss.tPerHaYr).toBeCloseTo(a, 10);
    expect(r.soilLoss.tonPerAcYr).toBeCloseTo(a / 2.2417, 10);
    expect(r.aOverT).toBeCloseTo(a / (5 * 2.2417), 10);
    expect(r.factors.t).toMatchObject({ flag: 'practice', us: { value: 5 } });
    expect(r.cautions).toContain(CAUTION_SHEET_AND_RILL);
  });
  it('takes R from annual precipitation and flags it as memory (Renard & Freimund 1994)', () => {
    const r = estimate({ ...base, r: { from: 'precipitation', annualPrecipitationMm: 1000 } });
    expect(r).toMatchObject({ ok: true, factors: { r: { value: 3473.8, flag: 'memory' } } });
  });
  it('warns, and says why, when the precipitation lies outside the fit (Renard & Freimund 1994; range recalled)', () => {
    const inside = estimate({ ...base, r: { from: 'precipitation', annualPrecipitationMm: 1000 } });
    const outside = estimate({ ...base, r: { from: 'precipitation', annualPrecipitationMm: 2500 } });
    if (!inside.ok || !outside.ok) throw new Error('estimate failed');
    expect(inside.warnings.join(' ')).toMatch(/winter-rain/);
    expect(outside.warnings.join(' ')).toMatch(/above the 200–1700 mm.*several times off.*winter-rain.*local R/);
    expect(outside.factors.r.method).toMatch(/outside the range/);
  });
  it('gives strip cropping the P of its rotation column (AH-537, table 14; values recalled)', () => {
    const pOf = (stripRotation: 'A' | 'B' | 'C') => {
      const r = estimate({ ...base, p: { from: 'practice', practice: 'strip cropping', stripRotation } });
      if (!r.ok) throw new Error(r.reason);
      return r.factors.p.value;
    };
    // 6 %: the 6–8 % row of table 14
    expect([pOf('A'), pOf('B'), pOf('C')]).toEqual([0.25, 0.38, 0.5]);
  });
  it('refuses strip cropping without its rotation, naming the field', () => {
    expect(estimate({ ...base, p: { from: 'practice', practice: 'strip cropping' } })).toMatchObject({ ok: false, field: 'p.stripRotation' });
  });
  it('warns when strips are wider than table 14 allows (AH-537: 100 ft at 6–8 %)', () => {
    const r = estimate({ ...base, p: { from: 'practice', practice: 'strip cropping', stripRotation: 'A', stripWidthM: 40 } });
    expect(r.ok && r.warnings.join(' ')).toMatch(/wider than the 30 m/); // 100 ft = 30.48 m, to the whole metre
  });
  it('takes D for a drained dual-group soil without its water-table depth, and says why (NEH 630 ch. 7)', () => {
    const runoff = { rainfallMm: 75, hsg: 'B/D', cover: 'row crops', treatment: 'straight row', condition: 'good', drained: true } as const;
    const noDepth = estimate({ ...base, runoff });
    const deep = estimate({ ...base, runoff: { ...runoff, drainedWaterTableDepthCm: 90 } });
    if (!noDepth.ok || !deep.ok) throw new Error('estimate failed');
    expect(noDepth.runoff?.cn.value).toBe(89); // TR-55 Table 2-2b, row crops straight row good, D
    expect(noDepth.warnings.join(' ')).toMatch(/taken as D although the field is drained: the depth .* is not given/);
    expect(deep.runoff?.cn.value).toBe(78); // same row, B
    expect(deep.warnings.join(' ')).not.toMatch(/taken as D/);
  });
  it('takes K from texture (Williams) and names the class', () => {
    const r = estimate({ ...base, k: { from: 'texture', sandPct: 40, siltPct: 40, clayPct: 20, organicMatterPct: 1.5 * 1.724 } });
    if (!r.ok) throw new Error(r.reason);
    expect(r.textureClass).toBe('loam');
    expect(r.factors.k.us?.value).toBeCloseTo(0.2604, 4); // Sharpley & Williams 1990 check
  });
  it('takes K from a feel test through the texture table', () => {
    const r = estimate({ ...base, k: { from: 'feel', balls: true, ribbonCm: 1.5, feel: 'neither', organicMatterPct: 2 } });
    expect(r).toMatchObject({ ok: true, textureClass: 'loam', factors: { k: { us: { value: 0.34 } } } });
  });
  it('returns a reason naming the field when texture does not add up to about 100 %', () => {
    const r = estimate({ ...base, k: { from: 'texture', sandPct: 40, siltPct: 30, clayPct: 10, organicMatterPct: 2 } });
    expect(r).toMatchObject({ ok: false, field: 'k' });
  });
  it('returns a reason naming the field for a missing input', () => {
    const { slopePct: _drop, ...noSlope } = base;
    expect(estimate(noSlope)).toMatchObject({ ok: false, field: 'slopePct', reason: 'slopePct must be a number' });
  });
  it('returns a reason for a slope length beyond the LS tables', () => {
    expect(estimate({ ...base, slopeLengthM: 400 })).toMatchObject({ ok: false, field: 'slopeLengthM' });
  });
  it('uses the terrace interval as slope length and adds the terrace design caution', () => {
    const r = estimate({ ...base, slopeLengthM: 200, p: { from: 'practice', practice: 'terraces', terraceIntervalM: 30 } });
    if (!r.ok) throw new Error(r.reason);
    expect(r.factors.ls.value).toBeCloseTo(rusleLS({ slopePct: 6, lengthM: 30 }).ls, 12);
    expect(r.cautions).toContain(CAUTION_TERRACES);
    expect(r.practice).toMatchObject({ effective: true, effectiveSlopeLengthM: 30 });
  });
  it('warns when contouring loses its effect on a long slope', () => {
    const r = estimate({ ...base, slopeLengthM: 150, p: { from: 'practice', practice: 'contouring' } });
    if (!r.ok) throw new Error(r.reason);
    expect(r.factors.p.value).toBe(1);
    expect(r.warnings.join(' ')).toMatch(/loses its effect/);
  });
  it('gives runoff from a TR-55 curve number (5 in on CN 80 → 2.89 in) and a volume for the area', () => {
    const r = estimate({
      ...base,
      areaHa: 2,
      runoff: { rainfallMm: 127, cover: 'row crops', treatment: 'contoured', condition: 'poor', hsg: 'B' },
    });
    if (!r.ok) throw new Error(r.reason);
    expect(r.runoff?.cn.value).toBe(79);
    const direct = estimate({ ...base, areaHa: 2, runoff: { rainfallMm: 127, cn: 80 } });
    if (!direct.ok) throw new Error(direct.reason);
    expect(direct.runoff?.runoffIn.toFixed(2)).toBe('2.89'); // TR-55 Table 2-1
    expect(direct.runoff?.volumeM3).toBeCloseTo(direct.runoff!.runoffMm * 20, 10);
  });
  it('takes the soil group from the texture when none is given, and flags it practice', () => {
    const r = estimate({
      ...base,
      k: { from: 'texture', sandPct: 10, siltPct: 55, clayPct: 35, organicMatterPct: 2 },
      runoff: { rainfallMm: 80, cover: 'pasture', condition: 'good' },
    });
    expect(r).toMatchObject({ ok: true, runoff: { hsg: 'D', cn: { value: 80, flag: 'practice' } } });
  });
  it('asks for the soil group when it cannot be taken from texture', () => {
    expect(estimate({ ...base, runoff: { rainfallMm: 80, cover: 'pasture', condition: 'good' } })).toMatchObject({ ok: false, field: 'runoff.hsg' });
  });
  it('runs the subfactor C with the default EI distribution', () => {
    const r = estimate({ ...base, c: { from: 'subfactors', periods: [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], sc: 0.3 }] } });
    expect(r).toMatchObject({ ok: true, factors: { c: { value: 0.3, flag: 'practice' } } });
  });
  it('shares one schema with the route: EstimateInput names the field in its messages', () => {
    const p = EstimateInput.safeParse({ ...base, slopePct: 150 });
    expect(p.success).toBe(false);
    expect(p.error?.issues[0].message).toBe('slopePct must be at most 100 %');
  });
});

describe('estimate(): terraces with an elevation model', () => {
  it('takes LS on the terrace interval, not the elevation model’s uninterrupted paths (AH-537: slope length = terrace interval)', () => {
    const input = { ...base, slopePct: 6, slopeLengthM: 120, lsFromGrid: { value: 3.2, source: 'elevation model', method: 'mean of cells' } };
    const plain = estimate(input);
    const terraced = estimate({ ...input, p: { from: 'practice', practice: 'terraces', terraceIntervalM: ftToM(100) } });
    if (!plain.ok || !terraced.ok) throw new Error('estimate failed');
    expect(plain.factors.ls.value).toBe(3.2);
    // AH-703 LS table: 6 %, 100 ft, moderate ratio → 0.78
    expect(terraced.factors.ls.value).toBeCloseTo(0.78, 2);
    expect(terraced.warnings.join(' ')).toMatch(/Terraces cut the slope/);
  });
});
