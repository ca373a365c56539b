// The `mail` job: sends one outbox row. A failure is recorded on the row and thrown, so the job
// queue tries again later with a growing delay; a row already sent (a job run twice) is skipped.
import type { Config } from '../../config';
import { OutgoingMail } from '../../models';
import type { MailTransport } from './mail-transport';

export function sendMailJobHandler(transport: MailTransport, config: Pick<Config, 'mailFrom'>) {
  return async (mailId: number): Promise<void> => {
    const mail = await OutgoingMail.claim(mailId);
    if (!mail) return;
    try {
      await transport.transporter.sendMail({ from: config.mailFrom, to: mail.toAddress, subject: mail.subject, text: mail.textBody, html: mail.htmlBody });
      await mail.update({ state: 'sent', sentAt: new Date(), lastError: null });
    } catch (e) {
      await mail.update({ state: 'failed', lastError: e instanceof Error ? e.message : String(e) });
      throw e;
    }
  };
}
