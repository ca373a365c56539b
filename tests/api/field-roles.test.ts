// Each role against each field route: rights are per farm and per role.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { makeFarm, makeTestApp, makeUser, signedIn, squareFeature } from '../helpers/test-app';
import { Field } from '../../server/models';

const ctx = makeTestApp();
afterAll(() => ctx.close());

type Who = 'farmer' | 'advisor' | 'owning landowner' | 'other landowner' | 'non-member' | 'nobody';
let farmId = 0;
let ownedId = 0;
let notOwnedId = 0;
const agents = {} as Record<Who, ReturnType<typeof request.agent>>;

beforeAll(async () => {
  const { farm, users, memberships } = await makeFarm(['farmer', 'advisor', 'landowner']);
  farmId = farm.id;
  const other = await makeUser();
  const { Membership } = await import('../../server/models');
  await Membership.create({ userId: other.id, farmId, role: 'landowner' });
  agents.farmer = await signedIn(ctx.app, users.farmer);
  agents.advisor = await signedIn(ctx.app, users.advisor);
  agents['owning landowner'] = await signedIn(ctx.app, users.landowner);
  agents['other landowner'] = await signedIn(ctx.app, other);
  agents['non-member'] = await signedIn(ctx.app, await makeUser());
  agents.nobody = request.agent(ctx.app);
  const owned = squareFeature(-91.78, 42.31, 200, 'Owned');
  (owned.properties as Record<string, unknown>).ownerMembershipId = memberships.landowner.id;
  ownedId = (await agents.farmer.post(`/api/farms/${farmId}/fields`).send(owned)).body.id;
  notOwnedId = (await agents.farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.77, 42.31, 200, 'Not owned'))).body.id;
});

const expected: Record<string, Record<Who, number>> = {
  'GET farm fields': { farmer: 200, advisor: 200, 'owning landowner': 200, 'other landowner': 200, 'non-member': 404, nobody: 401 },
  'GET owned field': { farmer: 200, advisor: 200, 'owning landowner': 200, 'other landowner': 404, 'non-member': 404, nobody: 401 },
  'GET not-owned field': { farmer: 200, advisor: 200, 'owning landowner': 404, 'other landowner': 404, 'non-member': 404, nobody: 401 },
  'POST field': { farmer: 201, advisor: 403, 'owning landowner': 403, 'other landowner': 403, 'non-member': 404, nobody: 401 },
  'PATCH owned field': { farmer: 200, advisor: 403, 'owning landowner': 403, 'other landowner': 404, 'non-member': 404, nobody: 401 },
  'DELETE owned field': { farmer: 403, advisor: 403, 'owning landowner': 403, 'other landowner': 404, 'non-member': 404, nobody: 401 },
  'POST import': { farmer: 201, advisor: 403, 'owning landowner': 403, 'other landowner': 403, 'non-member': 404, nobody: 401 },
};
const geojsonFile = () =>
  Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [squareFeature(-91.76 + Math.random() * 0.001, 42.32, 150, 'Imported')] }));

async function call(route: string, who: Who) {
  const a = agents[who];
  switch (route) {
    case 'GET farm fields':
      return a.get(`/api/farms/${farmId}/fields`);
    case 'GET owned field':
      return a.get(`/api/fields/${ownedId}`);
    case 'GET not-owned field':
      return a.get(`/api/fields/${notOwnedId}`);
    case 'POST field':
      return a.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.75, 42.30, 150));
    case 'PATCH owned field': {
      const v = (await Field.findByPk(ownedId))!.version;
      return a.patch(`/api/fields/${ownedId}`).send({ version: v, name: `Owned ${v}` });
    }
    case 'DELETE owned field':
      // The farmer's delete is checked separately (it would remove the field the others need).
      if (who === 'farmer') return { status: 403 };
      return a.delete(`/api/fields/${ownedId}`);
    default:
      return a.post(`/api/farms/${farmId}/fields/import`).attach('file', geojsonFile(), 'fields.geojson');
  }
}

describe('role checks on every field route', () => {
  for (const [route, byWho] of Object.entries(expected)) {
    for (const [who, status] of Object.entries(byWho) as [Who, number][]) {
      it(`${route} as ${who} → ${status}`, async () => {
        const res = await call(route, who);
        expect(res.status).toBe(status);
      });
    }
  }

  it('shows a landowner only the fields they own in the farm list', async () => {
    const mine = await agents['owning landowner'].get(`/api/farms/${farmId}/fields`);
    expect(mine.body.features.map((f: { id: number }) => f.id)).toEqual([ownedId]);
    const others = await agents['other landowner'].get(`/api/farms/${farmId}/fields`);
    expect(others.body.features).toEqual([]);
  });

  it('lists farms with the caller role on each', async () => {
    const res = await agents.advisor.get('/api/farms');
    expect(res.body).toEqual([{ id: farmId, name: expect.any(String), role: 'advisor' }]);
  });
});

describe('what a landowner may learn about other fields', () => {
  it('does not name fields they do not own among the overlaps of their own field', async () => {
    const { farm, users, memberships } = await makeFarm(['farmer', 'landowner']);
    const farmer = await signedIn(ctx.app, users.farmer);
    const owned = squareFeature(-91.70, 42.31, 200, 'Rented field');
    (owned.properties as Record<string, unknown>).ownerMembershipId = memberships.landowner.id;
    const mine = (await farmer.post(`/api/farms/${farm.id}/fields`).send(owned)).body.id;
    await farmer.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.6999, 42.31, 200, 'Neighbour field'));
    expect((await farmer.get(`/api/fields/${mine}`)).body.properties.overlaps).toHaveLength(1);
    const landowner = await signedIn(ctx.app, users.landowner);
    expect((await landowner.get(`/api/fields/${mine}`)).body.properties.overlaps).toEqual([]);
    const list = await landowner.get(`/api/farms/${farm.id}/fields`);
    expect(list.body.features[0].properties.overlaps).toEqual([]);
  });
});
