import { describe, expect, it } from 'vitest';
import * as u from '../../../shared/erosion/units';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('SI ↔ US units (AH-703 app. A)', () => {
  it('uses 2.2417, 17.02 and 0.1317 for A, R and K, and 72.6 ft = 22.13 m', () => {
    expect(u.tonPerAcToTPerHa(1)).toBe(2.2417);
    expect(u.rUsToSi(1)).toBe(17.02);
    expect(u.kUsToSi(1)).toBe(0.1317);
    expect(u.ftToM(72.6)).toBeCloseTo(22.13, 2);
  });
  it('gives 7.056 µm/s for 1 in/h (to 1e-4 relative)', () => {
    expect(rel(u.inPerHToUmPerS(1), 7.056)).toBeLessThan(1e-4);
  });
  it('knows that R·K in US units is 2.2415, not 2.2417, t/ha per ton/ac: round trips need ≥ 1e-4 relative tolerance', () => {
    const aUs = 1; // ton/ac/yr from R = K = 1 US
    const aSiViaFactors = u.rUsToSi(1) * u.kUsToSi(1);
    expect(aSiViaFactors).toBeCloseTo(2.24153, 5);
    expect(rel(aSiViaFactors, u.tonPerAcToTPerHa(aUs))).toBeLessThan(1e-4);
  });
  const pairs: [string, (x: number) => number, (x: number) => number][] = [
    ['t/ha ↔ ton/ac', u.tPerHaToTonPerAc, u.tonPerAcToTPerHa],
    ['R', u.rSiToUs, u.rUsToSi],
    ['K', u.kSiToUs, u.kUsToSi],
    ['m ↔ ft', u.mToFt, u.ftToM],
    ['mm ↔ in', u.mmToIn, u.inToMm],
    ['µm/s ↔ in/h', u.umPerSToInPerH, u.inPerHToUmPerS],
    ['µm/s ↔ mm/h', u.umPerSToMmPerH, u.mmPerHToUmPerS],
    ['ha ↔ ac', u.haToAc, u.acToHa],
    ['t ↔ short ton', u.tToShortTon, u.shortTonToT],
  ];
  it.each(pairs)('round-trips %s within 1e-4 relative', (_name, there, back) => {
    for (const x of [0.001, 0.37, 1, 22.13, 1234.5, 1e6]) {
      expect(rel(back(there(x)), x)).toBeLessThan(1e-4);
    }
  });
  it('converts an acre to 0.40468564224 ha and a foot to 0.3048 m', () => {
    expect(u.acToHa(1)).toBe(0.40468564224);
    expect(u.ftToM(1)).toBe(0.3048);
    expect(u.inToMm(1)).toBe(25.4);
  });
});
