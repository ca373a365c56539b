// Depression filling by Priority-Flood+ε (Barnes, Lehman & Mulla 2014, Computers & Geosciences
// 62:117, Algorithm 3): seed a min-priority queue with the edge cells (grid border and cells next
// to nodata), pop the lowest, and raise each unvisited neighbour to at least the next Float32
// above the popped cell. Raised cells go through a plain FIFO (the "pit" queue), which is what
// makes the algorithm fast on real DEMs. Every filled cell ends strictly above the cell it was
// reached from, so flats and filled pits drain (toward their spill point) with no separate
// flat-resolution pass. The ε is one Float32 step (~3e-5 m at 300 m), far below DEM precision.
import { CellMinHeap } from './min-heap';
import { float32NextUp } from './float32-next-up';

export type FillOptions = {
  /** Write into the given array instead of a copy (saves 4 bytes per cell). */
  inPlace?: boolean;
  /** A one-byte grid to use for the closed flags (overwritten; left all 1), instead of a new one. */
  closedScratch?: Uint8Array;
  /** Filled in on return: an upper bound on the bytes the priority queue and the pit FIFO held at once. */
  stats?: { queueBytes: number };
};

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
  let pitHead = 0, pitTail = 0, pitCount = 0, pitPeakBytes = pit.byteLength;
  const pushPit = (cell: number): void => {
    if (pitCount === pit.length) {
      const bigger = new Int32Array(pit.length * 2);
      pitPeakBytes = pit.byteLength + bigger.byteLength;
      for (let k = 0; k < pitCount; k++) bigger[k] = pit[(pitHead + k) % pit.length];
      pit = bigger;
      pitHead = 0;
      pitTail = pitCount;
    }
    pit[pitTail] = cell;
    pitTail = pitTail + 1 === pit.length ? 0 : pitTail + 1;
    pitCount++;
  };

  // Nodata cells are closed; valid cells on the border or touching nodata are seeds.
  let nodataCells = 0;
  for (let i = 0; i < n; i++) if (z[i] !== z[i]) { closed[i] = 1; nodataCells++; }
  for (let r = 0; r < height; r++) {
    // Without nodata only the border seeds: visit just those cells, in the same row-major order.
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
    const floor = float32NextUp(zc);
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
      // Barnes et al. 2014 Alg. 3: if z[n] ≤ z[c] + ε then z[n] ← z[c] + ε, push to pit queue
      if (z[nb] <= floor) {
        z[nb] = floor;
        pushPit(nb);
      } else open.push(nb, z[nb]);
    }
  }
  // Sum of each queue's own peak, so never below the two together at any moment.
  if (options.stats) options.stats.queueBytes = open.peakBytes + pitPeakBytes;
  return z;
}
