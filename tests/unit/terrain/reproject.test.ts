import { describe, expect, it } from 'vitest';
import { reprojectBoundary, converterBetween } from '../../../server/services/terrain/reproject';
import { renderLayer } from '../../../server/services/terrain/render-layer';

describe('reprojection of field boundaries', () => {
  it('puts WGS84 points where PROJ puts them in UTM 15N', () => {
    // Reference: PROJ 9 through Debian gdal-bin 3.6, `gdaltransform -s_srs EPSG:4326 -t_srs
    // EPSG:32615`, run once when this test was written: (−92.5, 42.3) → 541213.793, 4683206.784.
    const res = reprojectBoundary({ type: 'Polygon', coordinates: [[[-93, 0], [-92.5, 42.3], [-91.79, 42.305], [-93, 0]]] }, 32615);
    if (!res.ok) throw new Error(res.reason);
    const [a, b, c] = res.rings[0];
    // UTM definition: the central meridian (−93° for zone 15) on the equator is (500000, 0)
    expect(a[0]).toBeCloseTo(500000, 3);
    expect(a[1]).toBeCloseTo(0, 3);
    expect(b[0]).toBeCloseTo(541213.793, 2);
    expect(b[1]).toBeCloseTo(4683206.784, 2);
    expect(c[0]).toBeCloseTo(599730.077, 2); // same gdaltransform run
    expect(c[1]).toBeCloseTo(4684349.784, 2);
  });

  it('reprojects every ring of a MultiPolygon, holes included', () => {
    const ring = [[-91.78, 42.31], [-91.77, 42.31], [-91.77, 42.32], [-91.78, 42.31]];
    const res = reprojectBoundary({ type: 'MultiPolygon', coordinates: [[ring, ring], [ring]] }, 32615);
    expect(res.ok && res.rings.length).toBe(3);
  });

  it('refuses an unknown EPSG code as a value', () => {
    expect(reprojectBoundary({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 0]]] }, 999999)).toEqual({ ok: false, reason: 'unknown CRS EPSG:999999' });
  });

  it('renders a layer as PNG with WGS84 bounds around the grid', () => {
    const grid = { width: 20, height: 10, originX: 600000, originY: 4685000, cellSizeX: 5, cellSizeY: 5, epsg: 32615 };
    const values = new Float32Array(200).map((_, i) => i % 20);
    const res = renderLayer({ kind: 'slope-classes', grid, values });
    if (!res.ok) throw new Error(res.reason);
    expect(res.png.subarray(1, 4).toString()).toBe('PNG');
    const conv = converterBetween(32615, 4326);
    if (!conv.ok) throw new Error(conv.reason);
    const [lon, lat] = conv.converter.forward([600050, 4684975]);
    expect(lon).toBeGreaterThan(res.bounds.west);
    expect(lon).toBeLessThan(res.bounds.east);
    expect(lat).toBeGreaterThan(res.bounds.south);
    expect(lat).toBeLessThan(res.bounds.north);
    expect(res.legend).toHaveLength(6);
  });
});
