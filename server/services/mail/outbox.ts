// Mail is written to the outbox (outgoing_mails) in the same transaction as what caused it, and
// handed to the job queue once that transaction commits; the queue's `mail` job sends it with
// retries. A process stopped in between leaves the row queued, and the worker queues it again at
// start-up (requeueStuckMail).
import type { Transaction } from 'sequelize';
import { OutgoingMail } from '../../models';
import type { ComposedMail } from './mail-templates';

type Dispatch = (mailId: number) => Promise<void>;
let dispatch: Dispatch | null = null;
let linkBase = '';

/**
 * Set once per process (createApp, the worker): how a committed mail reaches the job queue (none:
 * it waits in the outbox for a worker's start-up), and PUBLIC_URL for hooks that are handed no
 * configuration (the plan notices).
 */
export function setMailContext(context: { dispatch: Dispatch | null; publicUrl: string }): void {
  dispatch = context.dispatch;
  linkBase = context.publicUrl;
}

/** PUBLIC_URL as set by setMailContext. */
export const publicUrl = (): string => linkBase;

export type MailTo = { to: string; kind: string; userId?: number | null; farmId?: number | null; dedupeKey?: string | null };

/** Adds the mail to the outbox; false when its dedupe key says it was sent before. */
export async function queueMail(addressee: MailTo, mail: ComposedMail, transaction: Transaction): Promise<boolean> {
  const row = await OutgoingMail.add(
    {
      kind: addressee.kind,
      toAddress: addressee.to,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html,
      userId: addressee.userId ?? null,
      farmId: addressee.farmId ?? null,
      dedupeKey: addressee.dedupeKey ?? null,
    },
    transaction,
  );
  if (!row) return false;
  const id = Number(row.id);
  transaction.afterCommit(() => {
    if (!dispatch) return;
    dispatch(id).catch((e: unknown) => console.error(`mail ${id}: could not be queued; it is sent when a worker starts:`, e));
  });
  return true;
}

/** Queues again the mail a stopped process left behind. */
export async function requeueStuckMail(olderThanMs = 60_000): Promise<number> {
  if (!dispatch) return 0;
  const ids = await OutgoingMail.stuckIds(olderThanMs);
  for (const id of ids) await dispatch(id);
  return ids.length;
}
