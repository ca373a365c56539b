// Depression filling by Priority-Flood+ε (Barnes, Lehman & Mulla 2014, Computers & Geosciences
// 62:117, Algorithm 3): seed a min-priority queue with the edge cells (grid border and cells next
// to nodata), take the lowest, and raise each unvisited neighbour to at least the next Float32
// above it. Raised cells go through a plain FIFO (the "pit" queue). Every filled cell ends
// strictly above the cell it was reached from, so flats and filled pits drain (toward their
// spill point) with no separate flat-resolution pass. The ε is one Float32 step (~3e-5 m at
// 300 m), far below DEM precision.
//
// Invariant: a cell's filled level is written when it is first reached and never changes, and
// the cells that raise a neighbour are taken in non-decreasing order of level. The pit FIFO's
// levels never decrease, so taking the lower front of the FIFO and the heap (the heap on ties)
// keeps that order exactly; on ties a flat is entered from all its lower edge cells at once and
// gets its ε steps breadth-first from the nearest of them.
//
// Slope cells skip the heap (after Zhou, Sun & Fu 2016, Computers & Geosciences 90:87; Wei, Zhou
// & Dong 2019, ISPRS Int. J. Geo-Inf. 8:164, recalled from memory, describe further variants;
// the arrangement here is our own). A neighbour above the ε step of the cell that reached it
// keeps its own elevation (the path back is lower), so it is final at once and goes on a stack.
// When it leaves the stack it is tested and expanded in one pass over its neighbours: if none
// of the unvisited ones lies at or below its own ε step it can raise nothing, so they are all
// taken as slope cells too, in any order; otherwise it waits in the heap under its elevation
// until raising is its turn. Most waiting cells find all their neighbours taken by then and are
// dropped after a look at the closed bits, without reading elevations.
//
// Cost: every cell goes once through the stack or the pit FIFO, and at most once through the
// heap, a radix heap over the Float32 bits (radix-queue.ts) whose entries move at most three
// times: O(n) in all. The closed flags are one bit per cell (1 MB for 8 M cells stays in cache),
// kept in the caller's scratch grid when given, which is left all 1. Border seeds go into the
// heap as ~cell, so only they pay for bounds checks.
//
// Memory: the closed bits (n/8 bytes, none when the scratch grid holds them), the heap's
// segments, the pit FIFO and the slope stack; the sum of their peaks is reported in `stats`.
import { MonotoneCellQueue, orderedKey } from './radix-queue';

export type FillOptions = {
  /** Write into the given array instead of a copy (saves 4 bytes per cell). */
  inPlace?: boolean;
  /** A one-byte grid to hold the closed flags (overwritten; left all 1), instead of a new grid. */
  closedScratch?: Uint8Array;
  /** Filled in on return: an upper bound on the bytes the queues (and closed bits of its own) held at once. */
  stats?: { queueBytes: number };
};

// One Float32 and its bits, for the ε step (IEEE 754 nextafter toward +∞).
const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);
const MIN_NORMAL = 2 ** -126;
const STEP = 2 ** -24 + 2 ** -47;

/**
 * The next Float32 above v (v a Float32, not NaN; IEEE 754 nextUp). For normal v, v + |v|·(2⁻²⁴ +
 * 2⁻⁴⁷) is exact in double precision and lies just over half a Float32 step from v (toward +∞),
 * so one rounding to Float32 gives the next value; zero and subnormals step the bits.
 */
export function nextFloat32Up(v: number): number {
  if (v >= MIN_NORMAL || v <= -MIN_NORMAL) return Math.fround(v + Math.abs(v) * STEP);
  if (v === 0) return 1.401298464324817e-45; // smallest positive subnormal
  f32[0] = v;
  if (v > 0) i32[0]++;
  else i32[0]--;
  return f32[0];
}

/** Returns the filled elevations (NaN stays NaN). */
export function fillDepressions(
  elevationM: Float32Array,
  width: number,
  height: number,
  options: FillOptions = {},
): Float32Array {
  const n = width * height;
  if (elevationM.length !== n) throw new Error(`elevationM has ${elevationM.length} cells, expected ${n}`);
  const z = options.inPlace ? elevationM : elevationM.slice();
  const bits = new Int32Array(z.buffer, z.byteOffset, n);
  if (options.closedScratch && options.closedScratch.length !== n) throw new Error(`closedScratch has ${options.closedScratch.length} cells, expected ${n}`);
  // The closed flags, one bit per cell (a 1 MB grid of 8 M cells stays in cache): in the
  // caller's scratch grid when it is there and big enough, else in a grid of their own.
  const words = (n + 31) >>> 5;
  const scratch = options.closedScratch;
  const own = !scratch || scratch.byteOffset % 4 !== 0 || scratch.byteLength < 4 * words;
  const closed = own ? new Int32Array(words) : new Int32Array(scratch.buffer, scratch.byteOffset, words).fill(0);
  const open = new MonotoneCellQueue();
  let pit = new Int32Array(64);
  let pitMask = pit.length - 1; // the FIFO's length is a power of two
  let pitHead = 0, pitCount = 0, pitPeakBytes = pit.byteLength;
  let stack = new Int32Array(64);
  let stackTop = 0, stackPeakBytes = stack.byteLength;

  // Nodata cells are closed; valid cells on the border or touching nodata are seeds. Border
  // cells go into the queue as ~cell, so only they pay for bounds checks.
  let nodataCells = 0;
  for (let i = 0; i < n; i++) {
    if (z[i] !== z[i]) {
      closed[i >> 5] |= 1 << i;
      nodataCells++;
    }
  }
  const lastRow = height - 1, lastCol = width - 1;
  for (let r = 0; r < height; r++) {
    // Without nodata only the border seeds: visit just those cells.
    const inner = nodataCells === 0 && r > 0 && r < lastRow;
    // (c = 0 → width − 1 only when that moves on: a one-column grid would otherwise never end.)
    for (let c = 0; c < width; c = inner && c === 0 && width > 1 ? lastCol : c + 1) {
      const i = r * width + c;
      if (closed[i >> 5] & (1 << i)) continue;
      const border = r === 0 || c === 0 || r === lastRow || c === lastCol;
      let seed = border;
      for (let dr = -1; dr <= 1 && !seed; dr++) {
        for (let dc = -1; dc <= 1; dc++) {
          const v = z[i + dr * width + dc];
          if (v !== v) { seed = true; break; }
        }
      }
      if (seed) {
        closed[i >> 5] |= 1 << i;
        open.push(border ? ~i : i, orderedKey(bits[i]));
      }
    }
  }

  const offsets = Int32Array.of(-width - 1, -width, -width + 1, -1, 1, width - 1, width, width + 1);
  const dRow = Int32Array.of(-1, -1, -1, 0, 0, 1, 1, 1);
  const dCol = Int32Array.of(-1, 0, 1, -1, 1, -1, 0, 1);
  const taken = new Int32Array(8); // a slope cell's unvisited neighbours, taken if it passes the test

  for (;;) {
    let c: number;
    let onBorder = false;
    if (stackTop > 0) {
      // A slope cell (final at its own elevation). Zhou et al. 2016: if none of its unvisited
      // neighbours lies at or below its ε step, it raises nothing: take them all now, off the
      // heap, as slope cells too. Otherwise it waits in the heap for its turn.
      c = stack[--stackTop];
      const floor = nextFloat32Up(z[c]);
      let found = 0, k = 0;
      for (; k < 8; k++) {
        const nb = c + offsets[k];
        if (closed[nb >> 5] & (1 << nb)) continue;
        if (z[nb] <= floor) break;
        taken[found++] = nb;
      }
      if (k < 8) {
        open.push(c, orderedKey(bits[c]));
        continue;
      }
      if (stackTop + found > stack.length) {
        const bigger = new Int32Array(stack.length * 2);
        stackPeakBytes = Math.max(stackPeakBytes, stack.byteLength + bigger.byteLength);
        bigger.set(stack);
        stack = bigger;
      }
      for (let h = 0; h < found; h++) {
        const nb = taken[h];
        closed[nb >> 5] |= 1 << nb;
        stack[stackTop++] = nb;
      }
      continue;
    }
    if (pitCount > 0 && !open.hasKeyAtMost(orderedKey(bits[pit[pitHead]]))) {
      c = pit[pitHead];
      pitHead = (pitHead + 1) & pitMask;
      pitCount--;
    } else if (open.size > 0) {
      c = open.pop();
      if (c < 0) {
        c = ~c;
        onBorder = true;
      } else {
        // Most waiting cells find their neighbours all taken by then: skip them without reading z.
        let k = 0;
        for (; k < 8; k++) {
          const j = c + offsets[k];
          if ((closed[j >> 5] & (1 << j)) === 0) break;
        }
        if (k === 8) continue;
      }
    } else break;
    // In priority order (Barnes et al. 2014 Alg. 3): each unvisited neighbour at or below
    // z[c] + ε is raised to z[c] + ε and goes to the pit queue; a higher one is final as it is
    // and goes on the slope stack.
    const floor = nextFloat32Up(z[c]);
    const row = onBorder ? (c / width) | 0 : 0, col = c - row * width;
    if (stackTop + 8 > stack.length) {
      const bigger = new Int32Array(stack.length * 2);
      stackPeakBytes = Math.max(stackPeakBytes, stack.byteLength + bigger.byteLength);
      bigger.set(stack);
      stack = bigger;
    }
    for (let k = 0; k < 8; k++) {
      if (onBorder) {
        const rr = row + dRow[k], cc = col + dCol[k];
        if (rr < 0 || cc < 0 || rr > lastRow || cc > lastCol) continue;
      }
      const nb = c + offsets[k];
      const word = nb >> 5, bit = 1 << nb;
      if (closed[word] & bit) continue;
      closed[word] |= bit;
      if (z[nb] > floor) {
        stack[stackTop++] = nb;
        continue;
      }
      z[nb] = floor;
      if (pitCount === pit.length) {
        const bigger = new Int32Array(pit.length * 2);
        pitPeakBytes = Math.max(pitPeakBytes, pit.byteLength + bigger.byteLength);
        for (let j = 0; j < pitCount; j++) bigger[j] = pit[(pitHead + j) & pitMask];
        pit = bigger;
        pitMask = pit.length - 1;
        pitHead = 0;
      }
      pit[(pitHead + pitCount) & pitMask] = nb;
      pitCount++;
    }
  }
  // The caller may use the scratch grid afterwards: leave it all 1, as if flagged per byte.
  scratch?.fill(1);
  // Sum of each queue's own peak, so never below the three together at any moment.
  if (options.stats) options.stats.queueBytes = open.peakBytes + pitPeakBytes + stackPeakBytes + (own ? closed.byteLength : 0);
  return z;
}
