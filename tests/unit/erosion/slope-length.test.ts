import { describe, expect, it } from 'vitest';
import {
  desmetGoversL,
  ftToM,
  rusleLengthExponent,
  rusleLS,
  rusleSlopeFactor,
  segmentL,
  tryRusleLS,
  usleLS,
} from '../../../shared/erosion';
import { desmetGoversL as dgFromModule, rusleLengthExponent as mFromModule, rusleSlopeFactor as sFromModule } from '../../../shared/erosion/slope-length';

describe('RUSLE LS (AH-703 ch. 4; McCool et al. 1987, 1989)', () => {
  it('gives 0.78 at 6 % and 100 ft (AH-703 LS table, moderate rill/interrill)', () => {
    expect(rusleLS({ slopePct: 6, lengthM: ftToM(100) }).ls.toFixed(2)).toBe('0.78');
  });
  it('gives 2.44 at 10 % and 300 ft (AH-703 LS table, moderate rill/interrill)', () => {
    expect(rusleLS({ slopePct: 10, lengthM: ftToM(300) }).ls.toFixed(2)).toBe('2.44');
  });
  it('gives 1.006 on the unit plot, 9 % and 22.13 m (AH-703 eq. 4-1, 4-4)', () => {
    const r = rusleLS({ slopePct: 9, lengthM: 22.13 });
    expect(r.l).toBeCloseTo(1, 12);
    expect(r.ls).toBeCloseTo(1.006, 3);
  });
  it('switches S at 9 % between the two McCool equations (AH-703 eq. 4-4)', () => {
    const sin = Math.sin(Math.atan(0.0899));
    expect(rusleSlopeFactor(8.99)).toBeCloseTo(10.8 * sin + 0.03, 12);
    expect(rusleSlopeFactor(9)).toBeCloseTo(16.8 * Math.sin(Math.atan(0.09)) - 0.5, 12);
  });
  // AH-703 Table 4-3 (moderate rill/interrill ratio), the short columns < 3, 6, 9, 12 and 15 ft,
  // as printed in the handbook's LS table (read from a university extension reproduction of it).
  const SHORT_COLUMNS_FT = [0.03, 6, 9, 12, 15];
  const TABLE_4_3_SHORT: Record<number, number[]> = {
    0.2: [0.05, 0.05, 0.05, 0.05, 0.05],
    0.5: [0.07, 0.07, 0.07, 0.07, 0.07],
    1: [0.11, 0.11, 0.11, 0.11, 0.11],
    2: [0.17, 0.17, 0.17, 0.17, 0.17],
    3: [0.22, 0.22, 0.22, 0.22, 0.22],
    4: [0.26, 0.26, 0.26, 0.26, 0.26],
    5: [0.3, 0.3, 0.3, 0.3, 0.3],
    6: [0.34, 0.34, 0.34, 0.34, 0.34],
    8: [0.42, 0.42, 0.42, 0.42, 0.42],
    10: [0.46, 0.48, 0.5, 0.51, 0.52],
    12: [0.47, 0.53, 0.58, 0.61, 0.64],
    14: [0.48, 0.58, 0.65, 0.7, 0.75],
  };
  it('repeats the 15-ft LS in every shorter column below 9 % (AH-703 Table 4-3)', () => {
    for (const [slope, row] of Object.entries(TABLE_4_3_SHORT).filter(([s]) => Number(s) < 9)) {
      SHORT_COLUMNS_FT.forEach((ft, i) => expect(rusleLS({ slopePct: Number(slope), lengthM: ftToM(ft) }).ls.toFixed(2), `${slope} %, ${ft} ft`).toBe(row[i].toFixed(2)));
    }
  });
  it('gives the < 3 ft and 15 ft cells from 9 % up, and the 6–12 ft cells within 0.012 (AH-703 Table 4-3; short-slope S, eq. 4-5)', () => {
    for (const [slope, row] of Object.entries(TABLE_4_3_SHORT).filter(([s]) => Number(s) >= 9)) {
      const ls = SHORT_COLUMNS_FT.map((ft) => rusleLS({ slopePct: Number(slope), lengthM: ftToM(ft) }).ls);
      expect(ls[0].toFixed(2), `${slope} %, < 3 ft`).toBe(row[0].toFixed(2));
      expect(ls[4].toFixed(2), `${slope} %, 15 ft`).toBe(row[4].toFixed(2));
      for (const i of [1, 2, 3]) expect(Math.abs(ls[i] - row[i]), `${slope} %, ${SHORT_COLUMNS_FT[i]} ft`).toBeLessThanOrEqual(0.012);
    }
  });
  it('never lowers LS as a slope grows longer at a fixed steepness (AH-703 Table 4-3 rows rise left to right)', () => {
    for (const slope of [0.5, 2, 5, 8.99, 9, 12, 20, 35]) {
      let previous = 0;
      for (let lengthM = 0.05; lengthM <= 30; lengthM += 0.05) {
        const ls = rusleLS({ slopePct: slope, lengthM }).ls;
        expect(ls, `${slope} %, ${lengthM.toFixed(2)} m`).toBeGreaterThanOrEqual(previous - 1e-12);
        previous = ls;
      }
    }
  });
  it('uses the ordinary S from 15 ft and when no length is given (AH-703 eq. 4-4)', () => {
    const sin = Math.sin(Math.atan(0.2));
    expect(rusleSlopeFactor(20, ftToM(15))).toBeCloseTo(16.8 * sin - 0.5, 12);
    expect(rusleSlopeFactor(20)).toBeCloseTo(16.8 * sin - 0.5, 12);
    expect(rusleSlopeFactor(20, 0)).toBeCloseTo(3 * sin ** 0.8 + 0.56, 12); // eq. 4-5, interrill only
  });
  it('orders m low < moderate < high rill/interrill ratio (β/2, β, 2β) [memory for the labels]', () => {
    const low = rusleLengthExponent(10, 'low');
    const mod = rusleLengthExponent(10, 'moderate');
    const high = rusleLengthExponent(10, 'high');
    expect(low).toBeLessThan(mod);
    expect(mod).toBeLessThan(high);
    const beta = mod / (1 - mod);
    expect(low).toBeCloseTo(beta / 2 / (1 + beta / 2), 12);
    expect(high).toBeCloseTo((2 * beta) / (1 + 2 * beta), 12);
  });
  it('returns a reason for a slope length beyond the 305 m the LS tables cover', () => {
    const r = tryRusleLS({ slopePct: 5, lengthM: 400 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/beyond the 305 m/);
  });
  it('throws on NaN with an exact message', () => {
    expect(() => rusleLS({ slopePct: NaN, lengthM: 20 })).toThrow('slopePct must be a finite number, got NaN');
  });
});

describe('USLE LS (AH-537 eq. 4)', () => {
  it('gives 0.672 at 6 % and 100 ft', () => {
    expect(usleLS({ slopePct: 6, lengthM: ftToM(100) }).ls).toBeCloseTo(0.672, 3); // AH-537 eq. 4 check
  });
  it('uses m 0.5, 0.4, 0.3, 0.2 by slope [memory; gaps closed downward]', () => {
    expect(usleLS({ slopePct: 5, lengthM: 50 }).m).toBe(0.5);
    expect(usleLS({ slopePct: 4, lengthM: 50 }).m).toBe(0.4);
    expect(usleLS({ slopePct: 4.7, lengthM: 50 }).m).toBe(0.4);
    expect(usleLS({ slopePct: 2, lengthM: 50 }).m).toBe(0.3);
    expect(usleLS({ slopePct: 0.5, lengthM: 50 }).m).toBe(0.2);
  });
});

describe('Desmet & Govers (1996) grid-cell L', () => {
  it('gives LS 0.414 for a ridge cell: D 10 m, no upslope area, 5 %', () => {
    const m = rusleLengthExponent(5);
    const l = desmetGoversL({ upslopeAreaM2: 0, cellSizeM: 10, flowDirFactor: 1, m });
    expect(l * rusleSlopeFactor(5)).toBeCloseTo(0.414, 3); // Desmet & Govers 1996: D 10 m, A_in 0, 5 % → 0.414
  });
  it('equals the 1-D segment formula exactly on a uniform plane (AH-703 eq. 4-6)', () => {
    const d = 10;
    const m = rusleLengthExponent(7);
    for (let i = 0; i < 30; i++) {
      const cell = desmetGoversL({ upslopeAreaM2: i * d * d, cellSizeM: d, flowDirFactor: 1, m });
      const seg = segmentL({ upperM: i * d, lowerM: (i + 1) * d, m });
      expect(Math.abs(cell - seg) / seg).toBeLessThan(1e-12);
    }
  });
  it('averages to the uniform-slope L over the whole plane (AH-703 eq. 4-1)', () => {
    const d = 5;
    const n = 12;
    const m = rusleLengthExponent(8);
    let sum = 0;
    for (let i = 0; i < n; i++) sum += desmetGoversL({ upslopeAreaM2: i * d * d, cellSizeM: d, flowDirFactor: 1, m });
    expect(sum / n).toBeCloseTo(rusleLS({ slopePct: 8, lengthM: n * d }).l, 12);
  });
  it('divides by x^m for diagonal flow, x = |sin α| + |cos α|', () => {
    const m = 0.5;
    const card = desmetGoversL({ upslopeAreaM2: 500, cellSizeM: 10, flowDirFactor: 1, m });
    const diag = desmetGoversL({ upslopeAreaM2: 500, cellSizeM: 10, flowDirFactor: Math.SQRT2, m });
    expect(card / diag).toBeCloseTo(Math.SQRT2 ** m, 12);
  });
  it('keeps the names and signatures the terrain pipeline imports from slope-length.ts', () => {
    expect(typeof dgFromModule).toBe('function');
    expect(sFromModule(5, 3)).toBeGreaterThan(0);
    expect(mFromModule(5)).toBeGreaterThan(0);
  });
});
