import { describe, expect, it } from 'vitest';
import {
  rFromAnnualPrecipitation,
  rFromAnnualPrecipitationChecked,
  rFromBreakpointRecord,
  rFromValue,
  stormsFromBreakpoints,
  unitEnergy,
  type Breakpoint,
} from '../../../shared/erosion';

describe('R from mean annual precipitation (Renard & Freimund 1994) [memory]', () => {
  it('gives 3473.8 MJ·mm/(ha·h·yr) at 1000 mm', () => {
    expect(rFromAnnualPrecipitation(1000)).toBeCloseTo(3473.8, 6);
  });
  it('joins its two branches within about 0.15 % at 850 mm (0.152 % by these coefficients)', () => {
    const below = 0.0483 * 850 ** 1.61;
    const above = rFromAnnualPrecipitation(850);
    expect(Math.abs(above - below) / above).toBeLessThan(0.0016);
    expect(Math.abs(rFromAnnualPrecipitation(849.999) - below) / below).toBeLessThan(1e-5);
  });
  it('rises with precipitation', () => {
    let last = 0;
    for (let p = 100; p <= 3000; p += 50) {
      const r = rFromAnnualPrecipitation(p);
      expect(r).toBeGreaterThan(last);
      last = r;
    }
  });
  // The fitted range (about 200–1700 mm of the conterminous US stations) is recalled, not re-read in the paper.
  it.each([200, 850, 1000, 1700])('finds %s mm inside the range the regression was fitted to [memory]', (mm) => {
    expect(rFromAnnualPrecipitationChecked(mm)).toEqual({ r: rFromAnnualPrecipitation(mm), withinFittedRange: true });
  });
  it.each([
    [150, 'below'],
    [1800, 'above'],
    [4000, 'above'],
  ])('warns at %s mm, %s the fitted range, naming winter-rain climates and the local R [memory]', (mm, side) => {
    const c = rFromAnnualPrecipitationChecked(mm);
    expect(c.r).toBe(rFromAnnualPrecipitation(mm));
    expect(c.withinFittedRange).toBe(false);
    expect(c.warning).toMatch(new RegExp(`${side} the 200–1700 mm`));
    expect(c.warning).toMatch(/winter-rain/);
    expect(c.warning).toMatch(/local R/);
  });
  it('converts a typed US R to SI (17.02, AH-703)', () => {
    expect(rFromValue(100, 'us')).toBeCloseTo(1702, 10);
  });
});

describe('storm EI30 from a breakpoint record (AH-703 ch. 2; Brown & Foster 1987)', () => {
  it('uses the unit energy e = 0.29 [1 − 0.72 exp(−0.05 i)]', () => {
    expect(unitEnergy(0)).toBeCloseTo(0.29 * 0.28, 12);
    expect(unitEnergy(50)).toBeCloseTo(0.29 * (1 - 0.72 * Math.exp(-2.5)), 12);
  });
  it('computes E and I30 for a simple two-interval storm', () => {
    // 10 mm in the first 30 min (20 mm/h), 10 mm in the next 60 min (10 mm/h)
    const rec: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 30, cumulativeMm: 10 },
      { timeMin: 90, cumulativeMm: 20 },
    ];
    const s = stormsFromBreakpoints(rec);
    expect(s.ok && s.value.length).toBe(1);
    if (!s.ok) return;
    const e = unitEnergy(20) * 10 + unitEnergy(10) * 10;
    expect(s.value[0].energyMjPerHa).toBeCloseTo(e, 12);
    expect(s.value[0].i30MmPerH).toBeCloseTo(20, 12);
    expect(s.value[0].ei30).toBeCloseTo(e * 20, 10);
  });
  it('takes I30 as twice the largest 30-minute depth, not one 15-minute burst', () => {
    // a 15-min burst of 10 mm (40 mm/h) then 15 min of 2 mm: the largest 30-min depth is 12 mm → I30 24 mm/h
    const rec: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 15, cumulativeMm: 10 },
      { timeMin: 30, cumulativeMm: 12 },
      { timeMin: 120, cumulativeMm: 15 },
    ];
    const s = stormsFromBreakpoints(rec);
    expect(s.ok && s.value[0].i30MmPerH).toBeCloseTo(24, 10);
  });
  it('leaves out storms under 12.7 mm unless 6.35 mm fell in 15 minutes [memory]', () => {
    const small: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 120, cumulativeMm: 10 },
    ];
    const burst: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 15, cumulativeMm: 7 },
      { timeMin: 60, cumulativeMm: 8 },
    ];
    expect(stormsFromBreakpoints(small)).toMatchObject({ ok: true, value: [{ erosive: false }] });
    expect(stormsFromBreakpoints(burst)).toMatchObject({ ok: true, value: [{ erosive: true, depthMm: 8 }] });
  });
  it('splits storms separated by 6 h with less than 1.27 mm [memory]', () => {
    const rec: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 60, cumulativeMm: 15 },
      { timeMin: 60 + 7 * 60, cumulativeMm: 15 },
      { timeMin: 60 + 8 * 60, cumulativeMm: 30 },
    ];
    const s = stormsFromBreakpoints(rec);
    expect(s.ok && s.value.length).toBe(2);
    const joined: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 60, cumulativeMm: 15 },
      { timeMin: 60 + 5 * 60, cumulativeMm: 15 },
      { timeMin: 60 + 6 * 60, cumulativeMm: 30 },
    ];
    expect(stormsFromBreakpoints(joined)).toMatchObject({ ok: true, value: [{ depthMm: 30 }] });
  });
  it('keeps trailing drizzle within 6 h with its storm and splits at rain after a drizzly 6 h', () => {
    const rec: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 60, cumulativeMm: 20 },
      { timeMin: 120, cumulativeMm: 21 },
      { timeMin: 60 + 7 * 60, cumulativeMm: 21 },
      { timeMin: 60 + 8 * 60, cumulativeMm: 40 },
    ];
    expect(stormsFromBreakpoints(rec)).toMatchObject({ ok: true, value: [{ depthMm: 21 }, { depthMm: 19 }] });
  });
  it('averages erosive storms’ EI30 over the years of record', () => {
    const rec: Breakpoint[] = [
      { timeMin: 0, cumulativeMm: 0 },
      { timeMin: 60, cumulativeMm: 20 },
      { timeMin: 2000, cumulativeMm: 20 },
      { timeMin: 2060, cumulativeMm: 40 },
    ];
    const r = rFromBreakpointRecord(rec, 2);
    if (!r.ok) throw new Error(r.reason);
    expect(r.value.erosiveStorms).toBe(2);
    expect(r.value.r).toBeCloseTo((r.value.storms[0].ei30 + r.value.storms[1].ei30) / 2, 10);
  });
  it('returns a reason for a record whose times go backwards', () => {
    expect(stormsFromBreakpoints([{ timeMin: 10, cumulativeMm: 0 }, { timeMin: 5, cumulativeMm: 3 }])).toMatchObject({ ok: false });
  });
});
