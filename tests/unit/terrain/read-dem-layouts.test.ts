// readDem copies an uncompressed Float32 GeoTIFF's strips straight from the file's bytes and
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
