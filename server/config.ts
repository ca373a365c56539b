// The only reader of process.env. Parsed once with zod; every problem is listed at start-up.
import { z } from 'zod';
import path from 'node:path';
import { DEM_MAX_CELLS, JOBS_PER_USER_MAX } from '../shared/limits';

const boolish = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const Env = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATA_DIR: z.string().default('./var'),
  LOCAL_PG_PORT: z.coerce.number().int().min(1).max(65535).default(54329),
  DATABASE_URL: z.string().url().optional(),
  SMTP_URL: z.string().url().optional(),
  PUBLIC_URL: z.string().url().optional(),
  MAIL_FROM: z.string().min(3).default('Fieldshed <no-reply@fieldshed.localhost>'),
  REMINDER_DAYS: z.coerce.number().int().min(1).max(60).default(7),
  TILE_URL: z.string().optional(),
  TILE_ATTRIBUTION: z.string().optional(),
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
  /** The From of every mail. */
  mailFrom: string;
  /** How many days before a planned action's date its reminder goes out. */
  reminderDays: number;
  tileUrl: string | null;
  tileAttribution: string | null;
  seedDemo: boolean;
  sessionSecret: string;
  sessionHours: number;
  isProduction: boolean;
  /** Work limits: cells of an elevation model, background jobs per person at once. */
  limits: { demMaxCells: number; jobsPerUserMax: number };
};

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
    mailFrom: e.MAIL_FROM,
    reminderDays: e.REMINDER_DAYS,
    tileUrl: e.TILE_URL ?? null,
    tileAttribution: e.TILE_ATTRIBUTION ?? null,
    seedDemo: e.SEED_DEMO,
    // A development default keeps `npm start` to one command; production must set its own.
    sessionSecret: e.SESSION_SECRET ?? 'fieldshed-development-secret-not-for-production',
    sessionHours: e.SESSION_HOURS,
    isProduction,
    limits: { demMaxCells: e.DEM_MAX_CELLS, jobsPerUserMax: e.JOBS_PER_USER_MAX },
  };
}
