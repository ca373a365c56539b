// `npm run db:stop`: stops the project-local cluster in $DATA_DIR/postgres.
import path from 'node:path';
import { loadConfig } from '../config';
import { stopLocalCluster } from './local-cluster';

const dir = path.join(loadConfig().dataDir, 'postgres');
const stopped = await stopLocalCluster(dir);
console.log(stopped ? `Stopped the local database in ${dir}` : `No local database was running in ${dir}`);
