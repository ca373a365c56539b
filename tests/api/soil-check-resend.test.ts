// A soil check sent from a phone: its GPS position is kept, and a check (or its photo) sent again
// under the same browser key — after an answer lost on a weak network, or two sends racing — is
// stored once and the stored one is answered.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels, SoilPhoto, SoilSample } from '../../server/models';
import { LocalFileStorage } from '../../server/services/storage/file-storage';
import { makeFarm, signedIn, squareFeature } from '../helpers/test-app';
import { makeImage } from '../fixtures/soils/soil-fixtures';

const sequelize = createSequelize(inject('databaseUrl'));
const uploads = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-soil-check-'));
let app: Express;

beforeAll(() => {
  initModels(sequelize);
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'soil-check-resend-secret' });
  app = createApp({ sequelize, config, storage: new LocalFileStorage(uploads), clientDir: '/nonexistent' });
});
afterAll(async () => {
  await sequelize.close();
  rmSync(uploads, { recursive: true, force: true });
});

async function farmWithField() {
  const { farm, users } = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(app, users.farmer);
  const field = await farmer.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200, 'Phone field'));
  expect(field.status).toBe(201);
  return { farmer, users, fieldId: field.body.id as number };
}

// Thien (1979) feel key: balls, ribbon 3 cm (2.5–5 cm, medium), smooth → silty clay loam.
const feelCheck = (clientKey: string) => ({
  kind: 'feel',
  balls: true,
  ribbonCm: 3,
  feel: 'smooth',
  depthToGrayCm: 40,
  describedToCm: 90,
  position: { lng: -91.7795, lat: 42.3102, accuracyM: 6 },
  clientKey,
});

describe('a soil check sent from the field', () => {
  it('keeps the GPS position and the texture class from the feel test', async () => {
    const { farmer, fieldId } = await farmWithField();
    const res = await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(randomUUID()));
    expect(res.status).toBe(201);
    expect(res.body.textureClass).toBe('silty clay loam'); // Thien 1979: medium ribbon, very smooth
    expect(res.body.drainageClass).toBe('somewhat poorly drained'); // gray at 25–50 cm (a state field key, SSM drainage classes)
    expect(res.body.position).toEqual({ lng: -91.7795, lat: 42.3102, accuracyM: 6 });
  });

  it('stores one row when the same check is sent again, one after the other or at the same time', async () => {
    const { farmer, fieldId } = await farmWithField();
    const key = randomUUID();
    const first = await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(key));
    const again = await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(key));
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);

    const racing = randomUUID();
    const answers = await Promise.all([0, 1, 2].map(() => farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(racing))));
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(await SoilSample.count({ where: { fieldId } })).toBe(2);
  });

  it('stores one photo when the same photo is sent again', async () => {
    const { farmer, fieldId } = await farmWithField();
    const sample = await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(randomUUID()));
    const photoKey = randomUUID();
    const image = await makeImage('jpeg', 64, 48);
    const send = () =>
      farmer.post(`/api/fields/${fieldId}/soil-photos`).field('sampleId', String(sample.body.id)).field('clientKey', photoKey).attach('file', image, 'pit.jpg');
    const first = await send();
    const again = await send();
    expect(first.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(await SoilPhoto.count({ where: { fieldId } })).toBe(1);
  });

  it('refuses a key already used on another field, a key that is not a UUID and a bad position, naming the field', async () => {
    const { farmer, fieldId } = await farmWithField();
    const other = await farmWithField();
    const key = randomUUID();
    expect((await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(key))).status).toBe(201);
    const reused = await other.farmer.post(`/api/fields/${other.fieldId}/soil-samples`).send(feelCheck(key));
    expect(reused.status).toBe(409);
    expect(reused.body.error).toBe('client_key_used');

    const notUuid = await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck('check-1'));
    expect(notUuid.status).toBe(400);
    expect(notUuid.body.message).toMatch(/clientKey/);
    const badPosition = await farmer.post(`/api/fields/${fieldId}/soil-samples`).send({ ...feelCheck(randomUUID()), position: { lng: -91.7, lat: 95, accuracyM: 5 } });
    expect(badPosition.status).toBe(400);
    expect(badPosition.body.message).toMatch(/position\.lat/);
    expect(await SoilSample.count({ where: { fieldId } })).toBe(1);
  });

  it('refuses a soil check from a landowner who does not own the field', async () => {
    const { users, fieldId } = await farmWithField();
    const landowner = await signedIn(app, users.landowner);
    const res = await landowner.post(`/api/fields/${fieldId}/soil-samples`).send(feelCheck(randomUUID()));
    expect(res.status).toBe(404); // a landowner reaches only fields they own
  });
});
