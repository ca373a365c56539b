// What the local fake mail server caught, newest first, for GET /api/dev/mailbox.
import type { MailboxMessage } from '../../../shared/schemas/people';
import { DevMailboxMessage } from '../../models';

const SHOWN = 200;

export async function devMailbox(to?: string): Promise<MailboxMessage[]> {
  const rows = await DevMailboxMessage.newest(SHOWN, to?.toLowerCase());
  return rows.map((m) => ({ id: Number(m.id), to: m.toHeader || m.envelopeTo.join(', '), subject: m.subject, text: m.textBody, html: m.htmlBody, sentAt: m.receivedAt.toISOString() }));
}
