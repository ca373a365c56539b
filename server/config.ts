// The only reader of process.env. Parsed once with zod; every problem is listed at start-up.
import { z } from 'zod';
import path from 'node:path';
import type { Basemap } from '../shared/schemas/config';
import { randomBytes } from 'node:crypto';
import { chmodSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { DEM_MAX_CELLS, JOBS_PER_USER_MAX } from '../shared/limits';

const boolish = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const OFF = /^(off|none)?$/i;

/** A tile URL template Leaflet can draw ({z}/{x}/{y}, optional {s} subdomain), checked at start-up. */
const tileTemplate = (key: string) =>
  z
    .string()
    .refine((v) => OFF.test(v) || (/^https?:\/\//.test(v) && ['{z}', '{x}', '{y}'].every((p) => v.includes(p))), {
      message: `${key} must be an http(s) URL with {z}, {x} and {y} (or "off")`,
    })
    .optional();

const Env = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATA_DIR: z.string().default('./var'),
  LOCAL_PG_PORT: z.coerce.number().int().min(1).max(65535).default(54329),
  DATABASE_URL: z.string().url().optional(),
  SMTP_URL: z.string().url().optional(),
  PUBLIC_URL: z.string().url().optional(),
  ALLOWED_ORIGINS: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Fieldshed <no-reply@fieldshed.localhost>'),
  REMINDER_DAYS: z.coerce.number().int().min(1).max(60).default(7),
  STREET_TILE_URL: tileTemplate('STREET_TILE_URL'),
  STREET_TILE_ATTRIBUTION: z.string().optional(),
  TOPO_TILE_URL: tileTemplate('TOPO_TILE_URL'),
  TOPO_TILE_ATTRIBUTION: z.string().optional(),
  TILE_URL: tileTemplate('TILE_URL'),
  TILE_ATTRIBUTION: z.string().optional(),
  TILE_NAME: z.string().min(1).max(40).optional(),
  GEOCODER_URL: z.string().url().optional(),
  SEED_DEMO: boolish.default(true),
  SESSION_SECRET: z.string().min(16).optional(),
  SESSION_HOURS: z.coerce.number().positive().default(12),
  NODE_ENV: z.string().default('development'),
  DEM_MAX_CELLS: z.coerce.number().int().min(1).default(DEM_MAX_CELLS),
  JOBS_PER_USER_MAX: z.coerce.number().int().min(1).max(1000).default(JOBS_PER_USER_MAX),
});

export type Config = {
  port: number;
  host: string;
  dataDir: string;
  localPgPort: number;
  databaseUrl: string | undefined;
  /** Real mail server; unset: `npm start` runs the local fake and the dev mailbox. */
  smtpUrl: string | undefined;
  /** The address people open the product at: links in mail start with it (no trailing slash). */
  publicUrl: string;
  /** Origins, besides PUBLIC_URL's and the request's own host, whose pages may change data (comma-separated ALLOWED_ORIGINS). */
  allowedOrigins: string[];
  /** The From of every mail. */
  mailFrom: string;
  /** How many days before a planned action's date its reminder goes out. */
  reminderDays: number;
  /** The web basemaps a user may pick, the default first; see basemapsFrom. */
  basemaps: Basemap[];
  /** A Nominatim-style geocoding service for place search; unset: `npm start` runs a local fake. */
  geocoderUrl: string | null;
  seedDemo: boolean;
  sessionSecret: string;
  sessionHours: number;
  isProduction: boolean;
  /** Work limits: cells of an elevation model, background jobs per person at once. */
  limits: { demMaxCells: number; jobsPerUserMax: number };
};

/**
 * The web basemaps, in the order the picker lists them (the first is the default): roads and
 * places from OpenStreetMap's tile service, hills and contours from OpenTopoMap, and the
 * installation's own imagery from TILE_URL. Each *_TILE_URL set to "off" leaves that base out.
 * Under NODE_ENV=test the two public services are off unless a test names a URL, so no test
 * reaches the internet.
 */
function basemapsFrom(e: z.infer<typeof Env>, publicDefaults: boolean): Basemap[] {
  const street = e.STREET_TILE_URL ?? (publicDefaults ? 'https://tile.openstreetmap.org/{z}/{x}/{y}.png' : 'off');
  const topo = e.TOPO_TILE_URL ?? (publicDefaults ? 'https://{s}.tile.opentopomap.org/{z}/{x}/{y}.png' : 'off');
  const all: (Basemap | null)[] = [
    OFF.test(street) ? null : { key: 'streets', name: 'Roads and places', url: street, attribution: e.STREET_TILE_ATTRIBUTION ?? '© OpenStreetMap contributors', maxNativeZoom: 19 },
    OFF.test(topo)
      ? null
      : { key: 'topo', name: 'Hills and contours', url: topo, attribution: e.TOPO_TILE_ATTRIBUTION ?? 'Map data: © OpenStreetMap contributors, SRTM · Map style: © OpenTopoMap (CC-BY-SA)', maxNativeZoom: 17 },
    !e.TILE_URL || OFF.test(e.TILE_URL) ? null : { key: 'imagery', name: e.TILE_NAME ?? 'Aerial photos', url: e.TILE_URL, attribution: e.TILE_ATTRIBUTION ?? '', maxNativeZoom: 19 },
  ];
  return all.filter((b): b is Basemap => b !== null);
}

/**
 * Without SESSION_SECRET (outside production): a random 256-bit secret made on first start and kept
 * in DATA_DIR/session-secret (mode 0600), so sessions survive restarts and no two installations share one.
 */
function keptSessionSecret(dataDir: string): string {
  const file = path.join(dataDir, 'session-secret');
  try {
    return readFileSync(file, 'utf8').trim();
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
  }
  mkdirSync(dataDir, { recursive: true });
  try {
    // 'wx': when two processes start at once, the first one's secret is kept by both.
    writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600, flag: 'wx' });
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw e;
  }
  chmodSync(file, 0o600);
  return readFileSync(file, 'utf8').trim();
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = Env.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Fieldshed configuration is invalid:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const isProduction = e.NODE_ENV === 'production';
  if (isProduction && !e.SESSION_SECRET) throw new Error('Fieldshed configuration is invalid:\n  SESSION_SECRET: required in production');
  return {
    port: e.PORT,
    host: e.HOST,
    dataDir: path.resolve(e.DATA_DIR),
    localPgPort: e.LOCAL_PG_PORT,
    databaseUrl: e.DATABASE_URL,
    smtpUrl: e.SMTP_URL,
    publicUrl: (e.PUBLIC_URL ?? `http://${e.HOST === '0.0.0.0' ? '127.0.0.1' : e.HOST}:${e.PORT}`).replace(/\/+$/, ''),
    allowedOrigins: (e.ALLOWED_ORIGINS ?? '').split(',').map((o) => o.trim()).filter(Boolean),
    mailFrom: e.MAIL_FROM,
    reminderDays: e.REMINDER_DAYS,
    basemaps: basemapsFrom(e, e.NODE_ENV !== 'test'),
    geocoderUrl: e.GEOCODER_URL ?? null,
    seedDemo: e.SEED_DEMO,
    sessionSecret: e.SESSION_SECRET ?? keptSessionSecret(path.resolve(e.DATA_DIR)),
    sessionHours: e.SESSION_HOURS,
    isProduction,
    limits: { demMaxCells: e.DEM_MAX_CELLS, jobsPerUserMax: e.JOBS_PER_USER_MAX },
  };
}
