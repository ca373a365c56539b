// Where mail goes: nodemailer over SMTP to SMTP_URL, or, when it is unset, to the local fake mail
// server started here, whose catch the Dev mailbox shows.
import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../../config';
import { DevMailboxMessage } from '../../models';
import { startFakeSmtpServer, type FakeSmtpServer } from './fake-smtp-server';

export type MailTransport = {
  transporter: Transporter;
  /** The local fake, when SMTP_URL is unset; null with a real mail server. */
  fake: FakeSmtpServer | null;
  close: () => Promise<void>;
};

export async function openMailTransport(config: Pick<Config, 'smtpUrl'>, fakePort = 0): Promise<MailTransport> {
  if (config.smtpUrl) {
    const transporter = nodemailer.createTransport(config.smtpUrl);
    return { transporter, fake: null, close: async () => transporter.close() };
  }
  const fake = await startFakeSmtpServer(async (m) => {
    await DevMailboxMessage.create({ envelopeFrom: m.envelopeFrom, envelopeTo: m.envelopeTo, toHeader: m.toHeader, subject: m.subject, textBody: m.text, htmlBody: m.html });
  }, fakePort);
  const transporter = nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false, ignoreTLS: true });
  return {
    transporter,
    fake,
    close: async () => {
      transporter.close();
      await fake.close();
    },
  };
}
