// readDem reads an uncompressed Float32 GeoTIFF's strips where they lie in the file's bytes and
// leaves every other layout to geotiff.js's readRasters. Both must give the same grid: checked
// against readRasters itself, and on copies GDAL writes in many strips and compressed (Debian's
// gdal-bin; skipped with a warning when gdal_translate is missing, a failure in CI).
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { fromArrayBuffer } from 'geotiff';
import { readDem } from '../../../server/services/terrain/read-dem';
import { writeGeoTiff } from '../../../server/services/terrain/write-geotiff';

const W = 37, H = 23;
const z = new Float32Array(W * H).map((_, i) => (i % 11 === 0 ? -9999 : 250 + Math.sin(i / 7) * 12.5 + i * 1e-3));
const tif = writeGeoTiff({ width: W, height: H, samples: z, originX: 600000, originY: 4685000, cellSizeX: 5, cellSizeY: 5, epsg: 32615, nodata: -9999 });
const expected = Array.from(z, (v) => (v === -9999 ? NaN : v));

async function elevations(bytes: Uint8Array): Promise<number[]> {
  const res = await readDem(bytes);
  if (!res.ok) throw new Error(res.reason);
  expect([res.dem.width, res.dem.height, res.dem.originX, res.dem.originY]).toEqual([W, H, 600000, 4685000]);
  return Array.from(res.dem.elevationM);
}

const hasGdal = spawnSync('gdal_translate', ['--version']).status === 0;
const dir = mkdtempSync(join(tmpdir(), 'fieldshed-read-dem-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('reading the same DEM in different layouts', () => {
  it('reads an uncompressed Float32 file as geotiff.js readRasters does', async () => {
    const image = await (await fromArrayBuffer(tif.slice().buffer)).getImage();
    const raw = Array.from((await image.readRasters({ samples: [0], interleave: true })) as unknown as ArrayLike<number>, (v) => (v === -9999 ? NaN : v));
    expect(await elevations(tif)).toEqual(raw);
    expect(raw).toEqual(expected);
  });

  it.runIf(hasGdal || process.env.CI)('reads GDAL copies in 5-row strips, uncompressed and DEFLATE-compressed, to the same grid', async () => {
    if (!hasGdal) throw new Error('gdal_translate (Debian gdal-bin) is missing; install gdal-bin');
    const src = join(dir, 'src.tif');
    writeFileSync(src, tif);
    for (const options of [['-co', 'BLOCKYSIZE=5'], ['-co', 'BLOCKYSIZE=5', '-co', 'COMPRESS=DEFLATE']]) {
      const out = join(dir, `copy-${options.length}.tif`);
      execFileSync('gdal_translate', ['-q', ...options, src, out]);
      expect(await elevations(new Uint8Array(readFileSync(out)))).toEqual(expected);
    }
  });
});

/** A file's bytes in an ArrayBuffer of their own, as the terrain thread receives them. */
const ownBuffer = (bytes: Uint8Array): ArrayBuffer => new Uint8Array(bytes).buffer;

/** Where a classic little-endian TIFF keeps its StripOffsets (LONG values), and those offsets. */
function stripOffsets(file: Uint8Array): { at: number; offsets: number[] } {
  const v = new DataView(file.buffer, file.byteOffset, file.byteLength);
  const ifd = v.getUint32(4, true);
  for (let e = 0; e < v.getUint16(ifd, true); e++) {
    const entry = ifd + 2 + e * 12;
    if (v.getUint16(entry, true) !== 273) continue;
    expect(v.getUint16(entry + 2, true)).toBe(4);
    const count = v.getUint32(entry + 4, true);
    const at = count === 1 ? entry + 8 : v.getUint32(entry + 8, true);
    return { at, offsets: Array.from({ length: count }, (_, k) => v.getUint32(at + 4 * k, true)) };
  }
  throw new Error('no StripOffsets');
}

describe('reading an uncompressed Float32 file in place', () => {
  it('gives a view on the file’s own buffer, nodata turned into NaN there, when the caller hands over an ArrayBuffer', async () => {
    const buffer = ownBuffer(tif);
    const res = await readDem(buffer);
    if (!res.ok) throw new Error(res.reason);
    expect(res.dem.elevationM.buffer).toBe(buffer);
    expect(res.dem.elevationM.byteOffset).toBe(stripOffsets(tif).offsets[0]);
    expect(Array.from(res.dem.elevationM)).toEqual(expected);
  });

  it('copies a Uint8Array first and leaves its bytes as they were', async () => {
    const before = tif.slice();
    const res = await readDem(tif);
    if (!res.ok) throw new Error(res.reason);
    expect(res.dem.elevationM.buffer).not.toBe(tif.buffer);
    expect(tif).toEqual(before);
  });

  it.runIf(hasGdal || process.env.CI)('moves GDAL’s strips, which start off a 4-byte boundary, down within the buffer to the same grid', async () => {
    if (!hasGdal) throw new Error('gdal_translate (Debian gdal-bin) is missing; install gdal-bin');
    const src = join(dir, 'src-in-place.tif');
    writeFileSync(src, tif);
    for (const options of [[], ['-co', 'BLOCKYSIZE=5']]) {
      const out = join(dir, `in-place-${options.length}.tif`);
      execFileSync('gdal_translate', ['-q', ...options, src, out]);
      const file = new Uint8Array(readFileSync(out));
      const buffer = ownBuffer(file);
      const res = await readDem(buffer);
      if (!res.ok) throw new Error(res.reason);
      expect(res.dem.elevationM.buffer).toBe(buffer);
      expect(res.dem.elevationM.byteOffset % 4).toBe(0);
      expect(res.dem.elevationM.byteOffset).toBeLessThanOrEqual(stripOffsets(file).offsets[0]);
      expect(Array.from(res.dem.elevationM)).toEqual(expected);
    }
  });

  it.runIf(hasGdal || process.env.CI)('reads strips with a gap between them in place, and strips out of file order and big-endian files through geotiff.js, to the same grid', async () => {
    if (!hasGdal) throw new Error('gdal_translate (Debian gdal-bin) is missing; install gdal-bin');
    const src = join(dir, 'src-odd.tif');
    writeFileSync(src, tif);
    const out = join(dir, 'odd-strips.tif');
    execFileSync('gdal_translate', ['-q', '-co', 'BLOCKYSIZE=5', src, out]);
    const file = new Uint8Array(readFileSync(out));
    const { at, offsets } = stripOffsets(file);
    const stripBytes = offsets[1] - offsets[0];
    const set = (f: Uint8Array, k: number, offset: number) => new DataView(f.buffer).setUint32(at + 4 * k, offset, true);

    // The last strip moved 7 bytes further on: in file order, with a gap before it.
    const gap = new Uint8Array(file.byteLength + 7);
    gap.set(file);
    gap.copyWithin(offsets.at(-1)! + 7, offsets.at(-1)!, file.byteLength);
    set(gap, offsets.length - 1, offsets.at(-1)! + 7);
    const gapBuffer = ownBuffer(gap);
    const inPlace = await readDem(gapBuffer);
    if (!inPlace.ok) throw new Error(inPlace.reason);
    expect(inPlace.dem.elevationM.buffer).toBe(gapBuffer);
    expect(Array.from(inPlace.dem.elevationM)).toEqual(expected);

    // The first two strips swapped in the file: not in file order any more.
    const swapped = file.slice();
    swapped.set(file.subarray(offsets[1], offsets[1] + stripBytes), offsets[0]);
    swapped.set(file.subarray(offsets[0], offsets[1]), offsets[0] + stripBytes);
    set(swapped, 0, offsets[0] + stripBytes);
    set(swapped, 1, offsets[0]);
    const swappedBuffer = ownBuffer(swapped);
    const decoded = await readDem(swappedBuffer);
    if (!decoded.ok) throw new Error(decoded.reason);
    expect(decoded.dem.elevationM.buffer).not.toBe(swappedBuffer);
    expect(Array.from(decoded.dem.elevationM)).toEqual(expected);

    const big = join(dir, 'big-endian.tif');
    execFileSync('gdal_translate', ['-q', '-co', 'ENDIANNESS=BIG', src, big]);
    const bigBuffer = ownBuffer(new Uint8Array(readFileSync(big)));
    const bigRead = await readDem(bigBuffer);
    if (!bigRead.ok) throw new Error(bigRead.reason);
    expect(bigRead.dem.elevationM.buffer).not.toBe(bigBuffer);
    expect(Array.from(bigRead.dem.elevationM)).toEqual(expected);
  });
});
