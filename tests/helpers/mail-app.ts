// An app whose mail really goes out: the outbox, the job queue (its own queue prefix) and the
// local fake mail server on a free port, caught messages read back through GET /api/dev/mailbox.
import { inject } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { openMailTransport } from '../../server/services/mail/mail-transport';
import { sendMailJobHandler } from '../../server/services/mail/send-mail-job';
import type { MailboxMessage } from '../../shared/schemas/people';

export const PUBLIC_URL = 'http://fieldshed.test';

export async function startMailApp() {
  const url = inject('databaseUrl');
  const sequelize = createSequelize(url);
  initModels(sequelize);
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: `mail-${randomUUID()}`, PUBLIC_URL, DATA_DIR: '/tmp/fieldshed-test-unused' });
  const mail = await openMailTransport(config);
  const jobs = await JobQueue.start(url, undefined, `m${randomUUID().slice(0, 8)}-`, { mail: sendMailJobHandler(mail, config) });
  const app = createApp({ sequelize, config, jobs, clientDir: '/nonexistent', devMailbox: true });

  /** The messages caught for an address, newest first, once there are at least `count`. */
  async function mailTo(address: string, count = 1, timeoutMs = 25_000): Promise<MailboxMessage[]> {
    const until = Date.now() + timeoutMs;
    for (;;) {
      const res = await request(app).get('/api/dev/mailbox').query({ to: address });
      if (res.status !== 200) throw new Error(`mailbox: ${res.status}`);
      if (res.body.length >= count) return res.body as MailboxMessage[];
      if (Date.now() > until) throw new Error(`no mail to ${address} after ${timeoutMs} ms`);
      await new Promise((r) => setTimeout(r, 100));
    }
  }

  return {
    app,
    sequelize,
    config,
    mail,
    mailTo,
    close: async () => {
      await jobs.stop(2000);
      await mail.close();
      await sequelize.close();
    },
  };
}

/** The link in a mail's text that starts with PUBLIC_URL and this path, as a path with its query. */
export function linkIn(message: MailboxMessage, pathStart: string): string {
  const m = message.text.match(new RegExp(`${PUBLIC_URL.replace(/[.]/g, '\\.')}(${pathStart}[^\\s]*)`));
  if (!m) throw new Error(`no ${pathStart} link in: ${message.text}`);
  return m[1];
}
