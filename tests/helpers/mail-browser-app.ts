// The real build in Chromium on an app whose mail really goes out: the outbox, the job queue (its
// own queue prefix) and the local fake mail server, the Dev mailbox mounted, and links in mail
// pointing at this server (its port is known only once it listens, so a placeholder finds one).
import { inject } from 'vitest';
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import type { Server } from 'node:http';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { openMailTransport } from '../../server/services/mail/mail-transport';
import { sendMailJobHandler } from '../../server/services/mail/send-mail-job';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createSequelize } from '../../server/db/sequelize';
import { initModels } from '../../server/models';
import { launchChromium, listen } from './browser';

export async function startMailBrowserApp() {
  const sequelize = createSequelize(inject('databaseUrl'));
  initModels(sequelize);
  const mail = await openMailTransport({ smtpUrl: undefined });
  const config0 = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: `e2e-${randomUUID()}` });
  const jobs = await JobQueue.start(inject('databaseUrl'), undefined, `m${randomUUID().slice(0, 8)}-`, { mail: sendMailJobHandler(mail, config0) });
  const dist = path.resolve('dist');
  const placeholder = await listen(createApp({ sequelize, config: config0, clientDir: dist }));
  const port = new URL(placeholder.url).port;
  placeholder.server.close();
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: `e2e-${randomUUID()}`, PORT: port, PUBLIC_URL: `http://127.0.0.1:${port}` });
  const app = createApp({ sequelize, config, jobs, devMailbox: true, clientDir: dist });
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(Number(port), '127.0.0.1', () => resolve(s));
  });
  const browser = await launchChromium();
  return {
    sequelize,
    baseUrl: config.publicUrl,
    browser,
    close: async () => {
      await browser.close();
      server.close();
      await jobs.stop(2000);
      await mail.close();
      await sequelize.close();
    },
  };
}
