import { describe, expect, it } from 'vitest';
import {
  annualCFromSubfactors,
  canopyCoverSubfactor,
  coverFromTable,
  DEFAULT_EI_DISTRIBUTION,
  pastureC,
  residueCoverFromMass,
  roughnessSubfactor,
  surfaceCoverSubfactor,
} from '../../../shared/erosion';

describe('C subfactors (AH-703 ch. 5)', () => {
  it('gives SC 0.3499 for 30 % cover, b 0.035, Ru 6.096 mm', () => {
    expect(surfaceCoverSubfactor({ coverPct: 30, b: 0.035, roughnessMm: 6.096 })).toBeCloseTo(0.3499, 4); // AH-703 eq. 5-6 check
  });
  it('gives CC 0.5476 for Fc 0.5 and fall height 0.3048 m', () => {
    expect(canopyCoverSubfactor({ canopyFraction: 0.5, fallHeightM: 0.3048 })).toBeCloseTo(0.5476, 4); // AH-703 eq. 5-5 check
  });
  it('gives SR 1 at the 6.096 mm baseline roughness and less when rougher', () => {
    expect(roughnessSubfactor(6.096)).toBeCloseTo(1, 12); // AH-703 eq. 5-7
    expect(roughnessSubfactor(20)).toBeLessThan(1);
  });
  it('gives residue cover 1 − exp(−αM) (Gregory 1982)', () => {
    expect(residueCoverFromMass({ massPerArea: 2, alpha: 0.5 })).toBeCloseTo(1 - Math.exp(-1), 12);
  });
});

describe('annual C weighted by the EI distribution (AH-703 eq. 5-1)', () => {
  it('weights each period’s soil-loss ratio by its share of EI', () => {
    const shares = [0, 0, 0, 0, 0, 50, 50, 0, 0, 0, 0, 0];
    const r = annualCFromSubfactors(
      [
        { months: [1, 2, 3, 4, 5, 6], slr: 0.6 },
        { months: [7, 8, 9, 10, 11, 12], slr: 0.2 },
      ],
      { monthlySharePct: shares, source: 'test', flag: 'pub' },
    );
    expect(r.ok && r.value.c).toBeCloseTo(0.4, 12);
  });
  it('uses a default distribution that sums to 100 % and that a user may replace', () => {
    expect(DEFAULT_EI_DISTRIBUTION.monthlySharePct.reduce((a, b) => a + b, 0)).toBeCloseTo(100, 10);
    const periods = [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], cc: 0.5, sc: 0.4, sr: 1 }];
    const r = annualCFromSubfactors(periods);
    expect(r.ok && r.value.c).toBeCloseTo(0.2, 12);
  });
  it('gives C = Σ SLR·EI / Σ EI for subfactor periods under the default distribution', () => {
    const s = DEFAULT_EI_DISTRIBUTION.monthlySharePct;
    const bare = [1, 2, 3, 4, 5];
    const crop = [6, 7, 8, 9, 10, 11, 12];
    const sc = surfaceCoverSubfactor({ coverPct: 30 });
    const cc = canopyCoverSubfactor({ canopyFraction: 0.5, fallHeightM: 0.3048 });
    const r = annualCFromSubfactors([
      { months: bare, sc: 1 },
      { months: crop, cc, sc },
    ]);
    const eiBare = bare.reduce((a, m) => a + s[m - 1], 0);
    const eiCrop = crop.reduce((a, m) => a + s[m - 1], 0);
    expect(r.ok && r.value.c).toBeCloseTo((1 * eiBare + cc * sc * eiCrop) / (eiBare + eiCrop), 12);
  });
  it('refuses a month claimed by two periods', () => {
    expect(annualCFromSubfactors([{ months: [1, 2], slr: 1 }, { months: [2], slr: 1 }])).toMatchObject({ ok: false });
  });
});

describe('C from tables', () => {
  it.each([
    [20, 0.2],
    [40, 0.1],
    [60, 0.042],
    [80, 0.013],
    [100, 0.003],
  ])('pasture with %s %% ground cover has C %s (AH-537 Table 10, grass, no canopy)', (g, c) => {
    const r = pastureC(g);
    expect(r.ok && r.value.c).toBeCloseTo(c, 10);
    expect(r.ok && r.value.flag).toBe('pub');
  });
  it('interpolates pasture C between rows and refuses cover outside 0–100 %', () => {
    const r = pastureC(50);
    expect(r.ok && r.value.c).toBeLessThan(0.1);
    expect(r.ok && r.value.c).toBeGreaterThan(0.042);
    expect(pastureC(-1)).toMatchObject({ ok: false });
    expect(pastureC(101)).toMatchObject({ ok: false });
  });
  it('covers bare pasture: 0 % ground cover gives C 0.45 (AH-537 Table 10 [memory]), flagged as recalled', () => {
    const bare = pastureC(0);
    expect(bare.ok && bare.value.c).toBeCloseTo(0.45, 10);
    expect(bare.ok && bare.value.flag).toBe('memory');
    // Between the bare row and 20 % the figure leans on the recalled row too.
    const thin = pastureC(10);
    expect(thin.ok && thin.value.c).toBeCloseTo(Math.sqrt(0.45 * 0.2), 10);
    expect(thin.ok && thin.value.flag).toBe('memory');
  });
  it('gives continuous corn under a moldboard plough a C within 0.40–0.55 [memory]', () => {
    const r = coverFromTable({ crop: 'corn', tillage: 'moldboard plough' });
    expect(r.ok && r.value.c).toBeGreaterThanOrEqual(0.4);
    expect(r.ok && r.value.c).toBeLessThanOrEqual(0.55);
    expect(r.ok && r.value.flag).toBe('memory');
  });
  it('lowers C with less tillage, more residue and a cover crop (common practice, no single source)', () => {
    const mb = coverFromTable({ crop: 'corn', tillage: 'moldboard plough' });
    const ch = coverFromTable({ crop: 'corn', tillage: 'chisel or mulch-till' });
    const nt = coverFromTable({ crop: 'corn', tillage: 'no-till' });
    const ntMore = coverFromTable({ crop: 'corn', tillage: 'no-till', residuePct: 80 });
    const ntCc = coverFromTable({ crop: 'corn', tillage: 'no-till', coverCrop: true });
    if (!mb.ok || !ch.ok || !nt.ok || !ntMore.ok || !ntCc.ok) throw new Error('lookup failed');
    expect(ch.value.c).toBeLessThan(mb.value.c);
    expect(nt.value.c).toBeLessThan(ch.value.c);
    expect(ntMore.value.c).toBeLessThan(nt.value.c);
    expect(ntCc.value.c).toBeLessThan(nt.value.c);
    expect(ntCc.value.flag).toBe('practice');
  });
  it('names the choices when a combination is not in the table', () => {
    const r = coverFromTable({ crop: 'corn', tillage: 'strip-till' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/moldboard plough/);
  });
});
