// What `npm start` and `npm run worker` share: the configuration, the database (DATABASE_URL,
// or the project-local cluster started when needed, then migrated), the models, the file
// storage, the job handlers, and a clean stop on SIGINT/SIGTERM.
import path from 'node:path';
import { loadConfig, type Config } from './config';
import { openDatabase, type OpenDatabase } from './db/database';
import { initModels } from './models';
import { LocalFileStorage, type FileStorage } from './services/storage/file-storage';
import type { JobHandlers, TaskHandlers } from './services/jobs/job-queue';
import { terrainJobHandler } from './services/farm-terrain.service';
import type { MailTransport } from './services/mail/mail-transport';
import { sendMailJobHandler } from './services/mail/send-mail-job';
import { dailyNoticesHandler } from './services/notices/daily-notices';

export type Backend = { config: Config; db: OpenDatabase; storage: FileStorage };

export async function openBackend(): Promise<Backend> {
  const config = loadConfig();
  const db = await openDatabase(config);
  initModels(db.sequelize);
  // Workers on other machines need this folder shared with the API (or another FileStorage).
  const storage = new LocalFileStorage(path.join(config.dataDir, 'uploads'));
  return { config, db, storage };
}

/** Every kind of background job and the code that works it. */
export function jobHandlers({ db, storage }: Backend): JobHandlers {
  return { terrain: terrainJobHandler({ sequelize: db.sequelize, storage }) };
}

/** Mail (where this process has a mail transport) and the daily notices. */
export function taskHandlers({ db, config }: Backend, mail: MailTransport | null): TaskHandlers {
  return {
    ...(mail ? { mail: sendMailJobHandler(mail, config) } : {}),
    dailyNotices: dailyNoticesHandler(db.sequelize, config),
  };
}

/** Runs `stop` once on the first SIGINT or SIGTERM, then exits. */
export function stopOnSignals(stop: () => Promise<void>): void {
  let stopping = false;
  const onSignal = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal}: stopping …`);
    void stop().finally(() => process.exit(0));
  };
  process.on('SIGINT', onSignal);
  process.on('SIGTERM', onSignal);
}
