// `npm run worker`: works the background job queue (terrain runs, and later mail and
// reminders) and nothing else, against the database `npm start` uses. Run as many as needed,
// here or on other machines: pg-boss hands each job to one worker.
import { openBackend, jobHandlers, stopOnSignals } from './backend';
import { JobQueue } from './services/jobs/job-queue';

async function main(): Promise<void> {
  const backend = await openBackend();
  const handlers = jobHandlers(backend);
  const jobs = await JobQueue.start(backend.db.url, handlers);
  console.log(`Fieldshed worker is working the job queue (${Object.keys(handlers).join(', ')}).`);
  stopOnSignals(async () => {
    await jobs.stop();
    await backend.db.sequelize.close().catch(() => undefined);
    // The local database is the app's: `npm run db:stop` stops it.
    if (backend.db.localClusterDir) console.log('The local database keeps running; `npm run db:stop` stops it.');
  });
}

main().catch((e: unknown) => {
  console.error(`\nThe Fieldshed worker could not start:\n${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
