// Invitations sent and not yet answered; the farmer may withdraw one.
import { Button } from '../../../components/ui/button';
import type { OpenInvitation } from '../../../../shared/schemas/people';
import { useCancelInvitation } from '../api/cancel-invitation';
import { roleLabel } from './role-words';

const dateWords = (iso: string) => new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'long', year: 'numeric' });

export function OpenInvitations({ farmId, invitations }: { farmId: number; invitations: OpenInvitation[] }) {
  const cancel = useCancelInvitation(farmId);
  if (!invitations.length) return null;
  return (
    <section aria-labelledby="open-invitations" className="flex flex-col gap-2">
      <h2 id="open-invitations" className="text-lg font-semibold">
        Waiting for an answer
      </h2>
      <ul className="flex flex-col rounded-lg border border-paper-edge bg-white/50 px-4">
        {invitations.map((inv) => (
          <li key={inv.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-paper-edge py-2 last:border-b-0" data-testid="invitation-row">
            <span className="break-all">{inv.email}</span>
            <span className="text-sm text-ink-soft">
              as {roleLabel(inv.role).toLowerCase()}, link works until {dateWords(inv.expiresAt)}
            </span>
            <Button size="sm" variant="quiet" className="ml-auto" disabled={cancel.isPending} onClick={() => cancel.mutate(inv.id)}>
              Withdraw
            </Button>
          </li>
        ))}
      </ul>
    </section>
  );
}
