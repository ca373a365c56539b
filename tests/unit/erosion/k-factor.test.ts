import { describe, expect, it } from 'vitest';
import {
  kFactorNomograph,
  kFactorWilliams,
  kFromTextureTable,
  permeabilityClassFromKsat,
  tryKFactorNomograph,
} from '../../../shared/erosion';

const example = { siltVfsPct: 65, sandPct: 5, organicMatterPct: 2.8, structure: 2, permeability: 4 } as const;

describe('K by the nomograph equation (AH-537; AH-703 eq. 3-1)', () => {
  it('gives 0.31 for the AH-537 worked example (equation 0.311)', () => {
    const k = kFactorNomograph(example); // AH-537 worked example: silt+vfs 65, sand 5, OM 2.8, s 2, p 4
    expect(k.us).toBeCloseTo(0.311, 3);
    expect(k.us.toFixed(2)).toBe('0.31');
    expect(k.si).toBeCloseTo(0.311 * 0.1317, 4);
  });

  it('adds 3.25/100 per structure code step and nothing else (structure term alone)', () => {
    // AH-703 eq. 3-1: + 3.25 (s − 2); guards against the known swap of the two terms
    const base = kFactorNomograph(example).us;
    expect(kFactorNomograph({ ...example, structure: 3 }).us - base).toBeCloseTo(0.0325, 10);
    expect(kFactorNomograph({ ...example, structure: 1 }).us - base).toBeCloseTo(-0.0325, 10);
  });

  it('adds 2.5/100 per permeability class step and nothing else (permeability term alone)', () => {
    // AH-703 eq. 3-1: + 2.5 (p − 3)
    const base = kFactorNomograph(example).us;
    expect(kFactorNomograph({ ...example, permeability: 5 }).us - base).toBeCloseTo(0.025, 10);
    expect(kFactorNomograph({ ...example, permeability: 3 }).us - base).toBeCloseTo(-0.025, 10);
  });

  it('has no structure or permeability contribution at s = 2, p = 3', () => {
    // AH-703 eq. 3-1: only the texture/OM term remains
    const k = kFactorNomograph({ ...example, permeability: 3 }).us;
    const m = 65 * 70;
    expect(k).toBeCloseTo((2.1e-4 * m ** 1.14 * (12 - 2.8)) / 100, 12);
  });

  it('caps organic matter at 4 % [memory]', () => {
    expect(kFactorNomograph({ ...example, organicMatterPct: 7 }).us).toBe(kFactorNomograph({ ...example, organicMatterPct: 4 }).us);
    const r = tryKFactorNomograph({ ...example, organicMatterPct: 7 });
    expect(r.ok && r.value.warnings.join(' ')).toMatch(/taken as 4 %/);
  });

  it('returns a reason when silt + vfs and sand exceed 100 %', () => {
    expect(tryKFactorNomograph({ ...example, sandPct: 40 })).toMatchObject({ ok: false });
  });

  it('throws on NaN input with an exact message', () => {
    expect(() => kFactorNomograph({ ...example, sandPct: NaN })).toThrow('sandPct must be a finite number, got NaN');
  });
});

describe('nomograph permeability class from Ksat in mm/h (AH-537) [pub, class 1 memory]', () => {
  it.each([
    [200, 1],
    [150.1, 1],
    [150, 2],
    [60, 2],
    [50, 3],
    [20, 3],
    [15, 4],
    [6, 4],
    [5, 5],
    [1.524, 5],
    [1.523, 6],
    [1.0, 6],
  ])('Ksat %s mm/h is class %s', (ksat, cls) => {
    expect(permeabilityClassFromKsat(ksat)).toBe(cls);
  });
  it('puts the slow / very slow boundary at 1.524 mm/h, not 1', () => {
    expect(permeabilityClassFromKsat(1.2)).toBe(6);
  });
});

describe('K by the Williams (EPIC) equation (Sharpley & Williams 1990, eq. 2.96)', () => {
  it('gives 0.2604 US and 0.0343 SI for 40/40/20 with 1.5 % organic carbon', () => {
    const k = kFactorWilliams({ sandPct: 40, siltPct: 40, clayPct: 20, organicCarbonPct: 1.5 }); // Sharpley & Williams 1990 eq. 2.96: 40/40/20, OC 1.5 % → 0.2604 US
    expect(k.us).toBeCloseTo(0.2604, 4);
    expect(k.si).toBeCloseTo(0.0343, 4);
  });
  it('uses 0.0256 in the coarse-sand term, not the misprinted 0.256', () => {
    // with 0.256 the coarse-sand term would be 0.2 + 0.3·exp(−6.144) ≈ 0.2006 and K ≈ 0.144
    const k = kFactorWilliams({ sandPct: 40, siltPct: 40, clayPct: 20, organicCarbonPct: 1.5 });
    expect(k.us).toBeGreaterThan(0.25);
  });
});

describe('K by texture class and organic matter (after Stewart et al. 1975)', () => {
  it.each([
    ['loam', 0.5, 0.38],
    ['loam', 2, 0.34],
    ['loam', 4, 0.29],
    ['silt loam', 2, 0.42],
    ['sand', 4, 0.02],
    ['silty clay loam', 0.5, 0.37],
  ] as const)('%s at %s %% OM is %s (table)', (cls, om, k) => {
    const r = kFromTextureTable(cls, om);
    expect(r.ok && r.value.us).toBeCloseTo(k, 10);
  });
  it('interpolates linearly between OM columns and holds flat outside them', () => {
    const r = kFromTextureTable('loam', 3);
    expect(r.ok && r.value.us).toBeCloseTo(0.315, 10);
    expect(kFromTextureTable('loam', 8)).toMatchObject({ ok: true, value: { us: 0.29 } });
    expect(kFromTextureTable('loam', 0.1)).toMatchObject({ ok: true, value: { us: 0.38 } });
  });
  it('uses the midpoint of the 0.13–0.29 range for clay and says so', () => {
    const r = kFromTextureTable('clay', 2);
    expect(r.ok && r.value.us).toBeCloseTo(0.21, 10);
    expect(r.ok && r.value.note).toMatch(/range/);
  });
});
