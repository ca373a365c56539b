// One app per test file on the shared throwaway database, and small factories that make the
// rows each test needs (factories per test, not one global seed).
import { inject } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import { randomUUID } from 'node:crypto';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { Farm, Membership, User, initModels } from '../../server/models';
import type { Role } from '../../shared/schemas/auth';
import bcrypt from 'bcryptjs';

export const TEST_PASSWORD = 'correct horse battery';
// bcrypt cost 4 keeps factories fast; the app itself uses 10.
const hash = bcrypt.hashSync(TEST_PASSWORD, 4);

export type TestContext = { app: Express; sequelize: Sequelize; close: () => Promise<void> };

export function makeTestApp(options: { devMailbox?: boolean } = {}): TestContext {
  const sequelize = createSequelize(inject('databaseUrl'));
  initModels(sequelize);
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'test-secret-test-secret', DATA_DIR: '/tmp/fieldshed-test-unused' });
  const app = createApp({ sequelize, config, clientDir: '/nonexistent', devMailbox: options.devMailbox });
  return { app, sequelize, close: () => sequelize.close() };
}

export async function makeUser(over: Partial<{ email: string; name: string; isAdmin: boolean }> = {}): Promise<User> {
  return User.create({
    email: over.email ?? `u-${randomUUID()}@example.test`,
    name: over.name ?? 'Test Person',
    passwordHash: hash,
    isAdmin: over.isAdmin ?? false,
  });
}

/** A farm with one member per role asked for; returns users and memberships by role. */
export async function makeFarm(roles: Role[] = ['farmer', 'advisor', 'landowner']) {
  const farm = await Farm.create({ name: `Test farm ${randomUUID().slice(0, 8)}` });
  const users = {} as Record<Role, User>;
  const memberships = {} as Record<Role, Membership>;
  for (const role of roles) {
    users[role] = await makeUser({ name: `Test ${role}` });
    memberships[role] = await Membership.create({ userId: users[role].id, farmId: farm.id, role });
  }
  return { farm, users, memberships };
}

/** A supertest agent signed in as the user (keeps the session cookie). */
export async function signedIn(app: Express, user: User, password = TEST_PASSWORD) {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/login').send({ email: user.email, password });
  if (res.status !== 200) throw new Error(`login failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** A square field of about `sideM` metres at a latitude (degrees), as a GeoJSON Feature. */
export function squareFeature(lng: number, lat: number, sideM = 200, name?: string) {
  const dLat = sideM / 111_132;
  const dLng = sideM / (111_320 * Math.cos((lat * Math.PI) / 180));
  const ring: [number, number][] = [
    [lng, lat],
    [lng + dLng, lat],
    [lng + dLng, lat + dLat],
    [lng, lat + dLat],
    [lng, lat],
  ];
  return { type: 'Feature' as const, properties: name ? { name } : {}, geometry: { type: 'Polygon' as const, coordinates: [ring] } };
}
