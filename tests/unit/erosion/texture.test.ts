import { describe, expect, it } from 'vitest';
import {
  classifyTexture,
  renormalise,
  ribbonClass,
  TEXTURE_CLASSES,
  TEXTURE_RULES,
  textureByFeel,
  tryClassifyTexture,
  DEFAULT_FEEL_KEY,
  type FeelKey,
} from '../../../shared/erosion';

describe('texture class from sand, silt and clay (SSM ch. 3)', () => {
  it('classes 40 % sand, 40 % silt, 20 % clay as loam', () => {
    expect(classifyTexture({ sand: 40, silt: 40, clay: 20 })).toBe('loam'); // SSM ch. 3 texture triangle
  });

  it.each([
    [{ sand: 92, silt: 5, clay: 3 }, 'sand'],
    [{ sand: 82, silt: 12, clay: 6 }, 'loamy sand'],
    [{ sand: 65, silt: 25, clay: 10 }, 'sandy loam'],
    [{ sand: 20, silt: 65, clay: 15 }, 'silt loam'],
    [{ sand: 5, silt: 88, clay: 7 }, 'silt'],
    [{ sand: 60, silt: 13, clay: 27 }, 'sandy clay loam'],
    [{ sand: 33, silt: 34, clay: 33 }, 'clay loam'],
    [{ sand: 10, silt: 55, clay: 35 }, 'silty clay loam'],
    [{ sand: 52, silt: 6, clay: 42 }, 'sandy clay'],
    [{ sand: 5, silt: 50, clay: 45 }, 'silty clay'],
    [{ sand: 20, silt: 20, clay: 60 }, 'clay'],
  ])('classes %o as %s (SSM ch. 3 triangle)', (s, cls) => {
    expect(classifyTexture(s)).toBe(cls);
  });

  it('puts every point of a 0.5 % grid over the triangle in exactly one class', () => {
    // SSM ch. 3: the class inequalities partition the triangle
    let points = 0;
    const seen = new Set<string>();
    for (let clay2 = 0; clay2 <= 200; clay2++) {
      for (let silt2 = 0; silt2 <= 200 - clay2; silt2++) {
        const clay = clay2 / 2;
        const silt = silt2 / 2;
        const s = { sand: 100 - clay - silt, silt, clay };
        const hits = TEXTURE_CLASSES.filter((c) => TEXTURE_RULES[c](s));
        if (hits.length !== 1) throw new Error(`${JSON.stringify(s)} falls in ${hits.length} classes: ${hits.join(', ')}`);
        seen.add(hits[0]);
        points++;
      }
    }
    expect(points).toBe((201 * 202) / 2);
    expect(seen.size).toBe(12);
  });

  it('renormalises fractions that do not sum to 100 % before classing', () => {
    const n = renormalise({ sand: 30, silt: 30, clay: 15 });
    expect(n.sand + n.silt + n.clay).toBeCloseTo(100, 10);
    expect(classifyTexture({ sand: 30, silt: 30, clay: 15 })).toBe('loam');
  });

  it('returns a reason, not a throw, for lab numbers that do not add up to about 100 %', () => {
    const r = tryClassifyTexture({ sand: 40, silt: 30, clay: 10 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/add up to 80 %/);
    expect(tryClassifyTexture({ sand: 40, silt: 41, clay: 20 }).ok).toBe(true);
  });

  it('throws on misuse with an exact message', () => {
    expect(() => classifyTexture({ sand: NaN, silt: 40, clay: 20 })).toThrow('sand must be a finite number, got NaN');
    expect(() => classifyTexture({ sand: 0, silt: 0, clay: 0 })).toThrow('sand + silt + clay must be > 0');
  });
});

describe('texture by feel (Thien 1979)', () => {
  it('calls soil that will not ball sand, and soil that balls without a ribbon loamy sand', () => {
    expect(textureByFeel({ balls: false })).toMatchObject({ ok: true, value: { textureClass: 'sand' } });
    expect(textureByFeel({ balls: true, ribbonCm: 0 })).toMatchObject({ ok: true, value: { textureClass: 'loamy sand' } });
  });

  it.each([
    [1.5, 'very gritty', 'sandy loam'],
    [1.5, 'very smooth', 'silt loam'],
    [1.5, 'neither', 'loam'],
    [3.5, 'very gritty', 'sandy clay loam'],
    [3.5, 'very smooth', 'silty clay loam'],
    [3.5, 'neither', 'clay loam'],
    [6, 'very gritty', 'sandy clay'],
    [6, 'very smooth', 'silty clay'],
    [6, 'neither', 'clay'],
  ] as const)('a %s cm ribbon feeling %s is %s (Thien 1979 key)', (ribbonCm, feel, cls) => {
    expect(textureByFeel({ balls: true, ribbonCm, feel })).toMatchObject({ ok: true, value: { textureClass: cls } });
  });

  it('uses 2.5 cm and 5 cm as the default ribbon thresholds (Thien 1979)', () => {
    expect(ribbonClass(2.49)).toBe('weak');
    expect(ribbonClass(2.5)).toBe('medium');
    expect(ribbonClass(5)).toBe('medium');
    expect(ribbonClass(5.01)).toBe('strong');
  });

  it('accepts another key with other ribbon thresholds', () => {
    const key: FeelKey = { ...DEFAULT_FEEL_KEY, ribbonThresholdsCm: { weakBelowCm: 2, strongAboveCm: 4 } };
    expect(ribbonClass(2.2, key)).toBe('medium');
    expect(textureByFeel({ balls: true, ribbonCm: 4.5, feel: 'neither' }, key)).toMatchObject({ ok: true, value: { textureClass: 'clay' } });
  });

  it('asks for the feel when the soil ribbons', () => {
    const r = textureByFeel({ balls: true, ribbonCm: 3 });
    expect(r).toMatchObject({ ok: false });
  });
});
