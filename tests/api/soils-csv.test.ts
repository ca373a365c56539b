// Soil sample CSV upload: one lab sample per row, an error per bad row naming row and column,
// nothing stored from a file with bad rows unless the good rows are accepted.
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());
const fixture = (name: string) => readFileSync(path.join('tests/fixtures/soils', name));

async function fieldWithAgent() {
  const { farm, users } = await makeFarm(['farmer']);
  const agent = await signedIn(ctx.app, users.farmer);
  const field = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200));
  return { agent, fieldId: field.body.id as number };
}
const count = async (agent: Awaited<ReturnType<typeof fieldWithAgent>>['agent'], fieldId: number) =>
  (await agent.get(`/api/fields/${fieldId}/soil-samples`)).body.length as number;

describe('uploading soil samples as CSV', () => {
  it('stores every row of a good file with its texture class and drainage', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', fixture('good-samples.csv'), 'samples.csv');
    expect(res.status).toBe(201);
    expect(res.body.rejected).toEqual([]);
    const byLabel = Object.fromEntries(res.body.created.map((s: { label: string }) => [s.label, s]));
    // SSM ch. 3: 40/40/20 loam; 15/35/50 clay (clay ≥ 40, sand ≤ 45, silt < 40)
    expect(byLabel['North end']).toMatchObject({ kind: 'lab', textureClass: 'loam', ph: 6.1, bufferPh: 6.7, bulkDensity: 1.35, cecCmolPerKg: 14, espPct: 1.2, sampledOn: '2026-04-12' });
    // drainage key (drainage-key.json): gray < 25 cm poorly drained; 50–100 moderately well
    expect(byLabel['Low corner']).toMatchObject({ textureClass: 'clay', depthToGrayCm: 20, drainageClass: 'poorly drained' });
    expect(byLabel.Middle).toMatchObject({ textureClass: null, drainageClass: 'moderately well drained' });
    expect(await count(agent, fieldId)).toBe(3);
  });

  it('refuses a file with bad rows, naming each row and column, and stores nothing', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', fixture('bad-rows.csv'), 'bad.csv');
    expect(res.status).toBe(422);
    expect(res.body.error).toBe('csv_rows_invalid');
    expect(res.body.message).toMatch(/nothing was stored/);
    expect(res.body.message).toMatch(/store only the/);
    const rejected = res.body.details.rejected as { row: number; reason: string }[];
    expect(rejected.map((r) => r.row)).toEqual([3, 4, 6, 7]);
    expect(rejected[0].reason).toMatch(/^row 3, column sand_pct, silt_pct, clay_pct: sand \+ silt \+ clay add up to 90 %/);
    expect(rejected[1].reason).toBe('row 4, column organic_matter_pct: "lots" is not a number');
    expect(rejected[2].reason).toMatch(/^row 6, column sampled_on: sampled_on must be a date written YYYY-MM-DD/);
    expect(rejected[3].reason).toMatch(/^row 7, column ph: ph must be at most 11/);
    expect(await count(agent, fieldId)).toBe(0);
  });

  it('stores the good rows and reports the bad ones when acceptGoodRows=true', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent
      .post(`/api/fields/${fieldId}/soil-samples/import`)
      .field('acceptGoodRows', 'true')
      .attach('file', fixture('bad-rows.csv'), 'bad.csv');
    expect(res.status).toBe(201);
    expect(res.body.created.map((s: { label: string }) => s.label).sort()).toEqual(['Good one', 'Good two']);
    // SSM ch. 3: 10/57/33 silty clay loam (27 ≤ clay < 40, sand ≤ 20)
    expect(res.body.created.find((s: { label: string }) => s.label === 'Good two').textureClass).toBe('silty clay loam');
    expect(res.body.rejected.map((r: { row: number }) => r.row)).toEqual([3, 4, 6, 7]);
    expect(await count(agent, fieldId)).toBe(2);
  });

  it('reads semicolon-separated files with decimal commas and columns in any order', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const csv = 'Clay_pct;Sand_pct;Silt_pct;pH;Label\n19,6;39,2;39,2;6,2;Renormalised\n';
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', Buffer.from(csv), 'eu.csv');
    expect(res.status).toBe(201);
    // 39.2/39.2/19.6 sums to 98 → 40/40/20 → loam (SSM ch. 3)
    expect(res.body.created[0]).toMatchObject({ label: 'Renormalised', textureClass: 'loam', ph: 6.2 });
    expect(res.body.created[0].clayPct).toBeCloseTo(20, 9);
  });

  const whole: [string, Buffer, number, string][] = [
    ['an unknown column', Buffer.from('label,sand,silt,clay\nA,40,40,20\n'), 422, 'csv_header_invalid'],
    ['a header with no rows', Buffer.from('label,sand_pct,silt_pct,clay_pct\n'), 422, 'csv_empty'],
    ['an empty file', Buffer.alloc(0), 400, 'empty_file'],
    ['a binary file', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), 415, 'unsupported_file_type'],
  ];
  for (const [what, buf, status, code] of whole) {
    it(`refuses ${what} with ${status} and stores nothing`, async () => {
      const { agent, fieldId } = await fieldWithAgent();
      const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', buf, 'x.csv');
      expect(res.status).toBe(status);
      expect(res.body.error).toBe(code);
      expect(res.body.message.length).toBeGreaterThan(10);
      expect(await count(agent, fieldId)).toBe(0);
    });
  }

  it('reads the buffer method beside the buffer pH, and rejects a row with an unknown one by its column', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const csv = 'label,ph,buffer_ph,buffer_method\nA,5.6,6.4,smp\nB,5.5,6.3,woodruff\n';
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).field('acceptGoodRows', 'true').attach('file', Buffer.from(csv), 'lab.csv');
    expect(res.status).toBe(201);
    expect(res.body.created).toHaveLength(1);
    expect(res.body.created[0]).toMatchObject({ label: 'A', bufferPh: 6.4, bufferMethod: 'smp' });
    expect(res.body.rejected).toEqual([{ row: 3, reason: expect.stringMatching(/row 3, column buffer_method: buffer_method must be 'smp' or 'mehlich'/) }]);
  });

  it('names the columns it reads when the header has an unknown one', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', Buffer.from('label,sand\nA,40\n'), 'x.csv');
    expect(res.body.message).toMatch(/\(sand\)/);
    expect(res.body.message).toMatch(/label, sampled_on, depth_top_cm, depth_bottom_cm, sand_pct, silt_pct, clay_pct, organic_matter_pct, ph, buffer_ph, buffer_method, depth_to_gray_cm, bulk_density, cec, esp/);
  });

  it('refuses a CSV larger than 1 MB with 413', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const big = Buffer.from('label,ph\n' + 'x,6.0\n'.repeat(Math.ceil((1024 * 1024) / 6) + 10));
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).attach('file', big, 'big.csv');
    expect(res.status).toBe(413);
    expect(await count(agent, fieldId)).toBe(0);
  });

  it('asks for the file part when none is attached', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const res = await agent.post(`/api/fields/${fieldId}/soil-samples/import`).field('acceptGoodRows', 'true');
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('no_file');
  });
});
