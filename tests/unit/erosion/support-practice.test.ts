import { describe, expect, it } from 'vitest';
import { supportPractice } from '../../../shared/erosion';

describe('support practice P (AH-537 [memory]; NRCS 330)', () => {
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
  it('gives strip cropping about half the contouring P [memory]', () => {
    const c = supportPractice({ practice: 'contouring', slopePct: 7, slopeLengthM: 30 });
    const s = supportPractice({ practice: 'strip cropping', slopePct: 7, slopeLengthM: 30 });
    expect(c.ok && s.ok && s.value.p / c.value.p).toBeCloseTo(0.5, 10);
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
