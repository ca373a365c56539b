// Finds Debian's PostgreSQL server binaries and PostGIS, installing them with apt-get when
// missing and running as root.
import { existsSync, readdirSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import path from 'node:path';

const PG_ROOT = '/usr/lib/postgresql';

function newestVersion(): string | null {
  if (!existsSync(PG_ROOT)) return null;
  const versions = readdirSync(PG_ROOT)
    .filter((v) => /^\d+$/.test(v) && existsSync(path.join(PG_ROOT, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ?? null;
}

function hasPostgis(version: string): boolean {
  return existsSync(`/usr/share/postgresql/${version}/extension/postgis.control`);
}

function installCommand(version: string | null): string {
  const v = version ?? '15';
  return `apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends postgresql postgresql-${v}-postgis-3`;
}

export type PgBinaries = { version: string; bin: (name: string) => string };

/** Returns the binaries, installing PostgreSQL/PostGIS first when missing and allowed. */
export function ensurePostgresBinaries(log: (msg: string) => void = console.log): PgBinaries {
  let version = newestVersion();
  if (!version || !hasPostgis(version)) {
    const cmd = installCommand(version);
    if (process.getuid?.() !== 0) {
      throw new Error(
        `PostgreSQL with PostGIS is needed and is not installed.\nInstall it with:\n  sudo sh -c '${cmd}'\n` +
          'or set DATABASE_URL to a PostgreSQL database that has PostGIS.',
      );
    }
    log(`Installing PostgreSQL and PostGIS from Debian's packages: ${cmd}`);
    execFileSync('sh', ['-c', cmd], { stdio: 'inherit' });
    version = newestVersion();
    if (!version || !hasPostgis(version)) throw new Error(`PostgreSQL/PostGIS still missing after: ${cmd}`);
  }
  const v = version;
  return { version: v, bin: (name) => path.join(PG_ROOT, v, 'bin', name) };
}
