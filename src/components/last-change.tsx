// "Last changed by Teo Lindqvist, 3 Dec 2026, 14:05" under a record, so everyone on the farm
// sees who entered what (an advisor may enter records for a client farm).
import type { LastChange as LastChangeShape } from '../../shared/schemas/season';

const stamp = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

export function LastChange({ change, testId = 'last-change' }: { change: LastChangeShape | null | undefined; testId?: string }) {
  if (!change) return null;
  return (
    <p className="text-xs text-ink-soft" data-testid={testId}>
      Last changed by {change.by ?? 'a former member'}, {stamp.format(new Date(change.at))}
    </p>
  );
}
