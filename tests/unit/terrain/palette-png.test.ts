// Palette PNGs decode to the colours they were given (decoded by pngjs, an independent PNG
// reader), at every bit depth, and the map layers drawn with them show the published colours:
// ColorBrewer YlOrBr 5-class (Brewer, colorbrewer2.org) for classes, grey for shaded relief.
import { describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import { inflateSync } from 'node:zlib';
import { encodePalettePng } from '../../../server/services/terrain/palette-png';
import { FLOW_BLUE, LS_BREAKS, renderLayer, SOIL_LOSS_BREAKS_T_PER_HA_YR, YLORBR_5, type LayerKind, type RenderValues } from '../../../server/services/terrain/render-layer';
import { ContributingAreaMask } from '../../../server/services/terrain/contributing-area-mask';
import { converterBetween } from '../../../server/services/terrain/reproject';
import type { GridFrame } from '../../../server/services/terrain/rasterise-polygon';
import { DEFAULT_SLOPE_CLASSES } from '../../../server/services/terrain/slope-classes';
import { SlopePctGrid } from '../../../server/services/terrain/slope-pct-grid';
import { seededRandom } from './helpers';

const rnd = seededRandom(11);
const rgba = (hex: string, alpha: number): number[] => [parseInt(hex.slice(1, 3), 16), parseInt(hex.slice(3, 5), 16), parseInt(hex.slice(5, 7), 16), alpha];

/** The decoded image's pixels as [r, g, b, a] (a fully transparent pixel as [0, 0, 0, 0]). */
function decode(png: Buffer): { width: number; height: number; pixel: (i: number) => number[] } {
  const img = PNG.sync.read(png);
  return { width: img.width, height: img.height, pixel: (i) => (img.data[4 * i + 3] === 0 ? [0, 0, 0, 0] : Array.from(img.data.subarray(4 * i, 4 * i + 4))) };
}

// An 11×7 grid in UTM 15N, drawn as it is (no warp), so pixel i is cell i.
const W = 11, H = 7;
const grid = { width: W, height: H, originX: 600000, originY: 4684400, cellSizeX: 5, cellSizeY: 5, epsg: 32615 };

describe('palette PNG writer', () => {
  for (const colours of [1, 2, 3, 4, 5, 16, 17, 256]) {
    it(`decodes to the given colours with ${colours} palette entries, odd widths included`, () => {
      const palette = Array.from({ length: colours }, (_, k) => (k === 0 ? 0x00000000 : ((rnd() * 0xffffff) << 8) | (k % 3 === 0 ? 128 : 255)) >>> 0);
      for (const [w, h] of [[1, 1], [13, 5], [64, 3]]) {
        const indices = Uint8Array.from({ length: w * h }, () => Math.floor(rnd() * colours));
        const out = decode(encodePalettePng({ width: w, height: h, indices, palette }));
        expect([out.width, out.height]).toEqual([w, h]);
        for (let i = 0; i < w * h; i++) {
          const c = palette[indices[i]];
          const want = (c & 255) === 0 ? [0, 0, 0, 0] : [c >>> 24, (c >>> 16) & 255, (c >>> 8) & 255, c & 255];
          expect(out.pixel(i)).toEqual(want);
        }
      }
    });
  }

  it('refuses a palette of more than 256 colours and indices of the wrong length', () => {
    expect(() => encodePalettePng({ width: 1, height: 1, indices: new Uint8Array(1), palette: new Array(257).fill(0) })).toThrow('a palette has 1 to 256 colours, got 257');
    expect(() => encodePalettePng({ width: 2, height: 1, indices: new Uint8Array(1), palette: [0] })).toThrow('indices has 1 pixels, expected 2');
  });
});

describe('map layers as palette PNGs', () => {
  it('colours LS by its classes in YlOrBr with alpha 200, nodata transparent', () => {
    const values = Float32Array.from({ length: W * H }, (_, i) => (i % 13 === 0 ? NaN : rnd() * 6));
    const r = renderLayer({ kind: 'ls', grid, values, noWarp: true });
    if (!r.ok) throw new Error(r.reason);
    const out = decode(r.png);
    for (let i = 0; i < W * H; i++) {
      const v = values[i];
      const cls = LS_BREAKS.filter((b) => v >= b).length;
      expect(out.pixel(i)).toEqual(Number.isNaN(v) ? [0, 0, 0, 0] : rgba(YLORBR_5[cls], 200));
    }
  });

  it('draws shaded relief in opaque greys, 0 (nodata) transparent', () => {
    const values = Uint8Array.from({ length: W * H }, (_, i) => (i * 37) % 256);
    const r = renderLayer({ kind: 'hillshade', grid, values, noWarp: true });
    if (!r.ok) throw new Error(r.reason);
    const out = decode(r.png);
    for (let i = 0; i < W * H; i++) expect(out.pixel(i)).toEqual(values[i] === 0 ? [0, 0, 0, 0] : [values[i], values[i], values[i], 255]);
  });

  it('draws concentrated flow in opaque dark blue and nothing elsewhere', () => {
    const area = Float32Array.from({ length: W * H }, (_, i) => (i % 4 === 0 ? 20_000 : 100));
    const r = renderLayer({ kind: 'concentrated-flow', grid, values: ContributingAreaMask.fromArea(area, 10_000), noWarp: true });
    if (!r.ok) throw new Error(r.reason);
    const out = decode(r.png);
    for (let i = 0; i < W * H; i++) expect(out.pixel(i)).toEqual(i % 4 === 0 ? rgba(FLOW_BLUE, 255) : [0, 0, 0, 0]);
  });
});

// The pictures drawn row by row must be the pictures of the plain rule, pixel by pixel: a Web
// Mercator frame over the grid's envelope (its edges sampled 16 times a side), the source
// position of each pixel centre interpolated bilinearly in a lattice of exact transforms every
// 32 pixels, the cell under it taken (nearest cell), outside the grid transparent.
describe('map pictures pixel for pixel', () => {
  const STEP = 32;

  /** The source cell of every pixel by the plain rule (−1 outside), or the cell itself unwarped. */
  function plainSourceCells(grid: GridFrame & { epsg: number }, noWarp: boolean): Int32Array {
    const { width: w, height: h } = grid;
    const out = new Int32Array(w * h);
    if (noWarp) return out.map((_, i) => i);
    const conv = converterBetween(grid.epsg, 3857);
    if (!conv.ok) throw new Error(conv.reason);
    const x0 = grid.originX, y0 = grid.originY, x1 = x0 + w * grid.cellSizeX, y1 = y0 - h * grid.cellSizeY;
    let mx0 = Infinity, my0 = Infinity, mx1 = -Infinity, my1 = -Infinity;
    for (let k = 0; k <= 16; k++) {
      const t = k / 16;
      for (const p of [[x0 + t * (x1 - x0), y0], [x0 + t * (x1 - x0), y1], [x0, y0 + t * (y1 - y0)], [x1, y0 + t * (y1 - y0)]] as Array<[number, number]>) {
        const [mx, my] = conv.converter.forward(p);
        mx0 = Math.min(mx0, mx); my0 = Math.min(my0, my); mx1 = Math.max(mx1, mx); my1 = Math.max(my1, my);
      }
    }
    const lw = Math.ceil(w / STEP) + 1, lh = Math.ceil(h / STEP) + 1;
    const col = new Float64Array(lw * lh), row = new Float64Array(lw * lh);
    for (let j = 0; j < lh; j++) {
      for (let k = 0; k < lw; k++) {
        const [sx, sy] = conv.converter.inverse([mx0 + ((k * STEP) / w) * (mx1 - mx0), my1 - ((j * STEP) / h) * (my1 - my0)]);
        col[j * lw + k] = (sx - x0) / grid.cellSizeX;
        row[j * lw + k] = (y0 - sy) / grid.cellSizeY;
      }
    }
    for (let py = 0; py < h; py++) {
      const fj = (py + 0.5) / STEP, j = Math.min(lh - 2, Math.floor(fj)), tj = fj - j;
      for (let px = 0; px < w; px++) {
        const fk = (px + 0.5) / STEP, k = Math.min(lw - 2, Math.floor(fk)), tk = fk - k;
        const a = j * lw + k, b = a + lw;
        const c = (1 - tj) * ((1 - tk) * col[a] + tk * col[a + 1]) + tj * ((1 - tk) * col[b] + tk * col[b + 1]);
        const r = (1 - tj) * ((1 - tk) * row[a] + tk * row[a + 1]) + tj * ((1 - tk) * row[b] + tk * row[b + 1]);
        const ci = Math.floor(c), ri = Math.floor(r);
        out[py * w + px] = ci < 0 || ri < 0 || ci >= w || ri >= h ? -1 : ri * w + ci;
      }
    }
    return out;
  }

  /** The palette index of every pixel, read back from the PNG's own bytes (IDAT inflated, rows unfiltered and unpacked). */
  function pngIndices(png: Buffer): { width: number; height: number; depth: number; indices: Uint8Array } {
    let at = 8, width = 0, height = 0, depth = 0;
    const idat: Buffer[] = [];
    while (at < png.length) {
      const len = png.readUInt32BE(at), type = png.toString('latin1', at + 4, at + 8), data = png.subarray(at + 8, at + 8 + len);
      if (type === 'IHDR') [width, height, depth] = [data.readUInt32BE(0), data.readUInt32BE(4), data[8]];
      if (type === 'IDAT') idat.push(data);
      at += 12 + len;
    }
    const raw = inflateSync(Buffer.concat(idat));
    const rowBytes = Math.ceil((width * depth) / 8);
    const indices = new Uint8Array(width * height);
    for (let y = 0; y < height; y++) {
      const line = raw.subarray(y * (rowBytes + 1) + 1, (y + 1) * (rowBytes + 1));
      const filter = raw[y * (rowBytes + 1)];
      expect([0, 1]).toContain(filter);
      if (filter === 1) for (let i = 1; i < line.length; i++) line[i] = (line[i] + line[i - 1]) & 255; // Sub, 1 byte per pixel
      for (let x = 0; x < width; x++) {
        const bit = x * depth;
        indices[y * width + x] = (line[bit >> 3] >> (8 - depth - (bit & 7))) & ((1 << depth) - 1);
      }
    }
    return { width, height, depth, indices };
  }

  // Values that test the class rules at their edges: nodata, each break, the floats either side.
  const f32 = new Float32Array(1), u32 = new Uint32Array(f32.buffer);
  const nextFloat = (v: number, by: number): number => ((f32[0] = v), (u32[0] += by), f32[0]);
  function edgyValues(n: number, breaks: number[], scale: number): Float32Array {
    const special = [NaN, Infinity, -Infinity, 0, -0, -1, ...breaks.flatMap((b) => [b, nextFloat(b, 1), nextFloat(b, -1), b * (1 + 1 / 200), b * (1 - 1 / 200)])];
    return Float32Array.from({ length: n }, (_, i) => (i % 5 === 0 ? special[(i / 5) % special.length] : rnd() * scale));
  }

  const grids: Array<[string, GridFrame & { epsg: number }]> = [
    ['a UTM grid 3° off its central meridian at 60° N (turned ~2.6°)', { width: 97, height: 83, originX: 330000, originY: 6652000, cellSizeX: 5, cellSizeY: 5, epsg: 32615 }],
    ['a tall Albers grid far east of its meridian (turned ~10°)', { width: 41, height: 150, originX: 1500000, originY: 1800000, cellSizeX: 10, cellSizeY: 10, epsg: 5070 }],
    ['a geographic grid', { width: 70, height: 66, originX: -93.5, originY: 42.1, cellSizeX: 0.0001, cellSizeY: 0.00008, epsg: 4326 }],
    ['the benchmark UTM grid corner', { width: 130, height: 96, originX: 600000, originY: 4700000, cellSizeX: 5, cellSizeY: 5, epsg: 32615 }],
  ];

  for (const [name, grid] of grids) {
    for (const noWarp of [false, true]) {
      it(`draws every layer kind as the plain rule gives it, on ${name}${noWarp ? ', unwarped' : ''}`, () => {
        const n = grid.width * grid.height;
        const src = plainSourceCells(grid, noWarp);
        const classOf = (v: number, breaks: number[]) => breaks.filter((b) => v >= b).length;
        const slopeBreaks = DEFAULT_SLOPE_CLASSES.slice(1).map((c) => c.minPct);
        const slope = edgyValues(n, slopeBreaks, 40);
        const ls = edgyValues(n, LS_BREAKS, 6);
        const soilLoss = edgyValues(n, SOIL_LOSS_BREAKS_T_PER_HA_YR, 30);
        const area = Float32Array.from({ length: n }, (_, i) => (i % 7 === 0 ? NaN : rnd() < 0.3 ? 10_000 + rnd() * 1e5 : rnd() * 10_000));
        const shade = Uint8Array.from({ length: n }, () => Math.floor(rnd() * 256));
        // A coded slope is nodata for NaN and negative slopes; its classes are those of the Float32 slope.
        const coded = SlopePctGrid.fromFloat32(slope);
        const slopeIndex = (v: number) => (v >= 0 ? 1 + classOf(v, slopeBreaks) : 0);
        const cases: Array<[LayerKind, RenderValues, (i: number) => number]> = [
          ['hillshade', shade, (i) => shade[i]],
          ['slope-classes', slope, (i) => (slope[i] !== slope[i] ? 0 : 1 + classOf(slope[i], slopeBreaks))],
          ['slope-classes', coded, (i) => slopeIndex(slope[i])],
          ['ls', ls, (i) => (ls[i] !== ls[i] ? 0 : 1 + classOf(ls[i], LS_BREAKS))],
          ['soil-loss', soilLoss, (i) => (soilLoss[i] !== soilLoss[i] ? 0 : 1 + classOf(soilLoss[i], SOIL_LOSS_BREAKS_T_PER_HA_YR))],
          ['concentrated-flow', area, (i) => (area[i] >= 10_000 ? 1 : 0)],
          ['concentrated-flow', ContributingAreaMask.fromArea(area, 10_000), (i) => (area[i] >= 10_000 ? 1 : 0)],
        ];
        for (const [kind, values, indexOf] of cases) {
          const r = renderLayer({ kind, grid: { ...grid }, values, noWarp });
          if (!r.ok) throw new Error(r.reason);
          const got = pngIndices(r.png);
          expect([got.width, got.height]).toEqual([grid.width, grid.height]);
          const want = Uint8Array.from(src, (s) => (s < 0 ? 0 : indexOf(s)));
          let differ = 0;
          for (let i = 0; i < n; i++) if (got.indices[i] !== want[i]) differ++;
          expect(differ, `${kind} from ${values.constructor.name}`).toBe(0);
        }
      });
    }
  }

  it('gives the same pictures when a run draws all its layers on one grid object', () => {
    const [, grid] = grids[0];
    const n = grid.width * grid.height;
    const ls = edgyValues(n, LS_BREAKS, 6);
    const shade = Uint8Array.from({ length: n }, () => Math.floor(rnd() * 256));
    const shared = { ...grid };
    for (const [kind, values] of [['hillshade', shade], ['ls', ls], ['hillshade', shade]] as const) {
      const a = renderLayer({ kind, grid: shared, values });
      const b = renderLayer({ kind, grid: { ...grid }, values });
      if (!a.ok || !b.ok) throw new Error('render failed');
      expect(a.png.equals(b.png)).toBe(true);
      expect(a.bounds).toEqual(b.bounds);
    }
  });

  it('gives the same pictures when the scanlines go into a used scratch buffer', () => {
    const [, grid] = grids[0];
    const n = grid.width * grid.height;
    const ls = edgyValues(n, LS_BREAKS, 6);
    const shade = Uint8Array.from({ length: n }, () => Math.floor(rnd() * 256));
    const mask = ContributingAreaMask.fromArea(Float32Array.from({ length: n }, () => rnd() * 20_000), 10_000);
    for (const [kind, values] of [['hillshade', shade], ['ls', ls], ['concentrated-flow', mask]] as const) {
      const scratch = new Uint8Array(2 * n).fill(0xa5); // left over from earlier work
      const a = renderLayer({ kind, grid: { ...grid }, values, scratch });
      const b = renderLayer({ kind, grid: { ...grid }, values });
      if (!a.ok || !b.ok) throw new Error('render failed');
      expect(a.png.equals(b.png)).toBe(true);
    }
  });

  it('writes smooth 8-bit images Sub-filtered, decoding to the same colours', () => {
    const palette = Array.from({ length: 256 }, (_, v) => (v === 0 ? 0 : (((v << 24) | (v << 16) | (v << 8) | 255) >>> 0)));
    const indices = Uint8Array.from({ length: 37 * 11 }, (_, i) => (i * 7 + (i >> 3)) % 256);
    const png = encodePalettePng({ width: 37, height: 11, indices, palette }, { smooth: true });
    const got = pngIndices(png);
    expect(got.depth).toBe(8);
    expect(Array.from(got.indices)).toEqual(Array.from(indices));
    const out = decode(png);
    for (let i = 0; i < indices.length; i++) expect(out.pixel(i)).toEqual(indices[i] === 0 ? [0, 0, 0, 0] : [indices[i], indices[i], indices[i], 255]);
  });
});
