// A local stand-in for a mail server (development and tests): smtp-server on loopback takes the
// real SMTP conversation nodemailer starts, mailparser reads each message, and `onMessage` keeps
// it (the app stores it in dev_mailbox_messages for the Dev mailbox). It accepts any sender and
// recipient, asks for no password and offers no TLS, so it listens on 127.0.0.1 only.
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';

export type CaughtMessage = { envelopeFrom: string; envelopeTo: string[]; toHeader: string; subject: string; text: string; html: string };
export type FakeSmtpServer = { port: number; close: () => Promise<void> };

const addressText = (a: AddressObject | AddressObject[] | undefined) => (Array.isArray(a) ? a.map((x) => x.text).join(', ') : (a?.text ?? ''));

/** Starts the fake on 127.0.0.1 (`port` 0 picks a free port); resolves once it listens. */
export async function startFakeSmtpServer(onMessage: (m: CaughtMessage) => Promise<void>, port = 0): Promise<FakeSmtpServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Fieldshed local fake mail server',
    logger: false,
    size: 2 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) =>
          onMessage({
            envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            envelopeTo: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
            toHeader: addressText(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          }),
        )
        .then(() => callback(), (e: unknown) => callback(e instanceof Error ? e : new Error(String(e))));
    },
  });
  server.on('error', (e) => console.error('fake mail server:', e));
  await new Promise<void>((resolve, reject) => {
    server.server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  if (!address || typeof address === 'string') throw new Error('The fake mail server did not report its port.');
  return { port: address.port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
