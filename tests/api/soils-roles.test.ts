// Each role against each soils route (the advisor
// edits soils too): farmer and advisor change samples, photos and the soil map; a landowner reads
// the samples, photos, map units and summary of fields they own; others get 404; nobody 401.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { makeFarm, makeTestApp, makeUser, signedIn } from '../helpers/test-app';
import { Membership } from '../../server/models';
import { featureOf, makeImage, type Box } from '../fixtures/soils/soil-fixtures';

const ctx = makeTestApp();
afterAll(() => ctx.close());

type Who = 'farmer' | 'advisor' | 'owning landowner' | 'other landowner' | 'non-member' | 'nobody';
const WHO: Who[] = ['farmer', 'advisor', 'owning landowner', 'other landowner', 'non-member', 'nobody'];
const agents = {} as Record<Who, ReturnType<typeof request.agent>>;
let farmId = 0;
let ownedId = 0;
let png: Buffer;
const OWNED: Box = [-91.78, 42.31, -91.777, 42.312];
const soilMapFile = () => Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [featureOf([-91.79, 42.3, -91.77, 42.32], { KFFACT: 0.32, HYDGRP: 'C' })] }));

beforeAll(async () => {
  const { farm, users, memberships } = await makeFarm(['farmer', 'advisor', 'landowner']);
  farmId = farm.id;
  const other = await makeUser();
  await Membership.create({ userId: other.id, farmId, role: 'landowner' });
  agents.farmer = await signedIn(ctx.app, users.farmer);
  agents.advisor = await signedIn(ctx.app, users.advisor);
  agents['owning landowner'] = await signedIn(ctx.app, users.landowner);
  agents['other landowner'] = await signedIn(ctx.app, other);
  agents['non-member'] = await signedIn(ctx.app, await makeUser());
  agents.nobody = request.agent(ctx.app);
  ownedId = (await agents.farmer.post(`/api/farms/${farmId}/fields`).send(featureOf(OWNED, { name: 'Owned', ownerMembershipId: memberships.landowner.id }))).body.id;
  png = await makeImage('png', 30, 20);
  expect((await agents.farmer.post(`/api/farms/${farmId}/soil-map`).attach('file', soilMapFile(), 'map.geojson')).status).toBe(201);
});

const read = { farmer: 200, advisor: 200, 'owning landowner': 200, 'other landowner': 404, 'non-member': 404, nobody: 401 } as const;
const created = { farmer: 201, advisor: 201, 'owning landowner': 403, 'other landowner': 404, 'non-member': 404, nobody: 401 } as const;
const changed = { ...created, farmer: 200, advisor: 200 } as const;
const removed = { ...created, farmer: 204, advisor: 204 } as const;
const farmRead = { farmer: 200, advisor: 200, 'owning landowner': 403, 'other landowner': 403, 'non-member': 404, nobody: 401 } as const;
const farmCreated = { ...farmRead, farmer: 201, advisor: 201 } as const;
const farmRemoved = { ...farmRead, farmer: 204, advisor: 204 } as const;

const expected: Record<string, Record<Who, number>> = {
  'GET samples': read,
  'POST sample': created,
  'POST samples CSV': created,
  'PATCH sample': changed,
  'DELETE sample': removed,
  'GET photos': read,
  'POST photo': created,
  'GET photo image': read,
  'GET photo thumbnail': read,
  'DELETE photo': removed,
  'GET soil map': farmRead,
  'POST soil map': farmCreated,
  'PUT soil map mapping': farmRead,
  'DELETE soil map': farmRemoved,
  'GET field map units': read,
  'GET soil summary': read,
};

const newSample = async () => (await agents.farmer.post(`/api/fields/${ownedId}/soil-samples`).send({ kind: 'feel', balls: false })).body as { id: number; version: number };
const newPhoto = async () => (await agents.farmer.post(`/api/fields/${ownedId}/soil-photos`).attach('file', png, 'p.png')).body as { id: number };

async function call(route: string, who: Who) {
  const a = agents[who];
  switch (route) {
    case 'GET samples':
      return a.get(`/api/fields/${ownedId}/soil-samples`);
    case 'POST sample':
      return a.post(`/api/fields/${ownedId}/soil-samples`).send({ kind: 'lab', sandPct: 40, siltPct: 40, clayPct: 20 });
    case 'POST samples CSV':
      return a.post(`/api/fields/${ownedId}/soil-samples/import`).attach('file', Buffer.from('label,ph\nA,6.2\n'), 's.csv');
    case 'PATCH sample': {
      const s = await newSample();
      return a.patch(`/api/soil-samples/${s.id}`).send({ version: s.version, label: 'changed' });
    }
    case 'DELETE sample':
      return a.delete(`/api/soil-samples/${(await newSample()).id}`);
    case 'GET photos':
      return a.get(`/api/fields/${ownedId}/soil-photos`);
    case 'POST photo':
      return a.post(`/api/fields/${ownedId}/soil-photos`).attach('file', png, 'p.png');
    case 'GET photo image':
      return a.get(`/api/soil-photos/${(await newPhoto()).id}/image`);
    case 'GET photo thumbnail':
      return a.get(`/api/soil-photos/${(await newPhoto()).id}/thumbnail`);
    case 'DELETE photo':
      return a.delete(`/api/soil-photos/${(await newPhoto()).id}`);
    case 'GET soil map':
      return a.get(`/api/farms/${farmId}/soil-map`);
    case 'POST soil map':
      return a.post(`/api/farms/${farmId}/soil-map`).attach('file', soilMapFile(), 'map.geojson');
    case 'PUT soil map mapping':
      return a.put(`/api/farms/${farmId}/soil-map/mapping`).send({ k: 'KFFACT' });
    case 'DELETE soil map': {
      await agents.farmer.post(`/api/farms/${farmId}/soil-map`).attach('file', soilMapFile(), 'map.geojson');
      const res = await a.delete(`/api/farms/${farmId}/soil-map`);
      await agents.farmer.post(`/api/farms/${farmId}/soil-map`).attach('file', soilMapFile(), 'map.geojson');
      return res;
    }
    case 'GET field map units':
      return a.get(`/api/fields/${ownedId}/soil-map-units`);
    case 'GET soil summary':
      return a.get(`/api/fields/${ownedId}/soil-summary`);
  }
  throw new Error(`unknown route ${route}`);
}

describe('soils routes by role', () => {
  for (const [route, byWho] of Object.entries(expected)) {
    for (const who of WHO) {
      it(`${route}: ${who} gets ${byWho[who]}`, async () => {
        const res = await call(route, who);
        expect(res.status, JSON.stringify(res.body)).toBe(byWho[who]);
      });
    }
  }

  it('hides samples and photos of fields a landowner does not own', async () => {
    const notOwned = (await agents.farmer.post(`/api/farms/${farmId}/fields`).send(featureOf([-91.775, 42.31, -91.772, 42.312], { name: 'Not owned' }))).body.id;
    const sample = (await agents.farmer.post(`/api/fields/${notOwned}/soil-samples`).send({ kind: 'feel', balls: false })).body;
    const photo = (await agents.farmer.post(`/api/fields/${notOwned}/soil-photos`).attach('file', png, 'p.png')).body;
    const owner = agents['owning landowner'];
    expect((await owner.get(`/api/fields/${notOwned}/soil-samples`)).status).toBe(404);
    expect((await owner.get(`/api/fields/${notOwned}/soil-summary`)).status).toBe(404);
    expect((await owner.get(`/api/soil-photos/${photo.id}/image`)).status).toBe(404);
    expect((await owner.patch(`/api/soil-samples/${sample.id}`).send({ version: 0, label: 'x' })).status).toBe(404);
    expect((await agents['non-member'].get(`/api/soil-photos/${photo.id}/thumbnail`)).status).toBe(404);
  });

  it('landowner reads the summary of their own field with the soil map applied', async () => {
    const res = await agents['owning landowner'].get(`/api/fields/${ownedId}/soil-summary`);
    expect(res.status).toBe(200);
    expect(res.body.kUs).toBeCloseTo(0.32, 9);
    expect(res.body.hsg).toBe('C');
  });
});
