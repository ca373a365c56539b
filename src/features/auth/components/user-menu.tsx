// Header menu: the signed-in user (a link to their account), area units (hectares or acres, saved on the user) and sign out.
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '../../../lib/paths';
import { UNIT_LABELS } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import { useMe } from '../api/get-me';
import { useLogout } from '../api/logout';
import { useUpdateMe } from '../api/update-me';

const UNIT_CHOICES: Units[] = ['ha', 'ac'];

export function UserMenu() {
  const me = useMe();
  const updateMe = useUpdateMe();
  const logout = useLogout();
  const navigate = useNavigate();
  const user = me.data;
  if (!user) return null;

  return (
    <div className="flex flex-wrap items-center gap-3 text-sm print:hidden">
      <div role="group" aria-label="Area units" className="flex items-center gap-1">
        <span className="text-ink-soft">Area in</span>
        {UNIT_CHOICES.map((u) => (
          <button
            key={u}
            type="button"
            aria-pressed={user.units === u}
            title={`Show areas in ${UNIT_LABELS[u]}`}
            data-testid={`units-${u}`}
            onClick={() => user.units !== u && updateMe.mutate({ units: u })}
            className={`rounded border px-2 py-0.5 font-medium ${
              user.units === u ? 'border-clay-dark bg-clay text-paper' : 'border-ink-faint bg-paper text-ink hover:bg-paper-deep'
            }`}
          >
            {UNIT_LABELS[u]}
          </button>
        ))}
      </div>
      {updateMe.isError ? (
        <span role="alert" className="text-alert">
          Units not saved: {updateMe.error.message}
        </span>
      ) : null}
      <Link to={paths.account.getHref()} className="text-ink-soft underline-offset-2 hover:underline" title="Your account: password and mail notices" data-testid="user-name">
        <span className="hidden sm:inline">{user.name}</span>
        <span className="sm:hidden">Account</span>
      </Link>
      <button
        type="button"
        className="rounded border border-ink-faint px-2 py-0.5 font-medium hover:bg-paper-deep"
        disabled={logout.isPending}
        onClick={() => logout.mutate(undefined, { onSettled: () => navigate(paths.signIn.getHref()) })}
      >
        Sign out
      </button>
    </div>
  );
}
