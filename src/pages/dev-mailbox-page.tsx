// Dev mailbox: the mail the local fake mail server caught (only while SMTP_URL is unset). Needs no
// sign-in, so a forgotten password's link can be read too.
import { Link } from 'react-router-dom';
import { MailboxList } from '../features/mailbox/components/mailbox-list';
import { paths } from '../lib/paths';

export function DevMailboxPage() {
  return (
    <div className="flex min-h-full flex-col">
      <header className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-paper-edge bg-paper px-4 py-2">
        <Link to={paths.farms.getHref()} className="font-serif text-xl font-semibold tracking-tight text-clay-dark">
          Fieldshed
        </Link>
        <span className="text-sm text-ink-soft">/ Dev mailbox</span>
      </header>
      <main className="mx-auto flex w-full max-w-3xl flex-col gap-4 px-4 py-6">
        <div className="flex flex-col gap-1">
          <h1 className="text-2xl font-semibold">Dev mailbox</h1>
          <p className="text-sm text-ink-soft">No mail leaves this machine: a stand-in mail server catches every message, and it shows up here, newest first.</p>
        </div>
        <MailboxList />
      </main>
    </div>
  );
}

export default DevMailboxPage;
