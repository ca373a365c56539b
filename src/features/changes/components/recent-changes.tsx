// Recent changes on the farm: who changed which record and when, newest first, so the farmer
// sees what the advisor (or anyone) entered. For the farmer and the advisor.
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '../../../components/ui/notice';
import { paths } from '../../../lib/paths';
import { useChanges } from '../api/get-changes';

const stamp = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
const FIRST_SHOWN = 8;

export function RecentChanges({ farmId }: { farmId: number }) {
  const changes = useChanges(farmId);
  const [all, setAll] = useState(false);
  return (
    <details className="rounded-md border border-paper-edge bg-white/50 p-3" data-testid="recent-changes">
      <summary className="cursor-pointer font-serif text-lg font-semibold">Recent changes</summary>
      {changes.isPending ? (
        <p className="text-sm text-ink-soft">Reading the changes…</p>
      ) : changes.isError ? (
        <Notice tone="error">{changes.error.message}</Notice>
      ) : changes.data.length === 0 ? (
        <p className="text-sm text-ink-soft">Nothing has changed yet.</p>
      ) : (
        <>
          <ul className="mt-2 flex flex-col gap-1.5 text-sm">
            {(all ? changes.data : changes.data.slice(0, FIRST_SHOWN)).map((c) => (
              <li key={c.id} data-testid="change-row">
                <span className="font-semibold">{c.by?.name ?? 'Someone'}</span> {c.summary}
                <span className="block text-xs text-ink-soft">
                  {stamp.format(new Date(c.at))}
                  {c.fieldId ? (
                    <>
                      {' · '}
                      <Link to={paths.field.getHref(farmId, c.fieldId)} className="text-clay-dark underline underline-offset-2">
                        open the field
                      </Link>
                    </>
                  ) : null}
                </span>
              </li>
            ))}
          </ul>
          {changes.data.length > FIRST_SHOWN ? (
            <button type="button" className="mt-2 text-sm font-semibold text-clay-dark underline underline-offset-2" onClick={() => setAll(!all)}>
              {all ? 'Show fewer' : `Show all ${changes.data.length}`}
            </button>
          ) : null}
        </>
      )}
    </details>
  );
}
