import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { curveNumberChoices, slopeClass, slopeClassesFromBreaks } from '../../../shared/erosion';

const dir = join(import.meta.dirname, '../../../data/reference');
const FLAGS = ['pub', 'memory', 'practice'];

/** Every object with a numeric value field or in a `rows` array, anywhere in the file. */
function rowsOf(node: unknown, out: Record<string, unknown>[] = []): Record<string, unknown>[] {
  if (Array.isArray(node)) node.forEach((n) => rowsOf(n, out));
  else if (node && typeof node === 'object') {
    const o = node as Record<string, unknown>;
    if (Array.isArray(o.rows)) out.push(...(o.rows as Record<string, unknown>[]));
    for (const v of Object.values(o)) if (v && typeof v === 'object') rowsOf(v, out);
  }
  return out;
}

describe('reference tables in data/reference', () => {
  const files = readdirSync(dir).filter((f) => f.endsWith('.json'));
  it('has the ten tables the engine reads', () => {
    expect(files.sort()).toEqual(
      ['contour-p.json', 'cover-c.json', 'curve-numbers.json', 'drainage-key.json', 'ei-distribution.json', 'example-prices.json', 'feel-key.json', 'k-by-texture.json', 'lime-smp.json', 'slope-classes.json'].sort(),
    );
  });
  it.each(files)('%s: every row carries a source and a pub/memory/practice flag', (file) => {
    const rows = rowsOf(JSON.parse(readFileSync(join(dir, file), 'utf8')));
    if (file !== 'drainage-key.json') expect(rows.length).toBeGreaterThan(0);
    for (const r of rows) {
      expect(typeof r.source, JSON.stringify(r)).toBe('string');
      expect(FLAGS, JSON.stringify(r)).toContain(r.flag);
    }
  });
  it('lists the CN table’s choices for a form', () => {
    expect(curveNumberChoices().length).toBeGreaterThan(40);
  });
});

describe('slope classes (SSM ch. 3) [memory]', () => {
  it.each([
    [1, 'nearly level'],
    [2, 'gently sloping'],
    [8, 'strongly sloping'],
    [15, 'moderately steep'],
    [20, 'steep'],
    [30, 'very steep'],
  ])('%s %% is %s with the default breaks 2, 6, 12, 18, 25', (s, name) => {
    expect(slopeClass(s).simple).toBe(name);
  });
  it('takes a farm’s own breaks', () => {
    const classes = slopeClassesFromBreaks([3, 8, 15, 25, 35]);
    expect(slopeClass(7, classes).simple).toBe('gently sloping');
    expect(slopeClass(7, classes).complex).toBe('undulating');
  });
});
