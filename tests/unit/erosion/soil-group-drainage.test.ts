import { describe, expect, it } from 'vitest';
import { drainageVerdict, DRAINAGE_KEYS, hydrologicSoilGroup, soilGroupFromTexture } from '../../../shared/erosion';

describe('hydrologic soil group (NEH 630 ch. 7, Table 7-1)', () => {
  it('is D with an impermeable layer within 50 cm', () => {
    expect(hydrologicSoilGroup({ depthToImpermeableCm: 40, leastKsatUmPerS0to50: 100 })).toMatchObject({ ok: true, value: { hsg: 'D' } });
  });
  it.each([
    [50, 'A'],
    [40, 'B'],
    [11, 'B'],
    [10, 'C'],
    [2, 'C'],
    [1, 'D'],
  ])('with a layer at 50–100 cm, least Ksat %s µm/s in 0–50 cm gives %s', (ksat, g) => {
    expect(hydrologicSoilGroup({ depthToImpermeableCm: 80, leastKsatUmPerS0to50: ksat })).toMatchObject({ ok: true, value: { hsg: g } });
  });
  it.each([
    [11, 'A'],
    [10, 'B'],
    [4, 'C'],
    [0.5, 'C'],
    [0.4, 'D'],
  ])('with nothing within 100 cm, least Ksat %s µm/s in 0–100 cm gives %s', (ksat, g) => {
    expect(hydrologicSoilGroup({ leastKsatUmPerS0to100: ksat })).toMatchObject({ ok: true, value: { hsg: g } });
  });
  it('gives a dual group for a drainable water table within 60 cm, else D', () => {
    expect(hydrologicSoilGroup({ depthToWaterTableCm: 30, canBeDrained: true, leastKsatUmPerS0to100: 5 })).toMatchObject({ ok: true, value: { hsg: 'B/D' } });
    expect(hydrologicSoilGroup({ depthToWaterTableCm: 30, leastKsatUmPerS0to100: 5 })).toMatchObject({ ok: true, value: { hsg: 'D' } });
  });
  it('asks for the Ksat it needs', () => {
    expect(hydrologicSoilGroup({})).toMatchObject({ ok: false });
  });
  it('defaults from texture, taking the group with more runoff where two are given (common practice, no single source)', () => {
    expect(soilGroupFromTexture('sand').hsg).toBe('A');
    expect(soilGroupFromTexture('silt loam').hsg).toBe('B');
    expect(soilGroupFromTexture('sandy loam')).toMatchObject({ hsg: 'B', alternatives: ['A'], flag: 'practice' });
    expect(soilGroupFromTexture('clay').hsg).toBe('D');
  });
});

describe('drainage class from depth to gray (one state field key; SSM classes)', () => {
  it.each([
    [120, 'well drained', false],
    [100, 'well drained', false],
    [70, 'moderately well drained', false],
    [40, 'somewhat poorly drained', true],
    [15, 'poorly drained', true],
  ])('gray at %s cm: %s, notWorthAmending %s (key [pub]; verdict common practice)', (d, cls, nwa) => {
    expect(drainageVerdict({ depthToGrayCm: d })).toMatchObject({ ok: true, value: { drainageClass: cls, notWorthAmending: nwa } });
  });
  it('calls gray dominant near the surface very poorly drained and recommends beds, drainage or cover', () => {
    const r = drainageVerdict({ depthToGrayCm: 0, grayDominantNearSurface: true });
    expect(r).toMatchObject({ ok: true, value: { drainageClass: 'very poorly drained', notWorthAmending: true } });
    expect(r.ok && r.value.options).toEqual(['raised or no-dig beds', 'designed drainage', 'permanent cover']);
    expect(r.ok && r.value.recommendation).toMatch(/raised or no-dig beds/);
  });
  it('uses another key when given: 150 cm for well drained', () => {
    expect(drainageVerdict({ depthToGrayCm: 120 }, DRAINAGE_KEYS['gray-150'])).toMatchObject({ ok: true, value: { drainageClass: 'moderately well drained' } });
  });
  it('needs the depth looked at when no gray was seen', () => {
    expect(drainageVerdict({ depthToGrayCm: null })).toMatchObject({ ok: false });
    expect(drainageVerdict({ depthToGrayCm: null, describedToCm: 110 })).toMatchObject({ ok: true, value: { drainageClass: 'well drained' } });
  });
});
