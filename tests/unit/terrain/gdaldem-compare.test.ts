// Reference: `gdaldem slope -p` from Debian's gdal-bin (GDAL 3.6, Horn's method), run on the
// same GeoTIFF, compared cell by cell. In CI (process.env.CI set) a missing gdaldem is a failure;
// elsewhere the comparison is skipped with a printed reason.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readDem } from '../../../server/services/terrain/read-dem';
import { slopeHorn } from '../../../server/services/terrain/slope-horn';
import { writeGeoTiff } from '../../../server/services/terrain/write-geotiff';
import { seededRandom } from './helpers';

// `gdaldem --version` prints the version but exits 1 (GDAL 3.6), so look at what it printed.
const probe = spawnSync('gdaldem', ['--version'], { encoding: 'utf8' });
const hasGdaldem = !probe.error && /GDAL \d/.test(`${probe.stdout}`);
const dir = mkdtempSync(join(tmpdir(), 'fieldshed-gdaldem-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

if (!hasGdaldem && !process.env.CI) {
  console.warn('gdaldem-compare: skipped, gdaldem not found (install Debian gdal-bin to run the comparison)');
}

async function compare(tifPath: string, computeEdges: boolean): Promise<{ maxAbsDiffPct: number; nodataMismatches: number; cells: number }> {
  if (!hasGdaldem) throw new Error('gdaldem (Debian gdal-bin) is missing: it is the reference for the slope comparison; install gdal-bin');
  const out = join(dir, `slope-${computeEdges ? 'edges' : 'plain'}.tif`);
  execFileSync('gdaldem', ['slope', '-p', '-q', ...(computeEdges ? ['-compute_edges'] : []), tifPath, out]);
  const mine = await readDem(readFileSync(tifPath));
  const ref = await readDem(readFileSync(out));
  if (!mine.ok || !ref.ok) throw new Error('could not read the GeoTIFFs');
  const s = slopeHorn(mine.dem, { computeEdges });
  const r = ref.dem.elevationM;
  let maxAbsDiffPct = 0, nodataMismatches = 0;
  for (let i = 0; i < s.length; i++) {
    if (Number.isNaN(s[i]) !== Number.isNaN(r[i])) { nodataMismatches++; continue; }
    if (!Number.isNaN(s[i])) maxAbsDiffPct = Math.max(maxAbsDiffPct, Math.abs(s[i] - r[i]));
  }
  return { maxAbsDiffPct, nodataMismatches, cells: s.length };
}

describe.skipIf(!hasGdaldem && !process.env.CI)('slope grid against gdaldem slope (Debian gdal-bin)', () => {
  it('matches gdaldem on the demo DEM cell by cell within 1e-3 %', async () => {
    const res = await compare('data/demo/dem.tif', false);
    expect(res.nodataMismatches).toBe(0);
    expect(res.maxAbsDiffPct).toBeLessThan(1e-3);
  });

  it('matches gdaldem on a rough random DEM with nodata holes, with and without -compute_edges', async () => {
    const w = 150, h = 110, rnd = seededRandom(2024);
    const z = new Float32Array(w * h);
    for (let r = 0; r < h; r++) {
      for (let c = 0; c < w; c++) z[r * w + c] = 180 + 0.4 * c + 6 * Math.sin(r / 7) * Math.cos(c / 11) + rnd() * 4;
    }
    for (let k = 0; k < 40; k++) z[Math.floor(rnd() * w * h)] = -9999;
    const path = join(dir, 'random.tif');
    writeFileSync(path, writeGeoTiff({ width: w, height: h, samples: z, originX: 500000, originY: 4600000, cellSizeX: 2, cellSizeY: 2, epsg: 32615, nodata: -9999 }));
    for (const edges of [false, true]) {
      const res = await compare(path, edges);
      expect(res.nodataMismatches, `nodata cells differ (computeEdges ${edges})`).toBe(0);
      expect(res.maxAbsDiffPct, `max |slope − gdaldem| (computeEdges ${edges})`).toBeLessThan(1e-3);
    }
  });
});

describe('gdaldem availability', () => {
  it('is present when CI is set (the slope reference must run in CI)', () => {
    if (process.env.CI) expect(hasGdaldem, 'gdaldem not found: install Debian gdal-bin (the reference for slope)').toBe(true);
  });
});
