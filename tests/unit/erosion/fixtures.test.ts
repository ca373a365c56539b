// Fixture tests: each tests/unit/erosion/fixtures/*.json holds an estimate input and the expected
// figures. REGEN=1 rewrites `expected` from the engine for review (then check the diff by hand).
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { estimate } from '../../../shared/erosion';
import type { EstimateResult } from '../../../shared/schemas/estimate';

const dir = join(import.meta.dirname, 'fixtures');
type Summary = Record<string, number | string | boolean | null>;

/** The figures a fixture pins down. */
function summarise(r: EstimateResult): Summary {
  if (!r.ok) return { ok: false, field: r.field ?? null, reason: r.reason };
  const s: Summary = { ok: true };
  for (const [k, f] of Object.entries(r.factors)) s[k] = f.value;
  s.soilLossTPerHaYr = r.soilLoss.tPerHaYr;
  s.soilLossTonPerAcYr = r.soilLoss.tonPerAcYr;
  s.aOverT = r.aOverT;
  if (r.textureClass) s.textureClass = r.textureClass;
  if (r.runoff) {
    s.cn = r.runoff.cn.value;
    s.runoffMm = r.runoff.runoffMm;
    if (r.runoff.volumeM3 !== undefined) s.runoffVolumeM3 = r.runoff.volumeM3;
  }
  return s;
}

const files = readdirSync(dir).filter((f) => f.endsWith('.json')).sort();

describe('estimate fixtures (tests/unit/erosion/fixtures)', () => {
  it('has fixtures to run', () => {
    expect(files.length).toBeGreaterThanOrEqual(4);
  });
  for (const file of files) {
    const fx = JSON.parse(readFileSync(join(dir, file), 'utf8')) as { description: string; source: string; input: unknown; expected: Summary | null };
    it(`${file}: ${fx.description} (${fx.source})`, () => {
      const got = summarise(estimate(fx.input));
      if (process.env.REGEN === '1' || fx.expected === null) {
        writeFileSync(join(dir, file), JSON.stringify({ ...fx, expected: got }, null, 2) + '\n');
        if (process.env.REGEN !== '1') throw new Error(`${file} had no expected values; they were written for review`);
        return;
      }
      expect(Object.keys(got).sort()).toEqual(Object.keys(fx.expected).sort());
      for (const [k, v] of Object.entries(fx.expected)) {
        if (typeof v === 'number') expect(got[k] as number, k).toBeCloseTo(v, 9);
        else expect(got[k], k).toEqual(v);
      }
    });
  }
});
