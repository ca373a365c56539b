// Mail goes out over a real SMTP conversation: nodemailer to the local fake mail server on a free
// port, read back through the dev mailbox, which exists only while the fake is in use.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import nodemailer from 'nodemailer';
import { randomUUID } from 'node:crypto';
import { DevMailboxMessage, OutgoingMail } from '../../server/models';
import { openMailTransport } from '../../server/services/mail/mail-transport';
import { startFakeSmtpServer, type CaughtMessage } from '../../server/services/mail/fake-smtp-server';
import { sendMailJobHandler } from '../../server/services/mail/send-mail-job';
import { makeTestApp, makeUser, signedIn } from '../helpers/test-app';

let ctx: ReturnType<typeof makeTestApp>;
beforeAll(() => {
  ctx = makeTestApp();
});
afterAll(() => ctx?.close());

describe('mail transport and the fake mail server', () => {
  it('catches a message sent over SMTP, with its text and HTML bodies', async () => {
    const caught: CaughtMessage[] = [];
    const fake = await startFakeSmtpServer(async (m) => void caught.push(m));
    try {
      expect(fake.port).toBeGreaterThan(0);
      const transporter = nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false, ignoreTLS: true });
      await transporter.sendMail({ from: 'Fieldshed <no-reply@fieldshed.localhost>', to: 'Ana <ana@example.test>', subject: 'Plan für Äcker', text: 'Plain words', html: '<p>Plain <b>words</b></p>' });
      transporter.close();
      expect(caught).toEqual([{ envelopeFrom: 'no-reply@fieldshed.localhost', envelopeTo: ['ana@example.test'], toHeader: '"Ana" <ana@example.test>', subject: 'Plan für Äcker', text: 'Plain words', html: '<p>Plain <b>words</b></p>' }]);
    } finally {
      await fake.close();
    }
  });

  it('keeps a mail whose server is down and sends it on a later try', async () => {
    const to = `later-${randomUUID()}@example.test`;
    const row = await OutgoingMail.create({ kind: 'test', toAddress: to, subject: 'Later', textBody: 'text', htmlBody: '<p>text</p>', userId: null, farmId: null, dedupeKey: null });
    const down = await openMailTransport({ smtpUrl: undefined });
    await down.close();
    await expect(sendMailJobHandler(down, { mailFrom: 'f@example.test' })(Number(row.id))).rejects.toThrow();
    await row.reload();
    expect(row.state).toBe('failed');
    expect(row.lastError).toBeTruthy();

    const up = await openMailTransport({ smtpUrl: undefined });
    try {
      await sendMailJobHandler(up, { mailFrom: 'f@example.test' })(Number(row.id));
      await row.reload();
      expect([row.state, row.attempts]).toEqual(['sent', 2]);
      expect(await DevMailboxMessage.count({ where: { toHeader: to } })).toBe(1);
      // A job run twice does not send twice.
      await sendMailJobHandler(up, { mailFrom: 'f@example.test' })(Number(row.id));
      expect(await DevMailboxMessage.count({ where: { toHeader: to } })).toBe(1);
    } finally {
      await up.close();
    }
  });

  it('has no dev mailbox while a real mail server is configured', async () => {
    expect((await request(ctx.app).get('/api/dev/mailbox')).status).toBe(404);
    const agent = await signedIn(ctx.app, await makeUser());
    expect((await agent.get('/api/dev/mailbox')).status).toBe(404);
    expect((await agent.get('/api/config')).body.devMailbox).toBe(false);
  });
});
