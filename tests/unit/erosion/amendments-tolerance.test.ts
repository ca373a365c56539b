import { describe, expect, it } from 'vitest';
import {
  compostQuantity,
  gypsumQuantity,
  lossToToleranceRatio,
  sodicGypsumRequirement,
  soilLossTolerance,
} from '../../../shared/erosion';

describe('gypsum (NRCS practice standard 333)', () => {
  it('is rate × area, in tonnes and t/ha, with truckloads', () => {
    const q = gypsumQuantity({ areaHa: 12, rateTPerHa: 4, truckCapacityT: 25 });
    expect(q.tonnes).toBe(48);
    expect(q.tPerHa).toBe(4);
    expect(q.truckloads).toBe(2);
  });
  it('defaults to 1 t/ac (the 1–2 t/ac rule of thumb met with NRCS 333)', () => {
    expect(gypsumQuantity({ areaHa: 1 }).tonPerAc).toBeCloseTo(1, 10);
  });
  it('gives the sodic-soil requirement 0.0861·ΔNa·depth·BD (gypsum stoichiometry)', () => {
    // CEC 20, ESP 20 → 5: ΔNa 3 cmolc/kg; 15 cm; 1.3 Mg/m³
    expect(sodicGypsumRequirement({ cecCmolPerKg: 20, espInitialPct: 20, espTargetPct: 5, depthCm: 15, bulkDensityMgPerM3: 1.3 })).toBeCloseTo(0.0861 * 3 * 15 * 1.3, 10);
  });
});

describe('compost [memory]', () => {
  it('uses 25 t/ha to build and 7.5 t/ha/yr to maintain unless told', () => {
    expect(compostQuantity({ areaHa: 2, purpose: 'build' }).tonnes).toBe(50);
    expect(compostQuantity({ areaHa: 2, purpose: 'maintain' }).rangeTPerHa).toEqual([5, 10]);
  });
});

describe('soil-loss tolerance T (NSSH part 618)', () => {
  it('defaults to 5 t/ac/yr for a deep soil (common practice, no single source)', () => {
    expect(soilLossTolerance()).toMatchObject({ tonPerAcYr: 5, flag: 'practice' });
    expect(soilLossTolerance().tPerHaYr).toBeCloseTo(11.2085, 4);
  });
  it('lets the survey T win', () => {
    expect(soilLossTolerance({ surveyTTonPerAcYr: 3, rootingDepthCm: 200 }).tonPerAcYr).toBe(3);
  });
  it('falls with rooting depth [memory]', () => {
    expect(soilLossTolerance({ rootingDepthCm: 20 }).tonPerAcYr).toBe(1);
    expect(soilLossTolerance({ rootingDepthCm: 75 }).tonPerAcYr).toBe(3);
  });
  it('gives A/T', () => {
    expect(lossToToleranceRatio(22.417, 11.2085)).toBeCloseTo(2, 10);
  });
});
