// Palette PNGs decode to the colours they were given (decoded by pngjs, an independent PNG
// reader), at every bit depth, and the map layers drawn with them show the published colours:
// ColorBrewer YlOrBr 5-class (Brewer, colorbrewer2.org) for classes, grey for shaded relief.
import { describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import { encodePalettePng } from '../../../server/services/terrain/palette-png';
import { FLOW_BLUE, LS_BREAKS, renderLayer, YLORBR_5 } from '../../../server/services/terrain/render-layer';
import { ContributingAreaMask } from '../../../server/services/terrain/contributing-area-mask';
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
