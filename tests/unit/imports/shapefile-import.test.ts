import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { parseBoundaryFile } from '../../../server/services/imports/parse-boundaries';
import { allPositions, boundary, fixture, fixtureJson, itemsOf, parseFixture } from './fixtures';

type RefFc = { source: string; features: { properties: { NAME: string }; geometry: { type: string; coordinates: unknown } }[] };

/** A zip built from the UTM fixture's entries, with some replaced or removed. */
async function utmZipWith(changes: Record<string, string | null>): Promise<Buffer> {
  const src = await JSZip.loadAsync(fixture('fields-utm15n-shp.zip'));
  const out = new JSZip();
  for (const f of Object.values(src.files)) out.file(f.name, await f.async('uint8array'));
  for (const [name, data] of Object.entries(changes)) {
    if (data === null) out.remove(name);
    else out.file(name, data);
  }
  return out.generateAsync({ type: 'nodebuffer' });
}

describe('zipped shapefile boundary import', () => {
  it('reprojects a UTM 15N (EPSG:32615) shapefile to WGS84 within 1e-6 degrees of GDAL', async () => {
    // Reference: GDAL 3.6.2 ogr2ogr -t_srs EPSG:4326 (PROJ) of the same .shp, recorded by
    // scripts/make-import-fixtures.ts in fields-utm15n.reference-wgs84.geojson.
    const reference = fixtureJson<RefFc>('fields-utm15n.reference-wgs84.geojson');
    expect(reference.source).toMatch(/^GDAL 3\.6\.2.*ogr2ogr .*-t_srs EPSG:4326/);
    const result = await parseFixture('fields-utm15n-shp.zip');
    expect(result.ok && result.format).toBe('shapefile');
    const items = itemsOf(result).map(boundary);
    expect(items).toHaveLength(reference.features.length);
    let worst = 0;
    items.forEach((item, i) => {
      const ref = reference.features[i].geometry;
      expect(item.geometry.type).toBe(ref.type);
      const ours = allPositions(item.geometry.coordinates);
      const theirs = allPositions(ref.coordinates);
      expect(ours).toHaveLength(theirs.length);
      ours.forEach((p, k) => {
        worst = Math.max(worst, Math.abs(p[0] - theirs[k][0]), Math.abs(p[1] - theirs[k][1]));
      });
    });
    expect(worst).toBeLessThan(1e-6);
  });

  it('keeps names from the .dbf, a hole as a second ring and two parts as a MultiPolygon', async () => {
    const items = itemsOf(await parseFixture('fields-utm15n-shp.zip')).map(boundary);
    expect(items.map((i) => i.name)).toEqual(['North Ridge', 'East Pasture', 'Creek Parcels']);
    expect(items[1].geometry).toMatchObject({ type: 'Polygon' });
    expect(items[1].geometry.coordinates).toHaveLength(2); // the pond is a hole
    expect(items[2].geometry.type).toBe('MultiPolygon');
    expect(items[2].geometry.coordinates).toHaveLength(2);
  });

  it('lands the fields on the demo farm, near 91.78 W 42.31 N', async () => {
    // Demo farm extent, UTM 15N 600000-601600 E, 4684000-4685200 N (data/demo/fields-utm.json).
    const items = itemsOf(await parseFixture('fields-utm15n-shp.zip')).map(boundary);
    for (const [lng, lat] of items.flatMap((i) => allPositions(i.geometry.coordinates))) {
      expect(lng).toBeGreaterThan(-91.79);
      expect(lng).toBeLessThan(-91.76);
      expect(lat).toBeGreaterThan(42.30);
      expect(lat).toBeLessThan(42.32);
    }
  });

  it('reads every layer of a zip, numbering features across layers', async () => {
    const items = itemsOf(await parseFixture('two-layers-shp.zip')).map(boundary);
    expect(items.map((i) => [i.index, i.name])).toEqual([
      [1, 'North Ridge'], [2, 'East Pasture'], [3, 'Creek Parcels'], [4, 'Mill Hill'], [5, 'Hay Ground'],
    ]);
  });

  it('refuses a projected shapefile without a .prj with 422 and the exact advice', async () => {
    const result = await parseFixture('fields-utm15n-no-prj-shp.zip');
    expect(result).toMatchObject({ ok: false, status: 422, error: 'missing_prj' });
    expect(!result.ok && result.message).toContain('he shapefile has no .prj; add it so Fieldshed knows the coordinate system');
    expect(!result.ok && result.message).toContain('600005, 4684805');
  });

  it('assumes WGS84 for a shapefile without a .prj whose coordinates are longitude/latitude, and says so', async () => {
    const result = await parseFixture('fields-wgs84-no-prj-shp.zip');
    expect(itemsOf(result).map((i) => boundary(i).name)).toEqual(['Mill Hill', 'Hay Ground']);
    expect(result.ok && result.warnings).toEqual([
      'Layer "fields-wgs84" has no .prj; its coordinates are within longitude/latitude range, so WGS84 (EPSG:4326) was assumed',
    ]);
  });

  it('refuses a .prj that proj4 cannot read with 422 instead of using raw metres', async () => {
    const buffer = await utmZipWith({ 'fields-utm15n.prj': 'LOCAL_CS["somewhere on the farm"]' });
    const result = await parseBoundaryFile({ buffer, originalName: 'fields.zip' });
    expect(result).toMatchObject({ ok: false, status: 422, error: 'unknown_projection' });
    expect(!result.ok && result.message).toMatch(/^Layer "fields-utm15n": the \.prj could not be understood/);
  });

  it('reads a layer without a .dbf, unnamed, with a warning', async () => {
    const buffer = await utmZipWith({ 'fields-utm15n.dbf': null });
    const result = await parseBoundaryFile({ buffer, originalName: 'fields.zip' });
    expect(itemsOf(result).map((i) => boundary(i).name)).toEqual([null, null, null]);
    expect(result.ok && result.warnings).toEqual(['Layer "fields-utm15n" has no .dbf, so its fields have no names']);
  });

  it('answers 400 for a zip without a .shp, listing what it holds', async () => {
    const result = await parseFixture('no-shp.zip');
    expect(result).toMatchObject({ ok: false, status: 400, error: 'no_shapefile_in_zip' });
    expect(!result.ok && result.message).toMatch(/^The zip holds no \.shp file \(it holds readme\.txt, fields\.dbf\)/);
  });

  it('answers 400 for a damaged .shp inside a good zip', async () => {
    const buffer = await utmZipWith({ 'fields-utm15n.shp': 'not a shapefile at all, just text' });
    const result = await parseBoundaryFile({ buffer, originalName: 'fields.zip' });
    expect(result).toMatchObject({ ok: false, status: 400, error: 'invalid_shapefile' });
    expect(!result.ok && result.message).toMatch(/^Layer "fields-utm15n": the \.shp could not be read/);
  });

  it('answers 413 for a zip that unpacks to more than 64 MB', async () => {
    // zip-bomb.zip: 65 MiB of zeros in about 64 KiB.
    expect(fixture('zip-bomb.zip').length).toBeLessThan(256 * 1024);
    const result = await parseFixture('zip-bomb.zip');
    expect(result).toMatchObject({ ok: false, status: 413, error: 'unzipped_too_large' });
    expect(!result.ok && result.message).toBe('The zip unpacks to more than 64 MB; upload only the layers with field boundaries.');
  });
});
