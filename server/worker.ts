// `npm run worker`: works the background job queue (terrain runs, and later mail and
// reminders) and nothing else, against the database `npm start` uses. Run as many as needed,
// here or on other machines: pg-boss hands each job to one worker.
import { openBackend, jobHandlers, taskHandlers, stopOnSignals } from './backend';
import { JobQueue } from './services/jobs/job-queue';
import { openMailTransport } from './services/mail/mail-transport';
import { setMailContext } from './services/mail/outbox';

async function main(): Promise<void> {
  const backend = await openBackend();
  const handlers = jobHandlers(backend);
  // Mail only with a real mail server: the local fake belongs to `npm start`, whose worker sends to it.
  const mail = backend.config.smtpUrl ? await openMailTransport(backend.config) : null;
  const tasks = taskHandlers(backend, mail);
  const jobs = await JobQueue.start(backend.db.url, handlers, '', tasks, backend.config.limits);
  setMailContext({ dispatch: (id) => jobs.sendMail(id), publicUrl: backend.config.publicUrl });
  console.log(`Fieldshed worker is working the job queue (${[...Object.keys(handlers), ...Object.keys(tasks)].join(', ')}).`);
  stopOnSignals(async () => {
    await jobs.stop();
    await mail?.close();
    await backend.db.sequelize.close().catch(() => undefined);
    // The local database is the app's: `npm run db:stop` stops it.
    if (backend.db.localClusterDir) console.log('The local database keeps running; `npm run db:stop` stops it.');
  });
}

main().catch((e: unknown) => {
  console.error(`\nThe Fieldshed worker could not start:\n${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
