import { describe, expect, it } from 'vitest';
import {
  antecedentCurveNumber,
  compositeCurveNumber,
  curveNumberFromTable,
  curveNumberRunoff,
  DEFAULT_CN_TABLE,
  effectiveGroup,
  inToMm,
  mmToIn,
  runoffVolumeM3,
} from '../../../shared/erosion';

const qIn = (pIn: number, cn: number) => mmToIn(curveNumberRunoff({ rainfallMm: inToMm(pIn), cn }));

describe('SCS curve-number runoff (TR-55 ch. 2)', () => {
  it('gives 2.89 in from 5 in of rain at CN 80 (TR-55 Table 2-1)', () => {
    expect(qIn(5, 80).toFixed(2)).toBe('2.89');
  });
  it.each([
    [1, 98, '0.79'],
    [2, 80, '0.56'],
    [3, 80, '1.25'],
    [4, 80, '2.04'],
    [3, 90, '1.98'],
    [6, 70, '2.81'],
    [4, 60, '0.76'],
  ])('reproduces TR-55 Table 2-1 at P %s in, CN %s: %s in [memory for the cell values]', (p, cn, q) => {
    expect(qIn(p, cn).toFixed(2)).toBe(q);
  });
  it('gives 1.667 in at P 7 in, CN 50, where the table prints 1.68 (TR-55 Table 2-1 exception)', () => {
    expect(qIn(7, 50)).toBeCloseTo(1.667, 3);
  });
  it('gives no runoff until rainfall passes Ia = 0.2 S', () => {
    const s = 25400 / 75 - 254;
    expect(curveNumberRunoff({ rainfallMm: 0.2 * s, cn: 75 })).toBe(0);
    expect(curveNumberRunoff({ rainfallMm: 0.2 * s + 1, cn: 75 })).toBeGreaterThan(0);
  });
  it('turns all rain to runoff at CN 100', () => {
    expect(curveNumberRunoff({ rainfallMm: 50, cn: 100 })).toBeCloseTo(50, 12);
  });
  it('throws on a curve number outside (0, 100]', () => {
    expect(() => curveNumberRunoff({ rainfallMm: 50, cn: 120 })).toThrow('cn must be in (0, 100], got 120');
    expect(() => curveNumberRunoff({ rainfallMm: NaN, cn: 80 })).toThrow('rainfallMm must be a finite number, got NaN');
  });
  it('gives the runoff volume in m³: 1 mm on 1 ha is 10 m³', () => {
    expect(runoffVolumeM3(25, 4)).toBe(1000);
  });
});

describe('curve numbers from TR-55 Tables 2-2b and 2-2c', () => {
  const cn = (cover: string, treatment: string | null, condition: string | null) =>
    (['A', 'B', 'C', 'D'] as const).map((hsg) => {
      const r = curveNumberFromTable({ cover, treatment, condition, hsg });
      if (!r.ok) throw new Error(r.reason);
      return r.value.cn;
    });
  it.each([
    ['fallow', 'bare soil', null, [77, 86, 91, 94]],
    ['row crops', 'straight row', 'poor', [72, 81, 88, 91]],
    ['row crops', 'straight row', 'good', [67, 78, 85, 89]],
    ['row crops', 'contoured', 'poor', [70, 79, 84, 88]],
    ['row crops', 'contoured', 'good', [65, 75, 82, 86]],
    ['row crops', 'contoured and terraced', 'good', [62, 71, 78, 81]],
    ['small grain', 'straight row', 'good', [63, 75, 83, 87]],
    ['close-seeded legumes or rotation meadow', 'straight row', 'good', [58, 72, 81, 85]],
    ['pasture', null, 'good', [39, 61, 74, 80]],
    ['pasture', null, 'fair', [49, 69, 79, 84]],
    ['pasture', null, 'poor', [68, 79, 86, 89]],
    ['meadow', null, null, [30, 58, 71, 78]],
    ['woods', null, 'good', [30, 55, 70, 77]],
  ] as const)('%s, %s, %s has CN A/B/C/D %j (TR-55 Table 2-2b/2-2c)', (cover, treatment, condition, expected) => {
    expect(cn(cover, treatment, condition)).toEqual(expected);
  });
  it('carries a source and a pub/memory flag on every row', () => {
    for (const row of DEFAULT_CN_TABLE.rows) {
      expect(row.source).toMatch(/TR-55/);
      expect(['pub', 'memory']).toContain(row.flag);
      expect(row.cn.A).toBeLessThanOrEqual(row.cn.D);
    }
  });
  // NEH 630 ch. 7: dual groups A/D, B/D, C/D — the first letter for a soil adequately drained (seasonal
  // high water table kept at least 60 cm down [memory for the wording]), D otherwise.
  const rowCrops = { cover: 'row crops', treatment: 'straight row', condition: 'good', hsg: 'B/D' } as const;
  it('takes the first letter of a dual group when drained to 60 cm or deeper (NEH 630 ch. 7; CN from TR-55 Table 2-2b)', () => {
    const deep = curveNumberFromTable({ ...rowCrops, drained: true, drainedWaterTableDepthCm: 90 });
    const atLimit = curveNumberFromTable({ ...rowCrops, drained: true, drainedWaterTableDepthCm: 60 });
    expect(deep.ok && deep.value).toMatchObject({ cn: 78, group: 'B' });
    expect(atLimit.ok && atLimit.value).toMatchObject({ cn: 78, group: 'B' });
  });
  it('takes D for a dual group that is undrained, drained to under 60 cm, or drained to a depth not given (NEH 630 ch. 7)', () => {
    for (const drainage of [{}, { drained: true, drainedWaterTableDepthCm: 59 }, { drained: true }, { drained: false, drainedWaterTableDepthCm: 90 }]) {
      const r = curveNumberFromTable({ ...rowCrops, ...drainage });
      expect(r.ok && r.value, JSON.stringify(drainage)).toMatchObject({ cn: 89, group: 'D' });
    }
  });
  it('leaves a single group alone whatever the drainage (NEH 630 ch. 7)', () => {
    expect(effectiveGroup('C', { drained: true })).toBe('C');
    expect(effectiveGroup('A', {})).toBe('A');
    expect(effectiveGroup('C/D', { drained: true, drainedWaterTableDepthCm: 75 })).toBe('C');
  });
  it('names the choices for an unknown condition', () => {
    const r = curveNumberFromTable({ cover: 'pasture', condition: 'excellent', hsg: 'B' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/poor, fair, good/);
  });
  it('weights a composite CN by area (TR-55 ch. 2)', () => {
    expect(compositeCurveNumber([{ cn: 80, areaHa: 3 }, { cn: 60, areaHa: 1 }])).toBe(75);
  });
});

describe('antecedent runoff condition (Hawkins et al. 1985 form)', () => {
  it('lowers CN for dry (I) and raises it for wet (III) conditions', () => {
    expect(antecedentCurveNumber(80, 'I')).toBeCloseTo(80 / (2.281 - 0.01281 * 80), 12);
    expect(antecedentCurveNumber(80, 'III')).toBeCloseTo(80 / (0.427 + 0.00573 * 80), 12);
    expect(antecedentCurveNumber(80, 'I')).toBeLessThan(80);
    expect(antecedentCurveNumber(80, 'III')).toBeGreaterThan(80);
    expect(antecedentCurveNumber(80, 'II')).toBe(80);
  });
});
