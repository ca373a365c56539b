// The plan's state in words with a small mark, never by colour alone.
import type { PlanState } from '../../../../shared/schemas/plans';
import { STATE_WORDS } from './plan-words';

const MARKS: Record<PlanState, string> = { draft: '✎', submitted: '→', returned: '↩', approved: '✓' };
const TONES: Record<PlanState, string> = {
  draft: 'border-ink-faint bg-paper',
  submitted: 'border-clay bg-clay-light text-clay-dark',
  returned: 'border-caution bg-caution-light text-caution',
  approved: 'border-ink bg-paper-deep text-ink',
};

export function PlanStateBadge({ state }: { state: PlanState }) {
  return (
    <span data-testid="plan-state" data-state={state} className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-sm font-semibold ${TONES[state]}`}>
      <span aria-hidden="true">{MARKS[state]}</span>
      {STATE_WORDS[state].label}
    </span>
  );
}
