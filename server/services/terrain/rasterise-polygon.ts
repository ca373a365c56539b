// Cells of a grid whose centre lies inside a polygon: scanline even-odd rule over every ring,
// so holes (and the inner rings of a MultiPolygon) are excluded. Rings are [x, y] in the grid's
// CRS, closed or not. Overlapping parts of a MultiPolygon cancel (even-odd); callers pass
// valid geometry.

export type Ring = ReadonlyArray<ReadonlyArray<number>>;
export type GridFrame = { width: number; height: number; originX: number; originY: number; cellSizeX: number; cellSizeY: number };

/**
 * The cells whose centre is inside, as runs along rows: pairs [first, end) of row-major cell
 * indices, in increasing order (a few numbers per row instead of one per cell).
 */
export function polygonSpans(rings: ReadonlyArray<Ring>, grid: GridFrame): Int32Array {
  const edges: number[] = []; // x1, y1, x2, y2 per edge
  let minY = Infinity, maxY = -Infinity;
  for (const ring of rings) {
    const n = ring.length;
    if (n < 3) continue;
    for (let k = 0; k < n; k++) {
      const a = ring[k], b = ring[(k + 1) % n];
      if (a[1] === b[1]) continue; // horizontal edges never cross a scanline in even-odd
      edges.push(a[0], a[1], b[0], b[1]);
      minY = Math.min(minY, a[1]);
      maxY = Math.max(maxY, a[1]);
    }
  }
  const out: number[] = [];
  if (edges.length === 0) return new Int32Array(0);
  const { width, height, originX, originY, cellSizeX, cellSizeY } = grid;
  const rFirst = Math.max(0, Math.floor((originY - maxY) / cellSizeY - 0.5));
  const rLast = Math.min(height - 1, Math.ceil((originY - minY) / cellSizeY - 0.5));
  const xs: number[] = [];
  for (let r = rFirst; r <= rLast; r++) {
    const y = originY - (r + 0.5) * cellSizeY;
    xs.length = 0;
    for (let e = 0; e < edges.length; e += 4) {
      const y1 = edges[e + 1], y2 = edges[e + 3];
      // half-open rule: an edge counts when y is in [min, max) so shared vertices count once
      if ((y1 <= y && y < y2) || (y2 <= y && y < y1)) {
        const x1 = edges[e], x2 = edges[e + 2];
        xs.push(x1 + ((y - y1) / (y2 - y1)) * (x2 - x1));
      }
    }
    xs.sort((p, q) => p - q);
    for (let k = 0; k + 1 < xs.length; k += 2) {
      // cell centre x = originX + (c + 0.5)·cellSizeX inside [xs[k], xs[k+1])
      const cStart = Math.max(0, Math.ceil((xs[k] - originX) / cellSizeX - 0.5));
      const cEnd = Math.min(width - 1, Math.ceil((xs[k + 1] - originX) / cellSizeX - 0.5) - 1);
      if (cStart <= cEnd) out.push(r * width + cStart, r * width + cEnd + 1);
    }
  }
  return Int32Array.from(out);
}

/** Number of cells in spans from polygonSpans. */
export function spanCellCount(spans: Int32Array): number {
  let n = 0;
  for (let k = 0; k < spans.length; k += 2) n += spans[k + 1] - spans[k];
  return n;
}

/** Indices (row-major) of the cells whose centre is inside, in increasing order. */
export function rasterisePolygon(rings: ReadonlyArray<Ring>, grid: GridFrame): Int32Array {
  const spans = polygonSpans(rings, grid);
  const out = new Int32Array(spanCellCount(spans));
  for (let k = 0, j = 0; k < spans.length; k += 2) for (let i = spans[k]; i < spans[k + 1]; i++) out[j++] = i;
  return out;
}
