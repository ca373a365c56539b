import { describe, expect, it } from 'vitest';
import { coverFromTable, pastureC, rFromAnnualPrecipitation, rusleLS, soilLoss, soilLossDetailed } from '../../../shared/erosion';

describe('A = R·K·LS·C·P (AH-703 eq. 1-1)', () => {
  it('multiplies the factors and gives t/ha/yr from SI R and K', () => {
    expect(soilLoss({ r: 3000, k: 0.04, ls: 1.2, c: 0.25, p: 0.5 })).toBeCloseTo(18, 10);
  });
  it('gives K·R on the unit plot (9 %, 22.13 m, C = P = 1) within 0.6 % (AH-703 ch. 1)', () => {
    const ls = rusleLS({ slopePct: 9, lengthM: 22.13 }).ls;
    const a = soilLoss({ r: 1000, k: 0.03, ls, c: 1, p: 1 });
    expect(a / 30).toBeCloseTo(1.006, 3);
  });
  it('returns t/ac/yr and every factor beside t/ha/yr', () => {
    const d = soilLossDetailed({ r: 3000, k: 0.04, ls: 1.2, c: 0.25, p: 0.5 });
    expect(d.soilLossTonPerAcYr).toBeCloseTo(18 / 2.2417, 10);
    expect(d.factors).toEqual({ r: 3000, k: 0.04, ls: 1.2, c: 0.25, p: 0.5 });
  });
  it('throws on a NaN factor with an exact message', () => {
    expect(() => soilLoss({ r: NaN, k: 0.04, ls: 1, c: 1, p: 1 })).toThrow('r must be a finite number, got NaN');
  });
});

describe('monotonicity of A', () => {
  const base = { r: 3000, k: 0.04, c: 0.2, p: 1 };
  it('rises with slope at fixed length', () => {
    let last = -1;
    for (let s = 0.5; s <= 60; s += 0.5) {
      const a = soilLoss({ ...base, ls: rusleLS({ slopePct: s, lengthM: 50 }).ls });
      expect(a).toBeGreaterThan(last);
      last = a;
    }
  });
  it('rises with slope length at fixed slope (lengths from 4.5 m, above the short-slope form)', () => {
    for (const slope of [2, 6, 9, 15, 30]) {
      let last = -1;
      for (let l = 5; l <= 300; l += 5) {
        const a = soilLoss({ ...base, ls: rusleLS({ slopePct: slope, lengthM: l }).ls });
        expect(a).toBeGreaterThan(last);
        last = a;
      }
    }
  });
  it('rises with R (from precipitation)', () => {
    const ls = rusleLS({ slopePct: 6, lengthM: 50 }).ls;
    let last = -1;
    for (let p = 200; p <= 2500; p += 100) {
      const a = soilLoss({ ...base, ls, r: rFromAnnualPrecipitation(p) });
      expect(a).toBeGreaterThan(last);
      last = a;
    }
  });
  it('falls with ground cover (pasture, AH-537 Table 10) and with residue', () => {
    const ls = rusleLS({ slopePct: 6, lengthM: 50 }).ls;
    let last = Infinity;
    for (let g = 20; g <= 100; g += 5) {
      const c = pastureC(g);
      if (!c.ok) throw new Error(c.reason);
      const a = soilLoss({ ...base, ls, c: c.value.c });
      expect(a).toBeLessThan(last);
      last = a;
    }
    last = Infinity;
    for (let res = 0; res <= 90; res += 10) {
      const c = coverFromTable({ crop: 'corn', tillage: 'no-till', residuePct: res });
      if (!c.ok) throw new Error(c.reason);
      const a = soilLoss({ ...base, ls, c: c.value.c });
      expect(a).toBeLessThan(last);
      last = a;
    }
  });
});
