// `npm start`: local database, migrations, demo seed, client build, then API + client on PORT.
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import { stopLocalCluster } from './db/local-cluster';
import { seedDemoFarm, DEMO_ACCOUNTS, DEMO_PASSWORD } from './db/seeders/demo-farm';
import { createApp } from './app';
import { openBackend, jobHandlers, taskHandlers, stopOnSignals } from './backend';
import { openMailTransport } from './services/mail/mail-transport';
import { openGeocoderService } from './services/places/geocoder-service';
import { requeueStuckMail, setMailContext } from './services/mail/outbox';
import { JobQueue } from './services/jobs/job-queue';
import { seedDemoTerrain } from './db/seeders/demo-terrain';
import { seedDemoSeason } from './db/seeders/demo-season';
import { seedDemoSecondFarm } from './db/seeders/demo-second-farm';
import { seedDemoPlan } from './db/seeders/demo-plan';
import { refreshStaleAssessments } from './services/assessments/refresh-assessments';

function newestMtime(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(p) : statSync(p).mtimeMs);
  }
  return newest;
}

async function buildClientIfStale(): Promise<void> {
  const shell = path.resolve('dist/index.html');
  const sources = ['src', 'shared', 'index.html'].filter((p) => existsSync(p));
  const newest = Math.max(...sources.map((p) => (statSync(p).isDirectory() ? newestMtime(p) : statSync(p).mtimeMs)));
  if (existsSync(shell) && statSync(shell).mtimeMs >= newest) return;
  console.log('Building the client …');
  const { build } = await import('vite');
  await build({ logLevel: 'warn' });
}

let startedClusterDir: string | null = null;

async function main(): Promise<void> {
  const backend = await openBackend();
  const { config, db, storage } = backend;
  startedClusterDir = db.localClusterDir;
  // SMTP_URL unset: a local fake mail server on loopback catches the mail (the Dev mailbox).
  const mail = await openMailTransport(config);
  // GEOCODER_URL unset: a local fake geocoding service answers place searches from the demo gazetteer.
  const geocoder = await openGeocoderService(config);
  // One worker in this process; `npm run worker` adds more, here or on other machines.
  const jobs = await JobQueue.start(db.url, jobHandlers(backend), '', taskHandlers(backend, mail), config.limits);
  // Before the demo seed, so the seeded plan's notice to the advisor goes out at once.
  setMailContext({ dispatch: (id) => jobs.sendMail(id), publicUrl: config.publicUrl });
  if (config.seedDemo && (await seedDemoFarm(db.sequelize))) {
    await seedDemoSeason(db.sequelize);
    await seedDemoPlan(db.sequelize);
    await seedDemoSecondFarm(db.sequelize);
    console.log('Loaded the demo farm (Alder Run Farm), its 2027 season and its plan, submitted for review.');
    if (await seedDemoTerrain({ sequelize: db.sequelize, storage, jobs })) console.log('Queued the demo elevation model for processing.');
  }
  // Stored assessments worked out by an older engine (or missing) are redone once, here, not on reads.
  const refreshedFarms = await refreshStaleAssessments(db.sequelize);
  if (refreshedFarms) console.log(`Brought the stored assessments of ${refreshedFarms} farm${refreshedFarms === 1 ? '' : 's'} up to date.`);
  await buildClientIfStale();
  const app = createApp({ sequelize: db.sequelize, config, storage, jobs, devMailbox: !!mail.fake, geocoderUrl: geocoder.url });
  const requeued = await requeueStuckMail();
  if (requeued) console.log(`Queued again ${requeued} mail${requeued === 1 ? '' : 's'} left unsent by an earlier run.`);
  const server: Server = app.listen(config.port, config.host);
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', (e: NodeJS.ErrnoException) =>
      reject(e.code === 'EADDRINUSE' ? new Error(`Port ${config.port} is taken; set PORT to a free port.`) : e),
    );
  });
  console.log(`\nFieldshed is running at http://${config.host}:${config.port}`);
  if (mail.fake) console.log(`Mail goes to a local fake mail server (127.0.0.1:${mail.fake.port}); read it at ${config.publicUrl}/dev/mailbox`);
  if (geocoder.fake) console.log(`Place search goes to a local fake geocoding service (${geocoder.url}) that knows only the demo's invented places.`);
  if (config.seedDemo) {
    console.log(`Demo sign-ins (password ${DEMO_PASSWORD}):`);
    for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(9)} ${a.email}`);
  }
  stopOnSignals(async () => {
    server.close();
    await jobs.stop();
    await mail.close();
    await geocoder.close();
    await db.sequelize.close().catch(() => undefined);
    if (db.localClusterDir) await stopLocalCluster(db.localClusterDir).catch(() => undefined);
  });
}

main().catch(async (e: unknown) => {
  console.error(`\nFieldshed could not start:\n${e instanceof Error ? e.message : String(e)}`);
  // Do not leave the local database running behind a failed start.
  if (startedClusterDir) await stopLocalCluster(startedClusterDir).catch(() => undefined);
  process.exit(1);
});
