// Where the plan stands in review, and the next step for the person reading it: the farmer
// sends it to the advisor; the advisor sends it back with comments or approves it (with an
// optional comment). A step taken on a plan someone changed meanwhile shows what they changed.
import { useState } from 'react';
import { planChanges } from '../../../../shared/plan-changes';
import type { Role } from '../../../../shared/schemas/auth';
import type { Plan, PlanChanges } from '../../../../shared/schemas/plans';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import type { ReviewStep } from '../api/review-plan';
import { PlanChangeList } from './change-list';
import { PlanStateBadge } from './plan-state-badge';
import { byWhen, STATE_WORDS } from './plan-words';

type Props = { plan: Plan; role: Role; onStep: (step: ReviewStep) => Promise<unknown> };

function Stamp({ plan }: { plan: Plan }) {
  const parts: string[] = [];
  if (plan.state === 'approved' && plan.approvedAt) parts.push(`Approved by ${byWhen(plan.approvedBy, plan.approvedAt)}`);
  if (plan.state === 'submitted' && plan.submittedAt) parts.push(`Sent for review by ${byWhen(plan.submittedBy, plan.submittedAt)}`);
  if (plan.state === 'returned' && plan.returnedAt) parts.push(`Sent back by ${byWhen(plan.returnedBy, plan.returnedAt)}`);
  if (plan.state !== 'approved' && plan.approvedRevision) parts.push(`revision ${plan.approvedRevision} stays approved until this one is`);
  return parts.length ? <p className="text-sm text-ink-soft" data-testid="plan-stamp">{parts.join('; ')}.</p> : null;
}

export function ReviewBar({ plan, role, onStep }: Props) {
  const [mode, setMode] = useState<'return' | 'approve' | null>(null);
  const [comment, setComment] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [conflict, setConflict] = useState<PlanChanges | null>(null);
  const [busy, setBusy] = useState(false);

  const take = async (step: ReviewStep) => {
    if (step.step === 'return' && !step.comment.trim()) {
      setError('Say what to change: the farmer reads this comment.');
      return;
    }
    setBusy(true);
    try {
      await onStep(step);
      setMode(null);
      setComment('');
      setError(null);
      setConflict(null);
    } catch (err) {
      const current = isApiError(err, 409) ? (err.details as { current?: Plan } | undefined)?.current : undefined;
      if (current) setConflict(planChanges(plan, current));
      setError(err instanceof Error ? err.message : String(err));
    } finally {
      setBusy(false);
    }
  };

  const farmerMaySend = role === 'farmer' && (plan.state === 'draft' || plan.state === 'returned');
  const advisorReviews = role === 'advisor' && plan.state === 'submitted';

  return (
    <section aria-label="Review" className="flex flex-col gap-2 rounded-md border border-paper-edge bg-white/50 p-3" data-testid="review-bar">
      <div className="flex flex-wrap items-center gap-2">
        <PlanStateBadge state={plan.state} />
        <span className="num text-sm text-ink-soft">revision {plan.revision}</span>
      </div>
      <p className="text-sm">{STATE_WORDS[plan.state].hint}</p>
      <Stamp plan={plan} />
      {conflict ? (
        <Notice tone="caution" title="The plan changed while you were reading it" testId="plan-conflict">
          <PlanChangeList changes={conflict} />
          <p className="mt-1">The plan on screen is now the new one; look it over and take the step again.</p>
        </Notice>
      ) : error ? (
        <p role="alert" className="text-sm text-alert">
          {error}
        </p>
      ) : null}
      {farmerMaySend ? (
        <Button className="self-start" disabled={busy || plan.actions.length === 0} onClick={() => void take({ step: 'submit', version: plan.version })} data-testid="plan-submit">
          Send to the advisor for review
        </Button>
      ) : null}
      {advisorReviews && mode === null ? (
        <div className="flex flex-wrap gap-2">
          <Button onClick={() => setMode('approve')} data-testid="plan-approve-open">
            Approve…
          </Button>
          <Button variant="secondary" onClick={() => setMode('return')} data-testid="plan-return-open">
            Send back with comments…
          </Button>
        </div>
      ) : null}
      {advisorReviews && mode ? (
        <div className="flex flex-col gap-2">
          <label className="flex flex-col gap-1 text-sm font-medium">
            {mode === 'return' ? 'What should change (the farmer reads this)' : 'A comment with the approval (optional)'}
            <textarea className="min-h-20 rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base font-normal" value={comment} onChange={(e) => setComment(e.target.value)} data-testid="review-comment" />
          </label>
          <div className="flex flex-wrap gap-2">
            <Button
              disabled={busy}
              data-testid={mode === 'return' ? 'plan-return' : 'plan-approve'}
              onClick={() => void take(mode === 'return' ? { step: 'return', version: plan.version, comment } : { step: 'approve', version: plan.version, comment: comment.trim() || null })}
            >
              {mode === 'return' ? 'Send it back' : 'Approve this plan'}
            </Button>
            <Button variant="secondary" onClick={() => setMode(null)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
    </section>
  );
}
