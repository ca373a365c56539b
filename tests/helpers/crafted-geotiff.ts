// Hand-built GeoTIFFs whose header says what a test needs, whatever their cells are: a grid far
// larger than its file (a deflated strip of zeros), a header declaring more cells than the file
// could hold, a header cut short. Little-endian classic TIFF (TIFF 6.0, part 1) with GeoTIFF 1.0
// tags: ModelPixelScale, ModelTiepoint and a GeoKeyDirectory naming EPSG:32615 (UTM zone 15N).
import { createDeflate } from 'node:zlib';

const SHORT = 3;
const LONG = 4;
const DOUBLE = 12;

type Entry = { tag: number; type: number; values: number[] };

/** A one-strip Float32 GeoTIFF of `width` × `height` cells whose strip holds `strip` as it is. */
export function craftedGeoTiff(o: { width: number; height: number; compression: 1 | 8; strip: Buffer; originX?: number; originY?: number; cellM?: number }): Buffer {
  const entries: Entry[] = [
    { tag: 256, type: LONG, values: [o.width] },
    { tag: 257, type: LONG, values: [o.height] },
    { tag: 258, type: SHORT, values: [32] },
    { tag: 259, type: SHORT, values: [o.compression] },
    { tag: 262, type: SHORT, values: [1] },
    { tag: 273, type: LONG, values: [0] }, // strip offset, set below
    { tag: 277, type: SHORT, values: [1] },
    { tag: 278, type: LONG, values: [o.height] },
    { tag: 279, type: LONG, values: [o.strip.length] },
    { tag: 339, type: SHORT, values: [3] },
    { tag: 33550, type: DOUBLE, values: [o.cellM ?? 5, o.cellM ?? 5, 0] },
    { tag: 33922, type: DOUBLE, values: [0, 0, 0, o.originX ?? 600000, o.originY ?? 4684400, 0] },
    { tag: 34735, type: SHORT, values: [1, 1, 0, 2, 1024, 0, 1, 1, 3072, 0, 1, 32615] },
  ];
  const size = (e: Entry) => e.values.length * (e.type === DOUBLE ? 8 : e.type === LONG ? 4 : 2);
  const ifdBytes = 2 + entries.length * 12 + 4;
  let extra = 8 + ifdBytes;
  const extraAt = new Map<Entry, number>();
  for (const e of entries) {
    if (size(e) <= 4) continue;
    extraAt.set(e, extra);
    extra += size(e);
  }
  entries[5].values = [extra];
  const out = Buffer.alloc(extra + o.strip.length);
  out.write('II', 0, 'latin1');
  out.writeUInt16LE(42, 2);
  out.writeUInt32LE(8, 4);
  out.writeUInt16LE(entries.length, 8);
  entries.forEach((e, i) => {
    const at = 10 + i * 12;
    out.writeUInt16LE(e.tag, at);
    out.writeUInt16LE(e.type, at + 2);
    out.writeUInt32LE(e.values.length, at + 4);
    const where = extraAt.get(e);
    if (where !== undefined) out.writeUInt32LE(where, at + 8);
    let p = where ?? at + 8;
    for (const v of e.values) {
      if (e.type === DOUBLE) p = out.writeDoubleLE(v, p);
      else if (e.type === LONG) p = out.writeUInt32LE(v, p);
      else p = out.writeUInt16LE(v, p);
    }
  });
  o.strip.copy(out, extra);
  return out;
}

/** `bytes` zero bytes, deflated (zlib) without holding them all at once: about 1 byte per 1000. */
export async function deflatedZeros(bytes: number): Promise<Buffer> {
  const z = createDeflate({ level: 9 });
  const parts: Buffer[] = [];
  z.on('data', (d: Buffer) => parts.push(d));
  const done = new Promise<void>((resolve, reject) => (z.on('end', resolve), z.on('error', reject)));
  const chunk = Buffer.alloc(1 << 20);
  for (let left = bytes; left > 0; left -= chunk.length) {
    if (!z.write(left >= chunk.length ? chunk : chunk.subarray(0, left))) await new Promise((r) => z.once('drain', r));
  }
  z.end();
  await done;
  return Buffer.concat(parts);
}
