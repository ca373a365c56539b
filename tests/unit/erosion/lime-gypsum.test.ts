// Lime by buffer method and gypsum for sodic soils, against their published figures.
import { describe, expect, it } from 'vitest';
import {
  EXAMPLE_LIME_PRODUCT,
  GYPSUM_EXCHANGE_EFFICIENCY,
  gypsumQuantity,
  kAfterOrganicMatterRise,
  limeFinenessEfficiency,
  limeRequirement,
  pureLimeRequirement,
  sodicGypsumOrder,
  sodicGypsumRequirement,
  tPerHaToTonPerAc,
} from '../../../shared/erosion';

const PURE_FINE = { ccePct: 100, fineness: { passing20MeshPct: 100, passing60MeshPct: 100, passing100MeshPct: 100 } };

describe('lime by the Mehlich buffer (NCDA&CS method)', () => {
  it('gives 0.75 t/ac to take pH 5.0 to 6.0 at buffer pH 6.3 (NCDA&CS buffer table: acidity 1.2 × factor 0.625)', () => {
    const r = pureLimeRequirement({ method: 'mehlich', soilPh: 5.0, bufferPh: 6.3, targetPh: 6.0 });
    expect(r.ok && r.value.acidityMeqPer100Cm3).toBeCloseTo(1.2, 10);
    expect(r.ok && r.value.pureTonPerAc).toBeCloseTo(0.75, 10);
    const p = limeRequirement({ method: 'mehlich', soilPh: 5.0, bufferPh: 6.3, targetPh: 6.0, product: PURE_FINE });
    expect(p.ok && p.value.tonPerAc).toBeCloseTo(0.75, 10);
    expect(p.ok && p.value.tPerHa).toBeCloseTo(0.75 * 2.2417, 10);
  });
  it('refuses buffer pH 7.2 with soil pH 5.0: above the Mehlich buffer’s starting pH 6.6, not 0 t/ac (NCDA&CS: acidity = (6.6 − BpH) × 4)', () => {
    const r = limeRequirement({ method: 'mehlich', soilPh: 5.0, bufferPh: 7.2, targetPh: 6.0 });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.reason).toMatch(/Mehlich.*7\.2.*outside the method's range 4–6\.6/);
  });
  it('needs no lime when the soil is already at the target, and says so', () => {
    const r = pureLimeRequirement({ method: 'mehlich', soilPh: 6.2, bufferPh: 6.5, targetPh: 6.0 });
    expect(r).toMatchObject({ ok: true, value: { pureTonPerAc: 0 } });
    expect(r.ok && r.value.reason).toMatch(/already at or above the target 6/);
  });
  it('refuses an unknown method, an impossible pH and a target outside the calibration', () => {
    expect(pureLimeRequirement({ method: 'adams-evans', soilPh: 5, bufferPh: 7.6 })).toMatchObject({ ok: false, reason: expect.stringMatching(/buffer method 'adams-evans' is not known/) });
    expect(pureLimeRequirement({ method: 'mehlich', soilPh: 14, bufferPh: 6.3 })).toMatchObject({ ok: false });
    expect(pureLimeRequirement({ method: 'mehlich', soilPh: 5, bufferPh: 6.3, targetPh: 7 })).toMatchObject({ ok: false, reason: expect.stringMatching(/calibration/) });
  });
});

describe('lime by the SMP buffer (SMP table, Shoemaker, McLean & Pratt 1961, as in the Tri-State Fertilizer Recommendations E-2567: cells recalled, not re-read)', () => {
  it('reads the table’s cells (recalled)', () => {
    const at = (bufferPh: number, targetPh: number) => {
      const r = pureLimeRequirement({ method: 'smp', soilPh: 5.4, bufferPh, targetPh });
      return r.ok ? r.value.pureTonPerAc : NaN;
    };
    expect(at(6.8, 6.8)).toBeCloseTo(1.4, 10);
    expect(at(6.4, 6.5)).toBeCloseTo(4.7, 10);
    expect(at(6.0, 6.0)).toBeCloseTo(6.7, 10);
    expect(at(5.8, 6.8)).toBeCloseTo(11.7, 10);
  });
  it('interpolates linearly between rows and between target columns', () => {
    const r = pureLimeRequirement({ method: 'smp', soilPh: 5.4, bufferPh: 6.45, targetPh: 6.5 });
    expect(r.ok && r.value.pureTonPerAc).toBeCloseTo((4.7 + 3.8) / 2, 10);
    const t = pureLimeRequirement({ method: 'smp', soilPh: 5.4, bufferPh: 6.4, targetPh: 6.25 });
    expect(t.ok && t.value.pureTonPerAc).toBeCloseTo((3.9 + 4.7) / 2, 10);
  });
  it('refuses readings outside the table (7.0, 5.5) instead of giving 0 t/ac', () => {
    expect(pureLimeRequirement({ method: 'smp', soilPh: 5.4, bufferPh: 7.0 })).toMatchObject({ ok: false, reason: expect.stringMatching(/SMP buffer pH 7 is outside the method's range 5\.8–6\.8/) });
    expect(pureLimeRequirement({ method: 'smp', soilPh: 5.0, bufferPh: 5.5 })).toMatchObject({ ok: false });
  });
});

describe('lime product from CCE and fineness (New York effective neutralizing value rule, Cornell University)', () => {
  it('weights 20–60 mesh 0.4, 60–100 mesh 0.8, finer than 100 mesh 1.0', () => {
    const e = limeFinenessEfficiency(EXAMPLE_LIME_PRODUCT.fineness);
    // (95 − 60)·0.4 + (60 − 45)·0.8 + 45·1.0 = 71 %
    expect(e.ok && e.value).toBeCloseTo(0.71, 10);
    expect(limeFinenessEfficiency({ passing20MeshPct: 50, passing60MeshPct: 60, passing100MeshPct: 10 }).ok).toBe(false);
  });
  it('spreads pure rate ÷ (CCE × fineness / 100)', () => {
    const r = limeRequirement({ method: 'mehlich', soilPh: 5.0, bufferPh: 6.3, targetPh: 6.0, areaHa: 10 });
    expect(r.ok && r.value.effectiveCcePct).toBeCloseTo(90 * 0.71, 10);
    expect(r.ok && r.value.productTonPerAc).toBeCloseTo(0.75 / 0.639, 10);
    expect(r.ok && r.value.tonnes).toBeCloseTo((0.75 / 0.639) * 2.2417 * 10, 8);
  });
});

describe('gypsum for sodic soils (USDA Handbook 60; exchange efficiency and purity, common practice)', () => {
  it('matches Handbook 60: 1.72 short t of pure gypsum per acre-foot per meq/100 g', () => {
    // ΔNa 1 cmolc/kg (= meq/100 g), one foot (30.48 cm), the acre-foot's 4 million lb (1.47 Mg/m³)
    const g = sodicGypsumRequirement({ cecCmolPerKg: 100, espInitialPct: 1, espTargetPct: 0, depthCm: 30.48, bulkDensityMgPerM3: 1.47 });
    expect(tPerHaToTonPerAc(g)).toBeCloseTo(1.72, 2);
  });
  it('raises the pure amount by the exchange efficiency and the purity, and shows both', () => {
    const r = sodicGypsumOrder({ cecCmolPerKg: 20, espInitialPct: 20, areaHa: 4 });
    const pure = 0.0861 * 3 * 15 * 1.47;
    expect(r.ok && r.value.pureGypsumTPerHa).toBeCloseTo(pure, 10);
    expect(r.ok && r.value.exchangeEfficiency).toBe(GYPSUM_EXCHANGE_EFFICIENCY.default);
    expect(r.ok && r.value.purityPct).toBe(90);
    expect(r.ok && r.value.tonnes).toBeCloseTo(((pure * 1.2) / 0.9) * 4, 8);
    const r2 = sodicGypsumOrder({ cecCmolPerKg: 20, espInitialPct: 20, areaHa: 4, exchangeEfficiency: 1.3, purityPct: 70 });
    expect(r2.ok && r2.value.tPerHa).toBeCloseTo((pure * 1.3) / 0.7, 10);
  });
  it('refuses a soil already at the target ESP and an efficiency outside reason', () => {
    expect(sodicGypsumOrder({ cecCmolPerKg: 20, espInitialPct: 4, areaHa: 1 })).toMatchObject({ ok: false, reason: expect.stringMatching(/already at or below/) });
    expect(sodicGypsumOrder({ cecCmolPerKg: 20, espInitialPct: 20, areaHa: 1, exchangeEfficiency: 0.5 })).toMatchObject({ ok: false, reason: expect.stringMatching(/exchange efficiency/) });
  });
  it('flags the structural 1 t/ac as a rule of thumb (met with NRCS 333, not read from its text)', () => {
    expect(gypsumQuantity({ areaHa: 1 })).toMatchObject({ flag: 'practice' });
  });
});

describe('K after organic matter rises (AH-537 nomograph; AH-703 eq. 3-1)', () => {
  it('scales K by the nomograph’s organic-matter term on the AH-537 worked example', () => {
    // AH-537 example: silt+vfs 65 %, sand 5 %, OM 2.8 %, s 2, p 4 → K 0.311; at OM 3.3 the
    // OM term 2.1e-4·M^1.14·(12 − OM)/100 falls by 2.1e-4·(65·70)^1.14·0.5/100.
    const m = 65 * 70;
    const k28 = (2.1e-4 * m ** 1.14 * (12 - 2.8) + 2.5) / 100;
    const k33 = (2.1e-4 * m ** 1.14 * (12 - 3.3) + 2.5) / 100;
    expect(k28).toBeCloseTo(0.311, 3);
    const r = kAfterOrganicMatterRise({ kNowUs: 0.31, organicMatterPct: 2.8, sandPct: 5, siltPct: 65, clayPct: 30, structure: 2, permeability: 4 });
    expect(r.ok && r.value.kNewUs).toBeCloseTo((0.31 * k33) / k28, 10);
    expect(r.ok && r.value.assumptions.join(' ')).toMatch(/\+0\.5 % after years of compost; rule of thumb/);
  });
  it('shows no change at or above the nomograph’s 4 % organic-matter limit, in words', () => {
    expect(kAfterOrganicMatterRise({ kNowUs: 0.3, organicMatterPct: 4.1, sandPct: 10, siltPct: 60, clayPct: 30 })).toMatchObject({ ok: false, reason: expect.stringMatching(/4 % limit/) });
  });
});
