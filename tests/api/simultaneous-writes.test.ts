// Writes that arrive at the same moment: none is lost silently. A first save races to 409 for all
// but one (as a stale version does), and identical field creations sent at once store one field.
import { afterAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { Field, FieldGround } from '../../server/models';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

async function farmer() {
  const made = await makeFarm(['farmer']);
  return { farmId: made.farm.id, agent: await signedIn(ctx.app, made.users.farmer) };
}

describe('simultaneous writes', () => {
  it('stores one of eight simultaneous first-time ground saves without a version and answers the others 409', async () => {
    const { farmId, agent } = await farmer();
    const fieldId = (await agent.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.78, 42.31, 200, 'Race'))).body.id as number;
    const answers = await Promise.all(Array.from({ length: 8 }, (_, i) => agent.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 2 + i, slopeLengthM: 50 })));
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([200, 409, 409, 409, 409, 409, 409, 409]);
    const winner = answers.find((a) => a.status === 200)!;
    const stored = await FieldGround.findByPk(fieldId);
    expect(stored!.slopePct).toBe(winner.body.slopePct);
    expect(stored!.version).toBe(0);
    for (const loser of answers.filter((a) => a.status === 409)) expect(loser.body.error).toBe('stale_version');
  });

  it('stores one field for ten identical field creations sent at once, answering the rest 409 with the stored field', async () => {
    const { farmId, agent } = await farmer();
    const feature = squareFeature(-91.7, 42.3, 150, `Twin ${randomUUID().slice(0, 4)}`);
    const answers = await Promise.all(Array.from({ length: 10 }, () => agent.post(`/api/farms/${farmId}/fields`).send(feature)));
    expect(answers.map((a) => a.status).sort()).toEqual([201, ...Array(9).fill(409)]);
    const created = answers.find((a) => a.status === 201)!.body;
    for (const a of answers.filter((x) => x.status === 409)) {
      expect(a.body.error).toBe('duplicate_field');
      expect(a.body.message).toMatch(/^geometry: the farm already has this outline/);
      expect(a.body.details).toEqual({ fieldId: created.id });
    }
    expect(await Field.count({ where: { farmId } })).toBe(1);
  });

  it('rejects, in an import, a feature whose outline the farm already has, and stores the others', async () => {
    const { farmId, agent } = await farmer();
    const a = squareFeature(-91.6, 42.3, 150, 'A');
    await agent.post(`/api/farms/${farmId}/fields`).send(a).expect(201);
    const file = Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [a, squareFeature(-91.59, 42.3, 150, 'B')] }));
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', file, 'again.geojson');
    expect(res.status).toBe(201);
    expect(res.body.created.map((f: { properties: { name: string } }) => f.properties.name)).toEqual(['B']);
    expect(res.body.rejected[0]).toMatchObject({ index: 1, kind: 'same_as_field', reason: expect.stringContaining('"A"') });
  });
});
