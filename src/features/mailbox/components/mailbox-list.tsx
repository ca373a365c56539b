// What the local fake mail server caught, newest first; a message opens to its text, with its
// HTML version in a sandboxed frame. Links in the text are clickable.
import { useState } from 'react';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { isApiError } from '../../../lib/api-client';
import type { MailboxMessage } from '../../../../shared/schemas/people';
import { useMailbox } from '../api/get-mailbox';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function TextWithLinks({ text }: { text: string }) {
  return (
    <p className="whitespace-pre-wrap break-words text-sm">
      {text.split(/(https?:\/\/\S+)/g).map((part, i) =>
        /^https?:\/\//.test(part) ? (
          <a key={i} href={part} className="font-semibold text-clay-dark underline" data-testid="mail-link">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </p>
  );
}

function MessageView({ m }: { m: MailboxMessage }) {
  const [html, setHtml] = useState(false);
  return (
    <div className="flex flex-col gap-2 border-t border-paper-edge pt-2">
      <button type="button" className="self-start text-sm font-semibold text-clay-dark underline" onClick={() => setHtml(!html)}>
        {html ? 'Show the plain text' : 'Show the HTML version'}
      </button>
      {html ? <iframe title={`HTML of ${m.subject}`} sandbox="" srcDoc={m.html} className="h-96 w-full rounded border border-paper-edge bg-white" /> : <TextWithLinks text={m.text} />}
    </div>
  );
}

export function MailboxList() {
  const mailbox = useMailbox();
  const [open, setOpen] = useState<number | null>(null);
  if (mailbox.isPending) return <Loading label="Opening the mailbox…" />;
  if (mailbox.isError)
    return (
      <Notice tone={isApiError(mailbox.error, 404) ? 'info' : 'error'} testId="mailbox-off">
        {isApiError(mailbox.error, 404) ? 'This installation sends real mail (SMTP_URL is set), so there is no dev mailbox.' : mailbox.error.message}
      </Notice>
    );
  if (!mailbox.data.length) return <Notice testId="mailbox-empty">Nothing caught yet. Invite someone or ask for a new password, and the mail shows up here.</Notice>;
  return (
    <ul className="flex flex-col gap-2" aria-label="Caught mail">
      {mailbox.data.map((m) => (
        <li key={m.id} className="flex flex-col gap-2 rounded-lg border border-paper-edge bg-white/50 px-4 py-3" data-testid="mail-row">
          <button type="button" className="flex flex-col items-start gap-0.5 text-left" aria-expanded={open === m.id} onClick={() => setOpen(open === m.id ? null : m.id)}>
            <span className="font-semibold">{m.subject}</span>
            <span className="break-all text-sm text-ink-soft">
              to {m.to} · {when(m.sentAt)}
            </span>
          </button>
          {open === m.id ? <MessageView m={m} /> : null}
        </li>
      ))}
    </ul>
  );
}
