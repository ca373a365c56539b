import { describe, expect, it } from 'vitest';
import { ftToM, supportPractice } from '../../../shared/erosion';

describe('support practice P (AH-537 tables 13 and 14 [memory]; NRCS 330)', () => {
  it.each([
    [1.5, 0.6],
    [4, 0.5],
    [7, 0.5],
    [10, 0.6],
    [15, 0.7],
    [18, 0.8],
    [25, 0.9],
  ])('contouring at %s %% gives P %s within the length limit [memory]', (slopePct, p) => {
    const r = supportPractice({ practice: 'contouring', slopePct, slopeLengthM: 10 });
    expect(r).toMatchObject({ ok: true, value: { p, effective: true } });
  });
  it('says contouring loses its effect beyond the slope-length limit (6–8 %: 60 m) [memory]', () => {
    const ok = supportPractice({ practice: 'contouring', slopePct: 7, slopeLengthM: 60 });
    const lost = supportPractice({ practice: 'contouring', slopePct: 7, slopeLengthM: 61 });
    expect(ok).toMatchObject({ ok: true, value: { p: 0.5, effective: true, maxLengthM: 60 } });
    expect(lost).toMatchObject({ ok: true, value: { p: 1, effective: false } });
    if (lost.ok) expect(lost.value.notes.join(' ')).toMatch(/loses its effect/);
  });
  it('says contouring has no effect beyond 25 %', () => {
    expect(supportPractice({ practice: 'contouring', slopePct: 30, slopeLengthM: 10 })).toMatchObject({ ok: true, value: { p: 1, effective: false } });
  });
  it('notes that contour farming is most effective on 2–10 % slopes (NRCS 330)', () => {
    const r = supportPractice({ practice: 'contouring', slopePct: 15, slopeLengthM: 10 });
    expect(r.ok && r.value.notes.join(' ')).toMatch(/most effective on 2–10 %/);
  });
  // AH-537 table 14 (recalled, not re-read: check against the handbook): P by rotation A / B / C,
  // widest strip and longest slope in feet.
  it.each([
    [1.5, 0.3, 0.45, 0.6, 130, 800],
    [4, 0.25, 0.38, 0.5, 100, 600],
    [7, 0.25, 0.38, 0.5, 100, 400],
    [10, 0.3, 0.45, 0.6, 80, 240],
    [15, 0.35, 0.52, 0.7, 80, 160],
    [18, 0.4, 0.6, 0.8, 60, 120],
    [25, 0.45, 0.68, 0.9, 50, 100],
  ])('strip cropping at %s %% gives P %s / %s / %s for rotations A / B / C, strips up to %s ft, slopes up to %s ft (AH-537, table 14) [memory]', (slopePct, a, b, c, widthFt, lengthFt) => {
    const got = (['A', 'B', 'C'] as const).map((stripRotation) => {
      const r = supportPractice({ practice: 'strip cropping', slopePct, slopeLengthM: 10, stripRotation });
      if (!r.ok) throw new Error(r.reason);
      expect(r.value.maxStripWidthM).toBeCloseTo(ftToM(widthFt), 1);
      expect(r.value.maxLengthM).toBeCloseTo(ftToM(lengthFt), 1);
      expect(r.value.flag).toBe('memory');
      return r.value.p;
    });
    expect(got).toEqual([a, b, c]);
  });
  it('gives the least favourable rotation (C) the contouring P and the best (A) half of it (AH-537, tables 13 and 14) [memory]', () => {
    for (const slopePct of [1.5, 4, 7, 10, 15, 18, 25]) {
      const contour = supportPractice({ practice: 'contouring', slopePct, slopeLengthM: 10 });
      const a = supportPractice({ practice: 'strip cropping', slopePct, slopeLengthM: 10, stripRotation: 'A' });
      const c = supportPractice({ practice: 'strip cropping', slopePct, slopeLengthM: 10, stripRotation: 'C' });
      if (!contour.ok || !a.ok || !c.ok) throw new Error('failed');
      expect(c.value.p).toBe(contour.value.p);
      expect(a.value.p).toBeCloseTo(contour.value.p / 2, 10);
    }
  });
  it('fails strip cropping without its rotation, naming the choices in words', () => {
    const r = supportPractice({ practice: 'strip cropping', slopePct: 7, slopeLengthM: 30 });
    expect(r).toMatchObject({ ok: false });
    if (!r.ok) expect(r.reason).toMatch(/stripRotation is needed.*A \(4-year rotation.*C \(strips of row crop/);
  });
  it('warns when the strips are wider than the table allows, and loses the effect beyond its slope length (AH-537, table 14) [memory]', () => {
    const wide = supportPractice({ practice: 'strip cropping', slopePct: 10, slopeLengthM: 30, stripRotation: 'B', stripWidthM: 30 });
    const narrow = supportPractice({ practice: 'strip cropping', slopePct: 10, slopeLengthM: 30, stripRotation: 'B', stripWidthM: 24 });
    const long = supportPractice({ practice: 'strip cropping', slopePct: 10, slopeLengthM: 80, stripRotation: 'B' });
    expect(wide.ok && wide.value.stripWidthWarning).toMatch(/wider than the 24 m/); // 80 ft = 24.38 m, to the whole metre
    expect(narrow.ok && narrow.value.stripWidthWarning).toBeUndefined();
    expect(long).toMatchObject({ ok: true, value: { p: 1, effective: false } });
  });
  it('takes the terrace interval as the slope length and carries a design caution (AH-537)', () => {
    const r = supportPractice({ practice: 'terraces', slopePct: 8, slopeLengthM: 200, terraceIntervalM: 40 });
    expect(r).toMatchObject({ ok: true, value: { effectiveSlopeLengthM: 40, p: 0.5, effective: true } });
    expect(r.ok && r.value.cautions.join(' ')).toMatch(/qualified person/);
    expect(supportPractice({ practice: 'terraces', slopePct: 8, slopeLengthM: 200 })).toMatchObject({ ok: false });
  });
  it('gives P 1 with no practice', () => {
    expect(supportPractice({ practice: 'none', slopePct: 8, slopeLengthM: 200 })).toMatchObject({ ok: true, value: { p: 1 } });
  });
});
