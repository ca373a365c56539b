// Writes an indexed-colour (palette) PNG (PNG specification, W3C 2003, colour type 3): one index
// per pixel packed at 1, 2, 4 or 8 bits, a PLTE chunk of RGB entries and a tRNS chunk of their
// alphas. Rows use filter type 0 (none), which the specification recommends for palette images,
// and a low zlib level: class maps are long runs of one index, which deflate finds at once.
import { crc32, deflateSync } from 'node:zlib';

export type PaletteImage = {
  width: number;
  height: number;
  /** One palette index per pixel, row-major from the top-left. */
  indices: Uint8Array;
  /** Colours packed 0xRRGGBBAA, at most 256. */
  palette: ArrayLike<number>;
};

/**
 * zlib level 3: on the benchmark's 4 M-cell layers it writes the four pictures in ~0.6 of the time
 * level 6 (zlib's default) takes, 3 % larger; level 9 takes four times as long for 1 % less.
 */
const ZLIB_LEVEL = 3;
const SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

function chunk(type: string, data: Uint8Array): Buffer {
  const out = Buffer.alloc(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  out.write(type, 4, 'latin1');
  out.set(data, 8);
  out.writeUInt32BE(crc32(out.subarray(4, 8 + data.length)), 8 + data.length);
  return out;
}

/** Fewest bits per pixel that hold every palette index. */
function bitDepthFor(entries: number): 1 | 2 | 4 | 8 {
  return entries <= 2 ? 1 : entries <= 4 ? 2 : entries <= 16 ? 4 : 8;
}

export function encodePalettePng({ width, height, indices, palette }: PaletteImage): Buffer {
  if (indices.length !== width * height) throw new Error(`indices has ${indices.length} pixels, expected ${width * height}`);
  if (palette.length < 1 || palette.length > 256) throw new Error(`a palette has 1 to 256 colours, got ${palette.length}`);
  const depth = bitDepthFor(palette.length);
  const perByte = 8 / depth;
  const rowBytes = Math.ceil(width / perByte);
  // Each row: the filter byte (0, none), then the indices packed high bits first.
  const raw = new Uint8Array((rowBytes + 1) * height);
  for (let r = 0, p = 0, i = 0; r < height; r++) {
    raw[p++] = 0;
    if (depth === 8) {
      raw.set(indices.subarray(i, i + width), p);
      p += width;
      i += width;
      continue;
    }
    for (let b = 0; b < rowBytes; b++) {
      let byte = 0;
      for (let k = 0; k < perByte; k++) {
        const c = b * perByte + k;
        byte = (byte << depth) | (c < width ? indices[i + c] : 0);
      }
      raw[p++] = byte;
    }
    i += width;
  }
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = depth;
  header[9] = 3; // colour type: indexed
  const rgb = new Uint8Array(3 * palette.length);
  const alpha = new Uint8Array(palette.length);
  for (let k = 0; k < palette.length; k++) {
    const c = palette[k];
    rgb[3 * k] = c >>> 24;
    rgb[3 * k + 1] = (c >>> 16) & 255;
    rgb[3 * k + 2] = (c >>> 8) & 255;
    alpha[k] = c & 255;
  }
  let alphas = alpha.length; // trailing opaque entries may be left out of tRNS
  while (alphas > 0 && alpha[alphas - 1] === 255) alphas--;
  return Buffer.concat([
    SIGNATURE,
    chunk('IHDR', header),
    chunk('PLTE', rgb),
    ...(alphas > 0 ? [chunk('tRNS', alpha.subarray(0, alphas))] : []),
    chunk('IDAT', deflateSync(raw, { level: ZLIB_LEVEL })),
    chunk('IEND', new Uint8Array(0)),
  ]);
}
