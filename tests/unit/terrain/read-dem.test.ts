import { describe, expect, it } from 'vitest';
import { readDem } from '../../../server/services/terrain/read-dem';
import { writeGeoTiff } from '../../../server/services/terrain/write-geotiff';
import { slopeHorn } from '../../../server/services/terrain/slope-horn';

describe('reading a GeoTIFF DEM', () => {
  it('reads size, geotransform, nodata and the EPSG code', async () => {
    const z = Float32Array.from([1, 2, 3, -9999, 5, 6]);
    const res = await readDem(writeGeoTiff({ width: 3, height: 2, samples: z, originX: 600000, originY: 4685000, cellSizeX: 5, cellSizeY: 5, epsg: 32615, nodata: -9999 }));
    if (!res.ok) throw new Error(res.reason);
    expect(res.dem).toMatchObject({ width: 3, height: 2, originX: 600000, originY: 4685000, cellSizeX: 5, cellSizeY: 5, epsg: 32615, geographic: false, nodata: -9999 });
    expect(Number.isNaN(res.dem.elevationM[3])).toBe(true);
  });

  it('reads Int16 DEMs', async () => {
    const res = await readDem(writeGeoTiff({ width: 2, height: 1, samples: Int16Array.of(10, -32768), originX: 0, originY: 10, cellSizeX: 1, cellSizeY: 1, epsg: 32615, nodata: -32768 }));
    expect(res.ok && Array.from(res.dem.elevationM)).toEqual([10, NaN]);
  });

  it('refuses a file that is not a GeoTIFF', async () => {
    const res = await readDem(new TextEncoder().encode('hello, not a tiff'));
    expect(res.ok).toBe(false);
    expect(!res.ok && res.reason).toMatch(/^not a GeoTIFF/);
  });

  it('refuses a GeoTIFF without an EPSG code', async () => {
    const res = await readDem(writeGeoTiff({ width: 1, height: 1, samples: Float32Array.of(1), originX: 0, originY: 1, cellSizeX: 1, cellSizeY: 1, epsg: 32767 }));
    expect(res.ok).toBe(false);
    expect(!res.ok && res.reason).toMatch(/^no CRS/);
  });

  it('gives a geographic DEM metric cell sizes per row, so a slope comes out in percent', async () => {
    // 1 arc-second cells at 42°N: WGS84 radii give ≈ 22.97 m east-west and ≈ 30.87 m north-south
    // (M and N of the ellipsoid; standard geodesy formulas, values computed here [memory for the rounding]).
    const w = 5, h = 5, d = 1 / 3600;
    const z = new Float32Array(w * h).map((_, i) => (i % w) * 0.2297); // 1 % eastward rise
    const res = await readDem(writeGeoTiff({ width: w, height: h, samples: z, originX: -92, originY: 42 + (h / 2) * d, cellSizeX: d, cellSizeY: d, epsg: 4326 }));
    if (!res.ok) throw new Error(res.reason);
    expect(res.dem.geographic).toBe(true);
    expect(res.dem.rowCellSizeXM[2]).toBeCloseTo(22.97, 1);
    expect(res.dem.rowCellSizeYM[2]).toBeCloseTo(30.87, 1);
    expect(slopeHorn(res.dem)[12]).toBeCloseTo(1, 2);
  });
});
