// Depression filling by Priority-Flood+ε (Barnes, Lehman & Mulla 2014, Computers & Geosciences
// 62:117, Algorithm 3): seed a min-priority queue with the edge cells (grid border and cells next
// to nodata), pop the lowest, and raise each unvisited neighbour to at least the next Float32
// above the popped cell. Raised cells go through a plain FIFO (the "pit" queue). Every filled
// cell ends strictly above the cell it was reached from, so flats and filled pits drain (toward
// their spill point) with no separate flat-resolution pass. The ε is one Float32 step (~3e-5 m
// at 300 m), far below DEM precision.
//
// Cells on slopes skip the priority queue (Zhou, Sun & Fu 2016, Computers & Geosciences 90:87,
// "an efficient variant of the Priority-Flood algorithm"): a neighbour n above the ε step whose
// own unvisited neighbours all lie above n's ε step can raise nothing, and its filled elevation is
// its own (the path back through the cell it was reached from is never higher), so it is taken
// at once from a stack, in any order, instead of waiting in the heap. Only cells that may border
// a hollow or a flat go through the heap. The filled surface is the plain version's up to the ε
// steps on flats (which cell of a flat gets which step depends on the order ties are met); every
// cell still drains to an edge (tests/unit/terrain/fill-reference.test.ts).
//
// Memory: the closed flags (1 B/cell, may be the caller's scratch grid), the heap, the pit FIFO
// and the slope stack, all growing by doubling; their peak is reported in `stats`.
import { CellMinHeap } from './min-heap';

export type FillOptions = {
  /** Write into the given array instead of a copy (saves 4 bytes per cell). */
  inPlace?: boolean;
  /** A one-byte grid to use for the closed flags (overwritten; left all 1), instead of a new one. */
  closedScratch?: Uint8Array;
  /** Filled in on return: an upper bound on the bytes the heap, the pit FIFO and the slope stack held at once. */
  stats?: { queueBytes: number };
};

// One Float32 and its bits, for the ε step (IEEE 754 nextafter toward +∞).
const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);

/** The next Float32 above v (v a Float32, not NaN). */
function nextUp(v: number): number {
  if (v === 0) return 1.401298464324817e-45; // smallest positive subnormal
  f32[0] = v;
  if (v > 0) i32[0]++;
  else i32[0]--;
  return f32[0];
}

/** Returns the filled elevations (NaN stays NaN). O(n log n) worst case. */
export function fillDepressions(
  elevationM: Float32Array,
  width: number,
  height: number,
  options: FillOptions = {},
): Float32Array {
  const n = width * height;
  if (elevationM.length !== n) throw new Error(`elevationM has ${elevationM.length} cells, expected ${n}`);
  const z = options.inPlace ? elevationM : elevationM.slice();
  if (options.closedScratch && options.closedScratch.length !== n) throw new Error(`closedScratch has ${options.closedScratch.length} cells, expected ${n}`);
  const closed = options.closedScratch ? options.closedScratch.fill(0) : new Uint8Array(n);
  const open = new CellMinHeap(4 * (width + height));
  let pit = new Int32Array(1024);
  let pitMask = pit.length - 1; // the FIFO's length is a power of two
  let pitHead = 0, pitCount = 0, pitPeakBytes = pit.byteLength;
  let stack = new Int32Array(64);
  let stackTop = 0, stackPeakBytes = stack.byteLength;

  // Nodata cells are closed; valid cells on the border or touching nodata are seeds.
  let nodataCells = 0;
  for (let i = 0; i < n; i++) if (z[i] !== z[i]) { closed[i] = 1; nodataCells++; }
  for (let r = 0; r < height; r++) {
    // Without nodata only the border seeds: visit just those cells.
    const inner = nodataCells === 0 && r > 0 && r < height - 1;
    // (c = 0 → width − 1 only when that moves on: a one-column grid would otherwise never end.)
    for (let c = 0; c < width; c = inner && c === 0 && width > 1 ? width - 1 : c + 1) {
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

  const offsets = Int32Array.of(-width - 1, -width, -width + 1, -1, 1, width - 1, width, width + 1);
  const dRow = Int32Array.of(-1, -1, -1, 0, 0, 1, 1, 1);
  const dCol = Int32Array.of(-1, 0, 1, -1, 1, -1, 0, 1);
  const lastRow = height - 1, lastCol = width - 1;

  /** True when every unvisited neighbour of cell i lies above i's ε step (then i raises nothing). */
  const onSlope = (i: number, zi: number): boolean => {
    const floor = nextUp(zi);
    const row = (i / width) | 0;
    const col = i - row * width;
    const interior = row > 0 && col > 0 && row < lastRow && col < lastCol;
    for (let k = 0; k < 8; k++) {
      if (!interior) {
        const rr = row + dRow[k], cc = col + dCol[k];
        if (rr < 0 || cc < 0 || rr > lastRow || cc > lastCol) continue;
      }
      const nb = i + offsets[k];
      if (closed[nb] === 0 && z[nb] <= floor) return false;
    }
    return true;
  };

  while (stackTop > 0 || pitCount > 0 || open.size > 0) {
    let c: number, zc: number;
    if (stackTop > 0) {
      c = stack[--stackTop];
      zc = z[c];
    } else if (pitCount > 0) {
      c = pit[pitHead];
      pitHead = (pitHead + 1) & pitMask;
      pitCount--;
      zc = z[c];
    } else {
      zc = open.topKey(); // the key is the cell's elevation: closed cells are never raised
      c = open.pop();
    }
    const floor = nextUp(zc); // the ε of Alg. 3
    const row = (c / width) | 0;
    const col = c - row * width;
    const interior = row > 0 && col > 0 && row < lastRow && col < lastCol;
    for (let k = 0; k < 8; k++) {
      if (!interior) {
        const rr = row + dRow[k], cc = col + dCol[k];
        if (rr < 0 || cc < 0 || rr > lastRow || cc > lastCol) continue;
      }
      const nb = c + offsets[k];
      if (closed[nb] !== 0) continue;
      closed[nb] = 1;
      const zn = z[nb];
      // Barnes et al. 2014 Alg. 3: if z[n] ≤ z[c] + ε then z[n] ← z[c] + ε, push to pit queue
      if (zn <= floor) {
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
      } else if (onSlope(nb, zn)) {
        // Zhou et al. 2016: a slope cell is final as it is; take it now, not through the heap.
        if (stackTop === stack.length) {
          const bigger = new Int32Array(stack.length * 2);
          stackPeakBytes = Math.max(stackPeakBytes, stack.byteLength + bigger.byteLength);
          bigger.set(stack);
          stack = bigger;
        }
        stack[stackTop++] = nb;
      } else open.push(nb, zn);
    }
  }
  // Sum of each queue's own peak, so never below the three together at any moment.
  if (options.stats) options.stats.queueBytes = open.peakBytes + pitPeakBytes + stackPeakBytes;
  return z;
}
