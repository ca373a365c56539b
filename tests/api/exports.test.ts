// GET /api/farms/:farmId/export: GeoJSON, zipped shapefile and CSV of a farm's fields with their
// areas, the season's assessment and the plan's actions; a landowner's hold only their fields.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import { parseDbf, parseShp } from 'shpjs';
import { parse } from 'csv-parse/sync';
import type { MultiPolygon, Polygon } from 'geojson';
import { QueryTypes } from 'sequelize';
import { makeFarm, makeTestApp, makeUser, signedIn, squareFeature } from '../helpers/test-app';
import { FORMULA_TITLE, makePlanFarm } from '../helpers/plan-farm';

const ctx = makeTestApp();
afterAll(() => ctx.close());
let farm: Awaited<ReturnType<typeof makePlanFarm>>;
beforeAll(async () => {
  farm = await makePlanFarm(ctx.app, ctx.sequelize);
});

const url = (q: string) => `/api/farms/${farm.farm.id}/export?${q}`;
/** Each field's area on the WGS84 ellipsoid as PostGIS computes it from the stored outline, m². */
async function postgisAreas(): Promise<Map<number, number>> {
  const rows = await ctx.sequelize.query<{ id: number; a: number }>('SELECT id, ST_Area(geom::geography) AS a FROM fields WHERE farm_id = :farmId', {
    replacements: { farmId: farm.farm.id },
    type: QueryTypes.SELECT,
  });
  return new Map(rows.map((r) => [r.id, r.a]));
}

describe('farm export', () => {
  it('writes GeoJSON (RFC 7946) with every field, its area, assessment and planned actions', async () => {
    const res = await farm.agents.farmer.get(url(`format=geojson&season=${farm.season}`)).responseType('blob');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('application/geo+json');
    const name = farm.farm.name.toLowerCase().replace(/[^a-z0-9]+/g, '-');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${name}-${farm.season}-fields.geojson"`);
    const fc = JSON.parse((res.body as Buffer).toString('utf8'));
    expect(fc.type).toBe('FeatureCollection');
    // RFC 7946 §4: no crs member; coordinates are WGS84 longitude, latitude.
    expect(fc.crs).toBeUndefined();
    expect(fc.features.map((f: { properties: { name: string } }) => f.properties.name).sort()).toEqual(['Hay Ground', 'Long Slope', 'Mill Hill']);
    const areas = await postgisAreas();
    for (const f of fc.features) {
      expect(f.geometry.type).toBe('MultiPolygon');
      expect(f.properties.area_ha * 10_000).toBeCloseTo(areas.get(f.id)!, 0);
      expect(f.properties.season).toBe(farm.season);
    }
    const long = fc.features.find((f: { properties: { name: string } }) => f.properties.name === 'Long Slope').properties;
    expect(long.soil_loss_t_per_ha_yr).toBeGreaterThan(0);
    expect(long.a_over_t).toBeCloseTo(long.soil_loss_t_per_ha_yr / long.tolerance_t_per_ha_yr, 2);
    expect(long.risk_class).toEqual(expect.any(String));
    expect(long.planned_actions).toContain('Grassed waterway: 420 m, $15,960, ' + `${farm.season}-08-25`);
    expect(long.planned_cost).toBe(17580);
  });

  it('writes a zipped shapefile with a WGS84 .prj that shpjs reads back to the same fields and areas', async () => {
    const res = await farm.agents.advisor.get(url(`format=shapefile&season=${farm.season}`)).responseType('blob');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    const zip = await JSZip.loadAsync(res.body as Buffer);
    const files = Object.keys(zip.files).sort();
    const base = files.find((f) => f.endsWith('.shp'))!.slice(0, -4);
    expect(base).toMatch(/-fields$/);
    expect(files).toEqual(['.cpg', '.dbf', '.prj', '.shp', '.shx'].map((e) => base + e));
    const prj = await zip.file(`${base}.prj`)!.async('string');
    expect(prj).toContain('WGS_1984');
    const shapes = parseShp(await zip.file(`${base}.shp`)!.async('arraybuffer'), prj);
    const rows = parseDbf(await zip.file(`${base}.dbf`)!.async('arraybuffer'), await zip.file(`${base}.cpg`)!.async('string'));
    expect(rows.map((r) => r.name).sort()).toEqual(['Hay Ground', 'Long Slope', 'Mill Hill']);
    const areas = await postgisAreas();
    for (const [i, row] of rows.entries()) {
      const id = Number(row.field_id);
      // Area stored with the field: PostGIS ST_Area(geography), WGS84 ellipsoid.
      expect(Number(row.area_ha) * 10_000).toBeCloseTo(areas.get(id)!, 0);
      const g = shapes[i] as Polygon | MultiPolygon;
      const [[lng, lat]] = g.type === 'Polygon' ? g.coordinates[0] : g.coordinates[0][0];
      expect(lng).toBeGreaterThan(-92);
      expect(lng).toBeLessThan(-91);
      expect(lat).toBeCloseTo(42.3, 1);
    }
  });

  it("keeps a field's name readable in the shapefile's one-byte text (Latin-1, named in the .cpg)", async () => {
    const { farm: other, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    await agent.post(`/api/farms/${other.id}/fields`).send(squareFeature(-91.7, 42.3, 200, 'Écluse – Nord'));
    await agent.post(`/api/farms/${other.id}/seasons`).send({ label: '2027' });
    const res = await agent.get(`/api/farms/${other.id}/export?format=shapefile&season=2027`).responseType('blob');
    const zip = await JSZip.loadAsync(res.body as Buffer);
    const file = (ext: string) => zip.file(Object.keys(zip.files).find((f) => f.endsWith(ext))!)!;
    expect(await file('.cpg').async('string')).toBe('ISO-8859-1');
    const [row] = parseDbf(await file('.dbf').async('arraybuffer'), 'ISO-8859-1');
    expect(row.name).toBe('Écluse - Nord');
    const csv = await agent.get(`/api/farms/${other.id}/export?format=csv&season=2027`);
    expect(csv.text).toContain('Écluse – Nord');
  });

  it('writes one CSV row per field and neutralises cells a spreadsheet would run as a formula', async () => {
    const res = await farm.agents.farmer.get(url(`format=csv&season=${farm.season}`));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const rows = parse(res.text, { columns: true, bom: true }) as Record<string, string>[];
    expect(rows).toHaveLength(3);
    const hay = rows.find((r) => r.name === 'Hay Ground')!;
    // OWASP "CSV Injection": a cell starting with = + - @ tab or CR is written with a leading apostrophe.
    expect(hay.planned_actions.startsWith(`'${FORMULA_TITLE}`)).toBe(true);
    for (const r of rows) for (const cell of Object.values(r)) expect(cell).not.toMatch(/^[=+@\t\r]/);
    expect(rows.find((r) => r.name === 'Long Slope')!.area_ac).toMatch(/^\d+(\.\d+)?$/);
  });

  it("gives a landowner only their own fields and the approved plan's actions on them", async () => {
    for (const format of ['geojson', 'csv'] as const) {
      const res = await farm.agents.landowner.get(url(`format=${format}`)).responseType('blob');
      expect(res.status).toBe(200);
      const text = (res.body as Buffer).toString('utf8');
      expect(text).toContain('Mill Hill');
      expect(text).not.toContain('Long Slope');
      expect(text).not.toContain('Hay Ground');
      expect(text).toContain('Lime: 18.5 t');
      // The gypsum was added after approval: a draft the landowner does not see.
      expect(text).not.toContain('Gypsum');
    }
  });

  it('answers 404 to people who are not members of the farm, and 401 to nobody', async () => {
    const stranger = await signedIn(ctx.app, await makeUser());
    expect((await stranger.get(url('format=csv'))).status).toBe(404);
  });

  it('answers 400 naming the format or season that is wrong', async () => {
    const bad = await farm.agents.farmer.get(url('format=xlsx'));
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^format: format must be 'geojson', 'shapefile' or 'csv'/);
    const none = await farm.agents.farmer.get(url('season=2027'));
    expect(none.status).toBe(400);
    expect(none.body.message).toMatch(/^format:/);
    const season = await farm.agents.farmer.get(url('format=csv&season=%00x'));
    expect(season.status).toBe(400);
    expect(season.body.message).toMatch(/^season:/);
    const twice = await farm.agents.farmer.get(url('format=csv&season=2027&season=2028'));
    expect(twice.status).toBe(400);
    expect(twice.body.message).toMatch(/^season:/);
    expect((await farm.agents.farmer.get(url('format=csv&season=1999'))).status).toBe(404);
  });
});
