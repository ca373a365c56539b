// Soil profile photos: type told from content (JPEG, PNG, WebP), 10 MB limit, thumbnails,
// files under server-made keys, and no file left behind when something fails.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import sharp from 'sharp';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { LocalFileStorage, type FileStorage } from '../../server/services/storage/file-storage';
import { makeFarm, signedIn, squareFeature } from '../helpers/test-app';
import { makeImage } from '../fixtures/soils/soil-fixtures';

const sequelize = createSequelize(inject('databaseUrl'));
const uploads = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-soil-photos-'));
/** Local storage that can be told to fail the next thumbnail write, to test the clean-up. */
class FlakyStorage extends LocalFileStorage implements FileStorage {
  failThumbnail = false;
  override async put(key: string, body: Buffer | Uint8Array): Promise<void> {
    if (this.failThumbnail && key.includes('thumbnails/')) {
      this.failThumbnail = false;
      throw new Error('disk full (test)');
    }
    return super.put(key, body);
  }
}
const storage = new FlakyStorage(uploads);
let app: Express;
const files = () => readdirSync(uploads, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).length;

beforeAll(() => {
  initModels(sequelize);
  app = createApp({ sequelize, config: loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'soil-photos-secret-x' }), storage, clientDir: '/nonexistent' });
});
afterAll(async () => {
  await sequelize.close();
  rmSync(uploads, { recursive: true, force: true });
});

async function fieldWithAgent() {
  const { farm, users } = await makeFarm(['farmer']);
  const agent = await signedIn(app, users.farmer);
  const field = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200));
  return { agent, fieldId: field.body.id as number };
}

describe('soil profile photos', () => {
  const good: ['jpeg' | 'png' | 'webp', number, number, string, number, number][] = [
    // thumbnails fit inside 320 × 320, keeping the aspect ratio, never enlarged
    ['jpeg', 800, 600, 'image/jpeg', 320, 240],
    ['png', 100, 50, 'image/png', 100, 50],
    ['webp', 500, 1000, 'image/webp', 160, 320],
  ];
  for (const [format, w, h, mime, tw, th] of good) {
    it(`stores a ${format.toUpperCase()} photo with a ${tw} × ${th} thumbnail and serves both`, async () => {
      const { agent, fieldId } = await fieldWithAgent();
      const before = files();
      const res = await agent.post(`/api/fields/${fieldId}/soil-photos`).field('caption', 'Profile at the gate').attach('file', await makeImage(format, w, h), 'whatever-name.bin');
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({ contentType: mime, width: w, height: h, thumbnailWidth: tw, thumbnailHeight: th, caption: 'Profile at the gate' });
      expect(files()).toBe(before + 2);
      // The user's file name is never part of a stored key.
      expect(readdirSync(uploads, { recursive: true }).some((n) => String(n).includes('whatever'))).toBe(false);

      const image = await agent.get(res.body.url);
      expect(image.status).toBe(200);
      expect(image.headers['content-type']).toMatch(mime);
      expect((await sharp(image.body).metadata()).width).toBe(w);
      const thumb = await agent.get(res.body.thumbnailUrl);
      expect(thumb.headers['content-type']).toMatch('image/jpeg');
      const meta = await sharp(thumb.body).metadata();
      expect([meta.width, meta.height]).toEqual([tw, th]);

      const list = await agent.get(`/api/fields/${fieldId}/soil-photos`);
      expect(list.body.map((p: { id: number }) => p.id)).toEqual([res.body.id]);
    });
  }

  it('refuses a text file renamed .jpg with 415, storing nothing', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const before = files();
    const res = await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', Buffer.from('this is not a photo at all\n'), { filename: 'profile.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(415);
    expect(res.body.error).toBe('unsupported_file_type');
    expect(res.body.message).toMatch(/JPEG, PNG or WebP/);
    expect(files()).toBe(before);
    expect((await agent.get(`/api/fields/${fieldId}/soil-photos`)).body).toHaveLength(0);
  });

  it('refuses a GIF (an image, but not one of the three kinds) with 415', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const gif = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#fff' } }).gif().toBuffer();
    expect((await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', gif, 'p.jpg')).status).toBe(415);
  });

  it('refuses a photo over 10 MB with 413, storing nothing', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const before = files();
    const big = Buffer.alloc(10 * 1024 * 1024 + 1, 0);
    big.set([0xff, 0xd8, 0xff, 0xe0]);
    const res = await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', big, 'big.jpg');
    expect(res.status).toBe(413);
    expect(files()).toBe(before);
  });

  it('refuses a damaged JPEG with 422, storing nothing', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const before = files();
    const broken = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from('garbage'.repeat(50))]);
    const res = await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', broken, 'p.jpg');
    expect(res.status).toBe(422);
    expect(res.body.error).toBe('invalid_image');
    expect(files()).toBe(before);
  });

  it('leaves no file behind when storing the thumbnail fails', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const before = files();
    storage.failThumbnail = true;
    const res = await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', await makeImage('png', 40, 40), 'p.png');
    expect(res.status).toBe(500);
    expect(files()).toBe(before);
    expect((await agent.get(`/api/fields/${fieldId}/soil-photos`)).body).toHaveLength(0);
  });

  it('links a photo to a sample of the same field only', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const sample = await agent.post(`/api/fields/${fieldId}/soil-samples`).send({ kind: 'feel', balls: false });
    const ok = await agent.post(`/api/fields/${fieldId}/soil-photos`).field('sampleId', String(sample.body.id)).attach('file', await makeImage('png', 20, 20), 'p.png');
    expect(ok.status).toBe(201);
    expect(ok.body.sampleId).toBe(sample.body.id);
    const other = await fieldWithAgent();
    const before = files();
    const bad = await other.agent.post(`/api/fields/${other.fieldId}/soil-photos`).field('sampleId', String(sample.body.id)).attach('file', await makeImage('png', 20, 20), 'p.png');
    expect(bad.status).toBe(422);
    expect(bad.body.error).toBe('invalid_sample');
    expect(files()).toBe(before);
  });

  it('removes a photo together with its files', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const before = files();
    const res = await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', await makeImage('jpeg', 64, 48), 'p.jpg');
    expect(files()).toBe(before + 2);
    expect((await agent.delete(`/api/soil-photos/${res.body.id}`)).status).toBe(204);
    expect(files()).toBe(before);
    expect((await agent.get(res.body.url)).status).toBe(404);
  });

  it('removes the photo files when their field is deleted', async () => {
    const { agent, fieldId } = await fieldWithAgent();
    const before = files();
    await agent.post(`/api/fields/${fieldId}/soil-photos`).attach('file', await makeImage('png', 40, 30), 'p.png');
    expect(files()).toBe(before + 2);
    expect((await agent.delete(`/api/fields/${fieldId}`)).status).toBe(204);
    expect(files()).toBe(before);
  });
});
