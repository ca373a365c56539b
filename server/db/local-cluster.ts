// A project-local PostgreSQL cluster on loopback, run as the `postgres` system user because
// initdb and postgres refuse to run as root, so they run as the postgres system user. Used by `npm start` and the tests.
import { spawn, execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, chownSync, chmodSync, readFileSync, accessSync, constants, statSync } from 'node:fs';
import path from 'node:path';
import { ensurePostgresBinaries, type PgBinaries } from './postgres-binaries';

export const SUPERUSER = 'fieldshed';

export type ClusterOptions = {
  dir: string; // holds data/ and postgres.log
  port: number;
  database: string;
  /** fsync=off: throwaway test clusters only. */
  fast?: boolean;
  log?: (msg: string) => void;
};

type RunAs = { uid: number; gid: number } | Record<string, never>;

function systemUser(): RunAs {
  if (process.getuid?.() !== 0) return {};
  const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim());
  const gid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim());
  return { uid, gid };
}

function run(bin: string, args: string[], runAs: RunAs, cwd: string): Promise<{ code: number; out: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(bin, args, { ...runAs, cwd, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    child.stderr.on('data', (d) => (out += d));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code: code ?? 1, out }));
  });
}

function logTail(dir: string, lines = 15): string {
  const file = path.join(dir, 'postgres.log');
  if (!existsSync(file)) return '(no server log)';
  return readFileSync(file, 'utf8').trim().split('\n').slice(-lines).join('\n');
}

/** Every parent folder must be traversable by the postgres user, or initdb fails obscurely. */
function checkTraversable(dir: string, runAs: RunAs): void {
  if (!('uid' in runAs)) return;
  let cur = path.dirname(path.resolve(dir));
  while (true) {
    const st = statSync(cur);
    const otherX = (st.mode & 0o001) !== 0;
    const ownerX = st.uid === runAs.uid && (st.mode & 0o100) !== 0;
    const groupX = st.gid === runAs.gid && (st.mode & 0o010) !== 0;
    if (!otherX && !ownerX && !groupX) {
      throw new Error(
        `The database folder ${dir} sits inside ${cur}, which the 'postgres' system user cannot enter ` +
          `(mode ${(st.mode & 0o777).toString(8)}).\nSet DATA_DIR to a folder outside it, for example DATA_DIR=/var/tmp/fieldshed, ` +
          `or run: chmod o+x ${cur}`,
      );
    }
    const parent = path.dirname(cur);
    if (parent === cur) break;
    cur = parent;
  }
}

export function connectionUrl(port: number, database: string): string {
  return `postgres://${SUPERUSER}@127.0.0.1:${port}/${database}`;
}

/** Starts (or reuses) the cluster and makes sure the database and PostGIS exist. Returns its URL. */
export async function startLocalCluster(opts: ClusterOptions): Promise<{ url: string; pg: PgBinaries }> {
  const log = opts.log ?? console.log;
  const pg = ensurePostgresBinaries(log);
  const runAs = systemUser();
  const dataDir = path.join(opts.dir, 'data');
  mkdirSync(opts.dir, { recursive: true });
  checkTraversable(opts.dir, runAs);
  if ('uid' in runAs) chownSync(opts.dir, runAs.uid, runAs.gid);
  const cwd = opts.dir;

  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) {
    mkdirSync(dataDir, { recursive: true, mode: 0o700 });
    if ('uid' in runAs) chownSync(dataDir, runAs.uid, runAs.gid);
    chmodSync(dataDir, 0o700);
    const r = await run(pg.bin('initdb'), ['-D', dataDir, '-U', SUPERUSER, '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], runAs, cwd);
    if (r.code !== 0) throw new Error(`initdb failed for ${dataDir}:\n${r.out.trim()}`);
  }

  const status = await run(pg.bin('pg_ctl'), ['-D', dataDir, 'status'], runAs, cwd);
  if (status.code !== 0) {
    const settings = [`-p ${opts.port}`, '-c listen_addresses=127.0.0.1', "-c unix_socket_directories=''"];
    if (opts.fast) settings.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
    const r = await run(
      pg.bin('pg_ctl'),
      ['-D', dataDir, '-l', path.join(opts.dir, 'postgres.log'), '-w', '-t', '30', '-o', settings.join(' '), 'start'],
      runAs,
      cwd,
    );
    if (r.code !== 0) {
      throw new Error(
        `PostgreSQL could not start on 127.0.0.1:${opts.port}.\n${r.out.trim()}\nLast lines of ${path.join(opts.dir, 'postgres.log')}:\n${logTail(opts.dir)}\n` +
          `If the port is taken, set LOCAL_PG_PORT to a free port (or DATABASE_URL to another database).`,
      );
    }
  }
  const ready = await run(pg.bin('pg_isready'), ['-h', '127.0.0.1', '-p', String(opts.port), '-t', '20'], runAs, cwd);
  if (ready.code !== 0) throw new Error(`PostgreSQL on port ${opts.port} is not answering:\n${ready.out}\n${logTail(opts.dir)}`);

  const psql = (db: string, sql: string) =>
    run(pg.bin('psql'), ['-h', '127.0.0.1', '-p', String(opts.port), '-U', SUPERUSER, '-d', db, '-v', 'ON_ERROR_STOP=1', '-tAc', sql], runAs, cwd);
  const exists = await psql('postgres', `SELECT 1 FROM pg_database WHERE datname = '${opts.database.replace(/'/g, "''")}'`);
  if (exists.code !== 0) throw new Error(`Could not query the local cluster:\n${exists.out}`);
  if (exists.out.trim() !== '1') {
    const c = await psql('postgres', `CREATE DATABASE "${opts.database.replace(/"/g, '')}"`);
    if (c.code !== 0) throw new Error(`Could not create database ${opts.database}:\n${c.out}`);
  }
  // PostGIS before the app's pool connects, or geometry comes back as hex strings.
  const ext = await psql(opts.database, 'CREATE EXTENSION IF NOT EXISTS postgis');
  if (ext.code !== 0) throw new Error(`Could not enable PostGIS in ${opts.database}:\n${ext.out}`);
  return { url: connectionUrl(opts.port, opts.database), pg };
}

export async function stopLocalCluster(dir: string): Promise<boolean> {
  const dataDir = path.join(dir, 'data');
  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) return false;
  try {
    accessSync(dataDir, constants.F_OK);
  } catch {
    return false;
  }
  const pg = ensurePostgresBinaries();
  const r = await run(pg.bin('pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop'], systemUser(), dir);
  return r.code === 0;
}
