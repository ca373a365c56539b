// How many soil checks wait in this browser to be sent, and each one the server refused with
// its reason (try it again, or let it go). Nothing shows when nothing waits.
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useSendWaitingChecks, useSettleFailedCheck, useWaitingChecks } from './waiting-checks-queries';

const checks = (n: number) => `${n} soil ${n === 1 ? 'check' : 'checks'}`;

export function WaitingChecksNotice({ userId }: { userId: number }) {
  const all = useWaitingChecks(userId).data ?? [];
  const send = useSendWaitingChecks(userId);
  const settle = useSettleFailedCheck();
  const waiting = all.filter((c) => c.state === 'waiting');
  const failed = all.filter((c) => c.state === 'failed');
  if (all.length === 0) return null;
  return (
    <div className="flex flex-col gap-2" data-testid="waiting-checks">
      {waiting.length ? (
        <Notice tone="caution" testId="waiting-checks-count">
          <span className="flex flex-wrap items-center justify-between gap-2">
            <span>
              <strong className="num">{checks(waiting.length)}</strong> waiting to be sent. They are kept on this device and go by
              themselves when the network is back.
            </span>
            <Button variant="secondary" size="sm" onClick={() => void send()}>
              Send now
            </Button>
          </span>
        </Notice>
      ) : null}
      {failed.length ? (
        <Notice tone="error" title={`${checks(failed.length)} could not be sent`} testId="failed-checks">
          <ul className="mt-1 flex flex-col gap-2">
            {failed.map((c) => (
              <li key={c.key} className="flex flex-col gap-1">
                <span>
                  <strong>{c.title}</strong>: {c.reason}
                </span>
                <span className="flex flex-wrap gap-2">
                  <Button variant="secondary" size="sm" disabled={settle.isPending} onClick={() => settle.mutate({ check: c, action: 'retry' })}>
                    Try again
                  </Button>
                  <Button variant="danger" size="sm" disabled={settle.isPending} onClick={() => settle.mutate({ check: c, action: 'discard' })}>
                    Let it go
                  </Button>
                </span>
              </li>
            ))}
          </ul>
        </Notice>
      ) : null}
    </div>
  );
}
