// Opens the database the app uses: DATABASE_URL when set, else the project-local cluster.
// Migrations run on their own Sequelize instance, after PostGIS exists: a pool that connected
// before the extension existed reads geometry as hex strings.
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { startLocalCluster } from './local-cluster';
import { createSequelize } from './sequelize';
import { migrate } from './migrate';

export type OpenDatabase = { sequelize: Sequelize; url: string; localClusterDir: string | null };

export async function openDatabase(config: Config, log: (m: string) => void = console.log): Promise<OpenDatabase> {
  let url = config.databaseUrl;
  let localClusterDir: string | null = null;
  if (!url) {
    localClusterDir = path.join(config.dataDir, 'postgres');
    log(`Starting the local database in ${localClusterDir} on 127.0.0.1:${config.localPgPort} …`);
    url = (await startLocalCluster({ dir: localClusterDir, port: config.localPgPort, database: 'fieldshed', log })).url;
  }
  const migrator = createSequelize(url);
  try {
    await migrator.query('CREATE EXTENSION IF NOT EXISTS postgis');
    const ran = await migrate(migrator);
    if (ran.length) log(`Applied migrations: ${ran.join(', ')}`);
  } finally {
    await migrator.close();
  }
  return { sequelize: createSequelize(url), url, localClusterDir };
}
