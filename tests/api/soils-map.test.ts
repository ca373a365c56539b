// A farm's soil map: upload (GeoJSON or zipped shapefile), attribute names with sample values,
// the person's mapping, and per-field area-weighted K and T and soil-group mix, with the
// intersection areas checked against PostGIS and GeographicLib computed here independently.
import { afterAll, describe, expect, it } from 'vitest';
import geodesicModule from 'geographiclib-geodesic';
import { zip } from '@mapbox/shp-write';
import { QueryTypes } from 'sequelize';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';
import { featureOf, overlapOf, ringOf, type Box } from '../fixtures/soils/soil-fixtures';

const ctx = makeTestApp();
afterAll(() => ctx.close());
const { Geodesic } = geodesicModule as unknown as { Geodesic: { WGS84: { Polygon: (line: boolean) => GeoPolygon } } };
type GeoPolygon = { AddPoint: (lat: number, lon: number) => void; Compute: (reverse: boolean, sign: boolean) => { area: number } };

/** Area of a lon/lat rectangle with geodesic edges on the WGS84 ellipsoid (GeographicLib, Karney 2013). */
function geographicLibArea(b: Box): number {
  const p = Geodesic.WGS84.Polygon(false);
  for (const [lng, lat] of ringOf(b).slice(0, -1)) p.AddPoint(lat, lng);
  return Math.abs(p.Compute(false, true).area);
}
/** The same intersection computed by PostGIS directly from the two outlines (not from the stored rows). */
async function postgisOverlapM2(a: Box, b: Box): Promise<number> {
  const [r] = await ctx.sequelize.query<{ a: number }>(
    `SELECT ST_Area(ST_Intersection(ST_SetSRID(ST_GeomFromGeoJSON(:a), 4326), ST_SetSRID(ST_GeomFromGeoJSON(:b), 4326))::geography) AS a`,
    { replacements: { a: JSON.stringify(featureOf(a).geometry), b: JSON.stringify(featureOf(b).geometry) }, type: QueryTypes.SELECT },
  );
  return r.a;
}

const FIELD: Box = [-91.78, 42.31, -91.776, 42.313];
const UNIT_A: Box = [-91.785, 42.305, -91.7776, 42.32]; // west 60 % of the field
const UNIT_B: Box = [-91.7776, 42.305, -91.77, 42.32]; // east 40 %
const UNIT_FAR: Box = [-91.7, 42.3, -91.69, 42.31]; // under no field

const surveyAttributes = {
  a: { MUSYM: 'Ab2', KFFACT: '0.43', TFACT: 5, HYDGRP: 'C/D', TEXTURE: 'silty clay loam', DRAINAGECL: 'Somewhat poorly drained' },
  b: { MUSYM: 'Lo1', KFFACT: '0.24', TFACT: 3, HYDGRP: 'B', TEXTURE: 'Loam', DRAINAGECL: 'Well drained' },
  far: { MUSYM: 'Xx9', KFFACT: '0.10', TFACT: 1, HYDGRP: 'A', TEXTURE: 'sand', DRAINAGECL: 'Excessively drained' },
};
const surveyMap = (attrs = surveyAttributes) => ({
  type: 'FeatureCollection',
  features: [featureOf(UNIT_A, attrs.a), featureOf(UNIT_B, attrs.b), featureOf(UNIT_FAR, attrs.far)],
});

async function farmWithField() {
  const { farm, users } = await makeFarm(['farmer', 'advisor']);
  const agent = await signedIn(ctx.app, users.farmer);
  const field = await agent.post(`/api/farms/${farm.id}/fields`).send(featureOf(FIELD, { name: 'Mapped field' }));
  expect(field.status).toBe(201);
  return { farmId: farm.id, agent, advisor: await signedIn(ctx.app, users.advisor), fieldId: field.body.id as number };
}
const geojsonFile = (doc: unknown) => Buffer.from(JSON.stringify(doc));

describe('soil map upload and mapping', () => {
  it('stores map units, lists attribute names with sample values, and guesses a first mapping', async () => {
    const { farmId, advisor } = await farmWithField();
    const res = await advisor.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(surveyMap()), 'survey.geojson');
    expect(res.status).toBe(201);
    expect(res.body.map).toMatchObject({ originalName: 'survey.geojson', unitCount: 3 });
    expect(res.body.rejected).toEqual([]);
    expect(res.body.attributes.map((a: { name: string }) => a.name)).toEqual(['MUSYM', 'KFFACT', 'TFACT', 'HYDGRP', 'TEXTURE', 'DRAINAGECL']);
    const k = res.body.attributes.find((a: { name: string }) => a.name === 'KFFACT');
    expect(k).toEqual({ name: 'KFFACT', sampleValues: ['0.10', '0.24', '0.43'], distinctValues: 3 });
    expect(res.body.mapping).toEqual({ texture: 'TEXTURE', k: 'KFFACT', hsg: 'HYDGRP', t: 'TFACT', drainage: 'DRAINAGECL', kUnits: 'us' });
    expect(res.body.checks.k).toEqual({ attribute: 'KFFACT', understood: 3, notUnderstood: 0, examples: [] });
    const again = await advisor.get(`/api/farms/${farmId}/soil-map`);
    expect(again.body.mapping).toEqual(res.body.mapping);
  });

  it('lets the person map attribute names to meanings, and reports values it cannot read', async () => {
    const { farmId, agent } = await farmWithField();
    const odd = {
      a: { unit: 'A', erod: 0.43, tol: '5', grp: 'c/d', tx: 'SICL', drain: 'somewhat poorly' },
      b: { unit: 'B', erod: 0.24, tol: '3', grp: 'B', tx: 'gravelly loam', drain: 'well' },
      far: { unit: 'F', erod: 'n/a', tol: '9', grp: 'Z', tx: 'rock', drain: 'soggy' },
    } as unknown as typeof surveyAttributes;
    const up = await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(surveyMap(odd)), 'odd.geojson');
    expect(up.status).toBe(201);
    expect(up.body.mapping).toEqual({ texture: null, k: null, hsg: null, t: null, drainage: null, kUnits: 'us' });
    const put = await agent.put(`/api/farms/${farmId}/soil-map/mapping`).send({ texture: 'tx', k: 'erod', hsg: 'grp', t: 'tol', drainage: 'drain' });
    expect(put.status).toBe(200);
    expect(put.body.mapping).toMatchObject({ texture: 'tx', k: 'erod', hsg: 'grp', t: 'tol', drainage: 'drain' });
    for (const meaning of ['texture', 'k', 'hsg', 't', 'drainage']) {
      expect(put.body.checks[meaning], meaning).toMatchObject({ understood: 2, notUnderstood: 1 });
    }
    expect(put.body.checks.k.examples).toEqual(['n/a']);
    const bad = await agent.put(`/api/farms/${farmId}/soil-map/mapping`).send({ k: 'KFACT' });
    expect(bad.status).toBe(422);
    expect(bad.body.error).toBe('unknown_attribute');
    expect(bad.body.message).toMatch(/no attribute "KFACT"; its attributes are unit, erod, tol, grp, tx, drain/);
    const unset = await agent.put(`/api/farms/${farmId}/soil-map/mapping`).send({ drainage: null });
    expect(unset.body.mapping.drainage).toBeNull();
    expect(unset.body.checks.drainage).toBeUndefined();
  });

  it('reads a zipped shapefile with its attributes', async () => {
    const { farmId, agent, fieldId } = await farmWithField();
    const shp = (await zip(surveyMap() as GeoJSON.FeatureCollection, { outputType: 'nodebuffer', compression: 'DEFLATE', types: { polygon: 'soil_units' } })) as Buffer;
    const res = await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', shp, 'survey.zip');
    expect(res.status).toBe(201);
    expect(res.body.map.unitCount).toBe(3);
    expect(res.body.mapping.k).toBe('KFFACT');
    const units = await agent.get(`/api/fields/${fieldId}/soil-map-units`);
    expect(units.body.units.map((u: { kUs: number }) => u.kUs)).toEqual([0.43, 0.24]);
  });

  it('replaces the previous map on a new upload and removes it on request', async () => {
    const { farmId, agent, fieldId } = await farmWithField();
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(surveyMap()), 'one.geojson');
    const second = await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile({ type: 'FeatureCollection', features: [featureOf(UNIT_A, surveyAttributes.a)] }), 'two.geojson');
    expect(second.body.map).toMatchObject({ originalName: 'two.geojson', unitCount: 1 });
    expect((await agent.get(`/api/fields/${fieldId}/soil-map-units`)).body.units).toHaveLength(1);
    expect((await agent.delete(`/api/farms/${farmId}/soil-map`)).status).toBe(204);
    expect((await agent.get(`/api/farms/${farmId}/soil-map`)).body.map).toBeNull();
    expect((await agent.get(`/api/fields/${fieldId}/soil-map-units`)).body.units).toEqual([]);
  });

  it('repairs a self-intersecting map unit and says so; rejects units that are not areas', async () => {
    const { farmId, agent } = await farmWithField();
    const bowtie = { type: 'Feature', properties: { MUSYM: 'Bow' }, geometry: { type: 'Polygon', coordinates: [[[-91.78, 42.31], [-91.77, 42.32], [-91.77, 42.31], [-91.78, 42.32], [-91.78, 42.31]]] } };
    const line = { type: 'Feature', properties: { MUSYM: 'Line' }, geometry: { type: 'LineString', coordinates: [[-91.78, 42.31], [-91.77, 42.32]] } };
    const res = await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile({ type: 'FeatureCollection', features: [bowtie, line] }), 'odd.geojson');
    expect(res.status).toBe(201);
    expect(res.body.map.unitCount).toBe(1);
    expect(res.body.map.warnings.join(' ')).toMatch(/1 map unit outline was invalid .* and repaired/);
    expect(res.body.rejected).toHaveLength(1);
    expect(res.body.rejected[0]).toMatchObject({ index: 2 });
    expect(res.body.rejected[0].reason).toMatch(/LineString/);
  });

  const bad: [string, Buffer, string, number, string][] = [
    ['a PNG image', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]), 'map.geojson', 415, 'unsupported_file_type'],
    ['a KML file', Buffer.from('<?xml version="1.0"?><kml xmlns="http://www.opengis.net/kml/2.2"><Document/></kml>'), 'map.kml', 415, 'unsupported_file_type'],
    ['a file of points only', geojsonFile({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [-91.78, 42.31] } }] }), 'p.geojson', 422, 'nothing_imported'],
    ['broken JSON', Buffer.from('{"type": "FeatureCollection", '), 'b.geojson', 400, 'invalid_json'],
  ];
  for (const [what, buf, name, status, code] of bad) {
    it(`refuses ${what} with ${status} and keeps the farm's map as it was`, async () => {
      const { farmId, agent } = await farmWithField();
      await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(surveyMap()), 'kept.geojson');
      const res = await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', buf, name);
      expect(res.status).toBe(status);
      expect(res.body.error).toBe(code);
      expect((await agent.get(`/api/farms/${farmId}/soil-map`)).body.map).toMatchObject({ originalName: 'kept.geojson', unitCount: 3 });
    });
  }
});

describe('soil map intersected with fields', () => {
  it('gives each unit its area inside the field, as PostGIS and GeographicLib compute it', async () => {
    const { farmId, agent, fieldId } = await farmWithField();
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(surveyMap()), 'survey.geojson');
    const res = await agent.get(`/api/fields/${fieldId}/soil-map-units`);
    expect(res.status).toBe(200);
    expect(res.body.units.map((u: { featureIndex: number }) => u.featureIndex)).toEqual([1, 2]);
    const [a, b] = res.body.units as { areaM2: number; share: number }[];
    for (const [unit, box] of [[a, UNIT_A], [b, UNIT_B]] as const) {
      const overlap = overlapOf(box, FIELD)!;
      // PostGIS ST_Area(ST_Intersection(...)::geography) of the two outlines, computed here
      expect(Math.abs(unit.areaM2 - (await postgisOverlapM2(box, FIELD))) / unit.areaM2).toBeLessThan(1e-9);
      // GeographicLib (Karney 2013) area of the overlap rectangle, geodesic edges on WGS84
      expect(Math.abs(unit.areaM2 - geographicLibArea(overlap)) / unit.areaM2).toBeLessThan(1e-6);
    }
    expect(res.body.fieldAreaM2).toBeCloseTo(geographicLibArea(FIELD), 0);
    expect(res.body.mappedAreaM2 / res.body.fieldAreaM2).toBeCloseTo(1, 6);
    expect(a.share).toBeCloseTo(0.6, 2);
    expect(b.share).toBeCloseTo(0.4, 2);
  });

  it('gives the field area-weighted K and T, the soil-group mix and the dominant texture and drainage', async () => {
    const { farmId, agent, fieldId } = await farmWithField();
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(surveyMap()), 'survey.geojson');
    // A lab sample would give Williams K and group B by texture; the map wins for K, T and the group.
    await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'lab', sandPct: 40, siltPct: 40, clayPct: 20, organicMatterPct: 2.5 });
    const s = await agent.get(`/api/fields/${fieldId}/soil-summary`);
    expect(s.status).toBe(200);
    const aM2 = geographicLibArea(overlapOf(UNIT_A, FIELD)!);
    const bM2 = geographicLibArea(overlapOf(UNIT_B, FIELD)!);
    // By hand: K = Σ Kᵢ·aᵢ / Σ aᵢ with the areas from GeographicLib; T likewise
    expect(s.body.kUs).toBeCloseTo((0.43 * aM2 + 0.24 * bM2) / (aM2 + bM2), 6);
    expect(s.body.kSource).toEqual({ kind: 'derived', source: { title: 'soil map K' }, detail: expect.stringMatching(/area-weighted over the 100 % of the field/) });
    expect(s.body.tTonPerAcYr).toBeCloseTo((5 * aM2 + 3 * bM2) / (aM2 + bM2), 6);
    expect(s.body.tSource).toMatchObject({ kind: 'derived', source: { title: 'soil map T' } });
    expect(s.body.hsg).toBe('C/D');
    expect(s.body.hsgShares).toHaveLength(2);
    expect(s.body.hsgShares[0].group).toBe('C/D');
    expect(s.body.hsgShares[0].share).toBeCloseTo(aM2 / (aM2 + bM2), 9);
    expect(s.body.hsgShares[1]).toMatchObject({ group: 'B' });
    expect(s.body.hsgShares[0].share + s.body.hsgShares[1].share).toBeCloseTo(1, 12);
    // The field's own sample decides its texture (SSM ch. 3: 40/40/20 loam) over the map's dominant class.
    expect(s.body.textureClass).toBe('loam');
    // No gray recorded in the samples: the map's dominant drainage class (somewhat poorly, 60 %) stands.
    expect(s.body.drainageClass).toBe('somewhat poorly drained');
    expect(s.body.notWorthAmending).toBe(true);
    // A wet loam is wet ground, not problem clay (SSM ch. 3: loam has under 27 % clay).
    expect(s.body.problemClay).toBe(false);
    expect(s.body.problemClayReasons).toEqual([]);
  });

  it('weights K over the part of the field the map covers, and says how much that is', async () => {
    const { farmId, agent, fieldId } = await farmWithField();
    const onlyA = { type: 'FeatureCollection', features: [featureOf(UNIT_A, surveyAttributes.a)] };
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(onlyA), 'part.geojson');
    const s = await agent.get(`/api/fields/${fieldId}/soil-summary`);
    expect(s.body.kUs).toBeCloseTo(0.43, 9);
    expect(s.body.kSource.detail).toMatch(/over the 60 % of the field/);
    expect(s.body.hsgShares).toEqual([{ group: 'C/D', share: 1 }]);
  });

  it('reads K given in SI units when the mapping says so', async () => {
    const { farmId, agent, fieldId } = await farmWithField();
    const si = { type: 'FeatureCollection', features: [featureOf(FIELD, { K_SI: 0.1317 * 0.3 })] };
    await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', geojsonFile(si), 'si.geojson');
    await agent.put(`/api/farms/${farmId}/soil-map/mapping`).send({ k: 'K_SI', kUnits: 'si' });
    // AH-703 app. A: K SI = US × 0.1317
    expect((await agent.get(`/api/fields/${fieldId}/soil-summary`)).body.kUs).toBeCloseTo(0.3, 9);
  });
});
