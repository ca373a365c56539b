// Depression filling by Priority-Flood+ε (Barnes, Lehman & Mulla 2014, Computers & Geosciences
// 62:117, Algorithm 3): seed a min-priority queue with the edge cells (grid border and cells next
// to nodata), pop the lowest, and raise each unvisited neighbour to at least the next Float32
// above the popped cell. Raised cells go through a plain FIFO (the "pit" queue), which is what
// makes the algorithm fast on real DEMs. Every filled cell ends strictly above the cell it was
// reached from, so flats and filled pits drain (toward their spill point) with no separate
// flat-resolution pass. The ε is one Float32 step (~3e-5 m at 300 m), far below DEM precision.
//
// With ε the result depends on the order cells are reached in (a flat cell is raised one step per
// cell from where the flood first touched it), so this loop keeps exactly the visiting order of
// the plain version: the same binary heap with the same tie-breaking (a 4-ary heap or a
// region-growing variant would visit ties in another order and give other ε steps). It is faster
// only by being tighter: no closure or call per neighbour, the popped key read from the heap
// instead of the grid, the ε step inline, and a branch-free child pick in the heap (min-heap.ts)
// that leaves the heap exactly as the textbook one (tests/unit/terrain/fill-reference.test.ts
// compares bit for bit with the plain version).
import { CellMinHeap } from './min-heap';

export type FillOptions = {
  /** Write into the given array instead of a copy (saves 4 bytes per cell). */
  inPlace?: boolean;
  /** A one-byte grid to use for the closed flags (overwritten; left all 1), instead of a new one. */
  closedScratch?: Uint8Array;
  /** Filled in on return: an upper bound on the bytes the priority queue and the pit FIFO held at once. */
  stats?: { queueBytes: number };
};

// One Float32 and its bits, for the ε step (IEEE 754 nextafter toward +∞).
const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);

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

  // Nodata cells are closed; valid cells on the border or touching nodata are seeds.
  let nodataCells = 0;
  for (let i = 0; i < n; i++) if (z[i] !== z[i]) { closed[i] = 1; nodataCells++; }
  for (let r = 0; r < height; r++) {
    // Without nodata only the border seeds: visit just those cells, in the same row-major order.
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

  // Neighbours in the order of the plain loop: NW, N, NE, W, E, SW, S, SE.
  const offsets = Int32Array.of(-width - 1, -width, -width + 1, -1, 1, width - 1, width, width + 1);
  const dRow = Int32Array.of(-1, -1, -1, 0, 0, 1, 1, 1);
  const dCol = Int32Array.of(-1, 0, 1, -1, 1, -1, 0, 1);
  const lastRow = height - 1, lastCol = width - 1;
  while (pitCount > 0 || open.size > 0) {
    let c: number, zc: number;
    if (pitCount > 0) {
      c = pit[pitHead];
      pitHead = (pitHead + 1) & pitMask;
      pitCount--;
      zc = z[c];
    } else {
      zc = open.topKey(); // the key is the cell's elevation: closed cells are never raised
      c = open.pop();
    }
    // floor = the next Float32 above zc (the ε of Alg. 3)
    f32[0] = zc;
    if (zc === 0) f32[0] = 1.401298464324817e-45; // smallest positive subnormal
    else if (zc > 0) i32[0]++;
    else i32[0]--;
    const floor = f32[0];
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
          pitPeakBytes = pit.byteLength + bigger.byteLength;
          for (let j = 0; j < pitCount; j++) bigger[j] = pit[(pitHead + j) & pitMask];
          pit = bigger;
          pitMask = pit.length - 1;
          pitHead = 0;
        }
        pit[(pitHead + pitCount) & pitMask] = nb;
        pitCount++;
      } else open.push(nb, zn);
    }
  }
  // Sum of each queue's own peak, so never below the two together at any moment.
  if (options.stats) options.stats.queueBytes = open.peakBytes + pitPeakBytes;
  return z;
}
