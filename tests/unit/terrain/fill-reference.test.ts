import { describe, expect, it } from 'vitest';
import { fillDepressions } from '../../../server/services/terrain/fill-depressions';
import { MonotoneCellQueue, orderedKey } from '../../../server/services/terrain/radix-queue';
import { seededRandom } from './helpers';

// The fill's reference is the plain Priority-Flood+ε (Barnes, Lehman & Mulla 2014, Alg. 3, our
// own code before the slope cells skipped the heap), kept here verbatim with its binary heap, and
// the exact filled surface without ε (Barnes et al. 2014, Alg. 1). With ε the result depends on
// the order equal elevations are met, so the fill is checked against them "within ε handling":
// never below the exact surface, at most as many Float32 steps above it as the plain version
// goes on the same grid, and every cell draining to an edge along a strictly falling path.

class ReferenceHeap {
  private keys: Float32Array;
  private cells: Int32Array;
  size = 0;
  constructor(initialCapacity = 1024) {
    this.keys = new Float32Array(Math.max(16, initialCapacity));
    this.cells = new Int32Array(Math.max(16, initialCapacity));
  }
  push(cell: number, key: number): void {
    if (this.size === this.keys.length) {
      const keys = new Float32Array(this.keys.length * 2);
      keys.set(this.keys);
      const cells = new Int32Array(this.cells.length * 2);
      cells.set(this.cells);
      this.keys = keys;
      this.cells = cells;
    }
    const keys = this.keys, cells = this.cells;
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      const pk = keys[parent];
      if (pk <= key) break;
      keys[i] = pk;
      cells[i] = cells[parent];
      i = parent;
    }
    keys[i] = key;
    cells[i] = cell;
  }
  pop(): number {
    const keys = this.keys, cells = this.cells;
    const top = cells[0];
    const n = --this.size;
    if (n === 0) return top;
    const key = keys[n], cell = cells[n];
    let i = 0;
    const half = n >> 1;
    while (i < half) {
      let child = 2 * i + 1;
      let ck = keys[child];
      const right = child + 1;
      if (right < n && keys[right] < ck) {
        child = right;
        ck = keys[right];
      }
      if (ck >= key) break;
      keys[i] = ck;
      cells[i] = cells[child];
      i = child;
    }
    keys[i] = key;
    cells[i] = cell;
    return top;
  }
}

const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);
function referenceNextUp(x: number): number {
  f32[0] = x;
  const v = f32[0];
  if (v === 0) return 1.401298464324817e-45;
  if (v > 0) i32[0] += 1;
  else i32[0] -= 1;
  return f32[0];
}

function referenceFill(elevationM: Float32Array, width: number, height: number): Float32Array {
  const n = width * height;
  const z = elevationM.slice();
  const closed = new Uint8Array(n);
  const open = new ReferenceHeap(4 * (width + height));
  let pit = new Int32Array(1024);
  let pitHead = 0, pitTail = 0, pitCount = 0;
  const pushPit = (cell: number): void => {
    if (pitCount === pit.length) {
      const bigger = new Int32Array(pit.length * 2);
      for (let k = 0; k < pitCount; k++) bigger[k] = pit[(pitHead + k) % pit.length];
      pit = bigger;
      pitHead = 0;
      pitTail = pitCount;
    }
    pit[pitTail] = cell;
    pitTail = pitTail + 1 === pit.length ? 0 : pitTail + 1;
    pitCount++;
  };
  let nodataCells = 0;
  for (let i = 0; i < n; i++) if (z[i] !== z[i]) { closed[i] = 1; nodataCells++; }
  for (let r = 0; r < height; r++) {
    const inner = nodataCells === 0 && r > 0 && r < height - 1;
    for (let c = 0; c < width; c = inner && c === 0 ? width - 1 : c + 1) {
      const i = r * width + c;
      if (closed[i]) continue;
      let seed = r === 0 || c === 0 || r === height - 1 || c === width - 1;
      if (!seed) {
        for (let dr = -1; dr <= 1 && !seed; dr++) {
          for (let dc = -1; dc <= 1; dc++) {
            const v = z[i + dr * width + dc];
            if (v !== v) { seed = true; break; }
          }
        }
      }
      if (seed) {
        closed[i] = 1;
        open.push(i, z[i]);
      }
    }
  }
  const offsets = [-width - 1, -width, -width + 1, -1, 1, width - 1, width, width + 1];
  const dRow = [-1, -1, -1, 0, 0, 1, 1, 1];
  const dCol = [-1, 0, 1, -1, 1, -1, 0, 1];
  while (pitCount > 0 || open.size > 0) {
    let c: number;
    if (pitCount > 0) {
      c = pit[pitHead];
      pitHead = pitHead + 1 === pit.length ? 0 : pitHead + 1;
      pitCount--;
    } else c = open.pop();
    const zc = z[c];
    const floor = referenceNextUp(zc);
    const row = (c / width) | 0;
    const col = c - row * width;
    const interior = row > 0 && col > 0 && row < height - 1 && col < width - 1;
    for (let k = 0; k < 8; k++) {
      if (!interior) {
        const rr = row + dRow[k], cc = col + dCol[k];
        if (rr < 0 || cc < 0 || rr >= height || cc >= width) continue;
      }
      const nb = c + offsets[k];
      if (closed[nb]) continue;
      closed[nb] = 1;
      if (z[nb] <= floor) {
        z[nb] = floor;
        pushPit(nb);
      } else open.push(nb, z[nb]);
    }
  }
  return z;
}

/** The exact filled surface, no ε (Barnes et al. 2014, Alg. 1): flats stay flat. */
function exactFill(elevationM: Float32Array, width: number, height: number): Float32Array {
  const z = elevationM.slice();
  const closed = new Uint8Array(width * height);
  const open = new ReferenceHeap();
  for (let i = 0; i < z.length; i++) if (z[i] !== z[i]) closed[i] = 1;
  for (let i = 0; i < z.length; i++) {
    if (closed[i]) continue;
    const r = (i / width) | 0, c = i - r * width;
    let seed = r === 0 || c === 0 || r === height - 1 || c === width - 1;
    for (let dr = -1; dr <= 1 && !seed; dr++) for (let dc = -1; dc <= 1; dc++) if (Number.isNaN(z[i + dr * width + dc])) seed = true;
    if (seed) { closed[i] = 1; open.push(i, z[i]); }
  }
  while (open.size > 0) {
    const c = open.pop();
    const r = (c / width) | 0, col = c - r * width;
    for (let dr = -1; dr <= 1; dr++) {
      for (let dc = -1; dc <= 1; dc++) {
        const rr = r + dr, cc = col + dc;
        if (rr < 0 || cc < 0 || rr >= height || cc >= width) continue;
        const nb = rr * width + cc;
        if (closed[nb]) continue;
        closed[nb] = 1;
        if (z[nb] < z[c]) z[nb] = z[c];
        open.push(nb, z[nb]);
      }
    }
  }
  return z;
}

/** Float32 steps from a up to b (negative when b is below a); both finite. */
function stepsAbove(a: number, b: number): number {
  const bits = new Int32Array(new Float32Array([a, b]).buffer);
  const ordered = (x: number) => (x >= 0 ? x : -(x & 0x7fffffff));
  return ordered(bits[1]) - ordered(bits[0]);
}

/** Most Float32 steps any cell of `filled` lies above `exact`; -1 if one lies below it. */
function maxStepsAbove(filled: Float32Array, exact: Float32Array): number {
  let most = 0;
  for (let i = 0; i < exact.length; i++) {
    if (Number.isNaN(exact[i])) continue;
    const s = stepsAbove(exact[i], filled[i]);
    if (s < 0) return -1;
    if (s > most) most = s;
  }
  return most;
}

/** Valid cells with no strictly lower neighbour that are neither on the border nor next to nodata. */
function cellsThatDoNotDrain(z: Float32Array, width: number, height: number): number {
  let stuck = 0;
  for (let r = 1; r < height - 1; r++) {
    for (let c = 1; c < width - 1; c++) {
      const i = r * width + c;
      if (Number.isNaN(z[i])) continue;
      let drains = false;
      for (let dr = -1; dr <= 1 && !drains; dr++) for (let dc = -1; dc <= 1; dc++) {
        const v = z[i + dr * width + dc];
        if (Number.isNaN(v) || v < z[i]) { drains = true; break; }
      }
      if (!drains) stuck++;
    }
  }
  return stuck;
}

/** Cells whose Float32 bits differ (NaN payloads included). */
function differingCells(a: Float32Array, b: Float32Array): number {
  const ai = new Int32Array(a.buffer, a.byteOffset, a.length), bi = new Int32Array(b.buffer, b.byteOffset, b.length);
  let d = 0;
  for (let i = 0; i < ai.length; i++) if (ai[i] !== bi[i]) d++;
  return d;
}

function grid(w: number, h: number, f: (r: number, c: number) => number): Float32Array {
  const z = new Float32Array(w * h);
  for (let r = 0; r < h; r++) for (let c = 0; c < w; c++) z[r * w + c] = f(r, c);
  return z;
}

const W = 230, H = 170;
const rnd = seededRandom(7);
const hills = (r: number, c: number): number => 300 + 20 * Math.sin(c / 23) * Math.cos(r / 29) + 5 * Math.sin((c + r) / 9) - 0.03 * r;
const dems: Array<[string, Float32Array]> = [
  ['white noise', grid(W, H, () => rnd() * 10)],
  ['hills with noise pits', grid(W, H, (r, c) => hills(r, c) + rnd() * 0.5)],
  ['hills with deep one-cell pits', grid(W, H, (r, c) => hills(r, c) - (rnd() < 0.02 ? 5 + rnd() * 20 : 0))],
  // A plain and a lake bed at exactly one value, touching the border: many equal keys leave the
  // heap together, so their order decides which flat cells get which ε steps.
  ['large flats touching the border', grid(W, H, (r, c) => (c < 90 ? 120 : r > 60 && r < 130 && c > 130 && c < 210 ? 118 : 120 + 0.02 * (c - 90) + rnd() * 0.3))],
  ['elevations quantised to 0.1 m (ties everywhere)', grid(W, H, (r, c) => Math.round((hills(r, c) + rnd() * 2) * 10) / 10)],
  ['nodata holes and a nodata margin', grid(W, H, (r, c) => {
    if (c < 3 || (r - 80) ** 2 + (c - 60) ** 2 < 300 || (r > 20 && r < 40 && c > 150 && c < 200) || rnd() < 0.01) return NaN;
    return hills(r, c) + rnd() * 0.5;
  })],
  ['a cliff across the grid', grid(W, H, (r, c) => (r > 85 ? 60 : 0) + 250 + 0.01 * c + rnd() * 0.4)],
  ['negative, zero and sub-zero flats (sea level)', grid(W, H, (r, c) => (c < 40 ? 0 : c < 70 ? -0 : -3 + 0.05 * c + 4 * Math.sin(r / 13) + (rnd() < 0.5 ? 0 : rnd())))],
];

describe('faster Priority-Flood+ε fill, the plain one\'s surface within ε handling', () => {
  for (const [name, dem] of dems) {
    it(`fills to the exact surface plus ε steps no larger than the plain version's, and every cell drains: ${name}`, () => {
      const before = dem.slice();
      const exact = exactFill(dem, W, H);
      const ref = referenceFill(dem, W, H);
      const out = fillDepressions(dem, W, H);
      expect(differingCells(dem, before)).toBe(0); // the input is untouched
      const refSteps = maxStepsAbove(ref, exact);
      const outSteps = maxStepsAbove(out, exact);
      expect(refSteps).toBeGreaterThanOrEqual(0);
      expect(outSteps).toBeGreaterThanOrEqual(0); // never below the exact filled surface
      expect(outSteps).toBeLessThanOrEqual(refSteps);
      expect(cellsThatDoNotDrain(ref, W, H)).toBe(0);
      expect(cellsThatDoNotDrain(out, W, H)).toBe(0);
      // in place, with a dirty closed-flag scratch grid, as runTerrain calls it: the same grid
      const work = dem.slice();
      const scratch = new Uint8Array(W * H).fill(7);
      fillDepressions(work, W, H, { inPlace: true, closedScratch: scratch });
      expect(differingCells(work, out)).toBe(0);
      expect(scratch.every((v) => v === 1)).toBe(true);
    });
  }

  it('gives the same surface within ε handling on one-row and tiny grids', () => {
    for (const [w, h] of [[1, 1], [1, 2], [9, 1], [2, 2], [3, 3], [4, 7]]) {
      const z = grid(w, h, () => Math.round(rnd() * 4));
      const exact = exactFill(z, w, h);
      const out = fillDepressions(z, w, h);
      expect(maxStepsAbove(out, exact)).toBeGreaterThanOrEqual(0);
      expect(maxStepsAbove(out, exact)).toBeLessThanOrEqual(Math.max(0, maxStepsAbove(referenceFill(z, w, h), exact)));
      expect(cellsThatDoNotDrain(out, w, h)).toBe(0);
    }
  });
});

describe('Priority-Flood+ε on one-column grids', () => {
  // The plain implementation never finished on these (its seed loop jumped from column 0 to
  // column width − 1 = 0); every cell is on the border, so nothing is raised.
  it('finishes on a one-column grid and leaves every cell as it was', () => {
    const z = grid(1, 9, () => Math.round(rnd() * 4));
    expect(differingCells(fillDepressions(z, 1, 9), z)).toBe(0);
  });
});

// More surfaces for the radix-heap fill, each checked the same way as above against the plain
// Priority-Flood+ε (Barnes et al. 2014, Alg. 3) and the exact fill (Alg. 1).
describe('radix-heap fill on benchmark-like terrain, noise, sea-level ground and nodata', () => {
  const w = 260, h = 210;
  const more = seededRandom(11);
  // The timing benchmark's shape (rolling hills, a gentle fall to the south and 0.4 m of noise
  // on 5 m cells), on a small grid: half the cells sit in noise hollows or on their rims.
  const benchmarkLike = grid(w, h, (r, c) => 300 + 25 * Math.sin(c / 140) * Math.cos(r / 170) + 8 * Math.sin((c + r) / 45) - 0.01 * r + more() * 0.4);
  const cases: Array<[string, Float32Array]> = [
    ['benchmark-like rolling hills with 0.4 m noise', benchmarkLike],
    ['white noise between 0 and 1 m', grid(w, h, () => more())],
    ['ground below sea level (−60 to −20 m) with pits', grid(w, h, (r, c) => -40 + 15 * Math.sin(c / 31) * Math.cos(r / 17) - (more() < 0.03 ? 5 : more() * 0.3))],
    ['white noise around zero (±0, tiny and negative values)', grid(w, h, () => { const v = more(); return v < 0.1 ? 0 : v < 0.15 ? -0 : v < 0.2 ? 1e-40 : (v - 0.6) * 1e-3; })],
    ['benchmark-like hills with nodata holes, a ragged nodata edge and lone nodata cells', grid(w, h, (r, c) => {
      if (r < 4 + 3 * Math.sin(c / 7) || (r - 100) ** 2 + (c - 130) ** 2 < 500 || more() < 0.005) return NaN;
      return benchmarkLike[r * w + c];
    })],
  ];
  for (const [name, dem] of cases) {
    it(`matches the plain fill within ε handling and every cell drains: ${name}`, () => {
      const exact = exactFill(dem, w, h);
      const ref = referenceFill(dem, w, h);
      const out = fillDepressions(dem, w, h);
      const refSteps = maxStepsAbove(ref, exact);
      const outSteps = maxStepsAbove(out, exact);
      expect(outSteps).toBeGreaterThanOrEqual(0); // never below the exact filled surface
      expect(outSteps).toBeLessThanOrEqual(refSteps);
      expect(cellsThatDoNotDrain(out, w, h)).toBe(0);
      let nodataMoved = 0;
      for (let i = 0; i < dem.length; i++) if (Number.isNaN(out[i]) !== Number.isNaN(dem[i])) nodataMoved++;
      expect(nodataMoved).toBe(0);
    });
  }

  it('uses a scratch grid that cannot hold the closed bits (odd offset, too short) and still leaves it all 1', () => {
    const dem = cases[0][1];
    const expected = fillDepressions(dem, w, h);
    const backing = new Uint8Array(w * h + 1).fill(9);
    const scratch = backing.subarray(1); // byteOffset 1: not usable as 32-bit words
    const stats = { queueBytes: 0 };
    expect(differingCells(fillDepressions(dem, w, h, { closedScratch: scratch, stats }), expected)).toBe(0);
    expect(scratch.every((v) => v === 1)).toBe(true);
    expect(backing[0]).toBe(9);
    // counts its own closed bits then (one bit per cell) besides the queues
    expect(stats.queueBytes).toBeGreaterThanOrEqual(Math.ceil((w * h) / 8));
    const tiny = new Uint8Array(3).fill(5);
    fillDepressions(Float32Array.of(1, 0, 2), 3, 1, { closedScratch: tiny });
    expect([...tiny]).toEqual([1, 1, 1]);
  });
});

describe('monotone cell queue (radix heap)', () => {
  const f = new Float32Array(1), b = new Int32Array(f.buffer);
  const keyOf = (v: number): number => { f[0] = v; return orderedKey(b[0]); };

  it('orders Float32 keys like the numbers, negatives and −0 included', () => {
    const values = [-3.4e38, -300, -1, -1e-40, -0, 0, 1e-45, 1e-40, 1, 300.00003, 3.4e38];
    for (let i = 1; i < values.length; i++) expect(keyOf(values[i])).toBeGreaterThan(keyOf(values[i - 1]));
  });

  it('pops keys in non-decreasing order, every pushed cell once, when pushes never go below the last pop', () => {
    const rnd = seededRandom(5);
    const q = new MonotoneCellQueue();
    const keyOfCell = new Map<number, number>();
    let last = keyOf(-50), pushed = 0, popped = 0, outOfOrder = 0;
    const popOne = () => {
      const cell = q.pop();
      const key = keyOfCell.get(cell)!;
      if (key < last) outOfOrder++;
      last = key;
      keyOfCell.delete(cell);
      popped++;
    };
    for (let step = 0; step < 200_000; step++) {
      if (q.size > 0 && rnd() < 0.5) popOne();
      else {
        // near the last key most of the time (as in a flood), now and then far above it; ties often
        const v = rnd() < 0.9 ? Math.round(rnd() * 40) / 100 : rnd() * 200;
        f[0] = -50 + v;
        const key = Math.max(last, orderedKey(b[0]));
        q.push(pushed, key);
        keyOfCell.set(pushed++, key);
      }
    }
    while (q.size > 0) popOne();
    expect(outOfOrder).toBe(0);
    expect(popped).toBe(pushed);
    expect(keyOfCell.size).toBe(0); // each cell came out once
    expect(q.peakBytes).toBeGreaterThan(0);
  });

  it('throws on a key below the last one popped and on pop() when empty', () => {
    const q = new MonotoneCellQueue();
    q.push(1, keyOf(5));
    q.pop();
    expect(() => q.push(2, keyOf(4))).toThrow('the queue is monotone');
    expect(() => q.pop()).toThrow('pop() on an empty queue');
  });
});
