// One piece of planned work: what, how much, the cost, when, who does it, its status and notes;
// who last changed it; the follow-up (done with the day, the amount and a photo; checked by the
// advisor) and the comments on it. Changing it after someone else did shows what they changed
// and lets the person make their change again on top.
import { useState } from 'react';
import { actionChanges } from '../../../../shared/plan-changes';
import type { Units } from '../../../../shared/schemas/auth';
import type { PlanAction, PlanActionCreate, PlanComment } from '../../../../shared/schemas/plans';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { amountWords } from '../../../lib/amount-words';
import { isApiError } from '../../../lib/api-client';
import { formatMoney } from '../../../lib/money';
import { actionPhotoUrl } from '../api/mark-action-done';
import { ActionForm, changedParts, draftOf } from './action-form';
import { PartChanges } from './change-list';
import { CommentForm, CommentList } from './plan-comments';
import { byWhen, dayWords, STATUS_WORDS, whenWords } from './plan-words';

type Payload = Omit<PlanActionCreate, 'status'>;

export type ActionHandlers = {
  update: (action: PlanAction, version: number, changes: Partial<Payload>) => Promise<unknown>;
  remove: (action: PlanAction) => Promise<unknown>;
  comment: (action: PlanAction, body: string) => Promise<unknown>;
  markDone: (action: PlanAction) => void;
  check: (action: PlanAction) => Promise<unknown>;
};

type Props = {
  action: PlanAction;
  comments: PlanComment[];
  fields: { id: number; name: string }[];
  units: Units;
  /** May change the work (farmer or advisor, and the plan not with the advisor). */
  canChange: boolean;
  /** May record follow-up and comment (farmer or advisor). */
  canFollowUp: boolean;
  canCheck: boolean;
  handlers: ActionHandlers;
};

const STATUS_MARK: Record<PlanAction['status'], string> = { planned: '○', done: '●', checked: '✓' };

function FollowUp({ a, units }: { a: PlanAction; units: Units }) {
  if (a.status === 'planned') return null;
  return (
    <div className="flex flex-wrap items-start gap-3 rounded border border-paper-edge bg-paper-deep/60 px-2 py-1.5 text-sm" data-testid="action-follow-up">
      {a.hasPhoto ? (
        <a href={actionPhotoUrl(a.id)} target="_blank" rel="noreferrer" className="shrink-0">
          <img src={actionPhotoUrl(a.id, true)} alt={`Photo of ${a.title} on ${a.fieldName}`} className="h-14 w-20 rounded object-cover" data-testid="action-photo" />
        </a>
      ) : null}
      <div className="flex flex-col">
        <span>
          <span className="font-semibold">Done {a.doneOn ? dayWords(a.doneOn) : ''}</span>
          {a.appliedQuantity != null ? <span className="num">, {a.unit ? amountWords(a.appliedQuantity, a.unit, units) : a.appliedQuantity} applied</span> : null}
          {a.quantity != null && a.appliedQuantity != null && a.unit ? <span className="text-ink-soft"> (planned {amountWords(a.quantity, a.unit, units)})</span> : null}
        </span>
        {a.doneNote ? <span>{a.doneNote}</span> : null}
        <span className="text-xs text-ink-soft">Recorded by {byWhen(a.doneRecordedBy, a.doneRecordedAt)}</span>
        {a.status === 'checked' ? (
          <span className="text-xs font-semibold" data-testid="action-checked-by">
            Checked by {byWhen(a.checkedBy, a.checkedAt)}
          </span>
        ) : null}
      </div>
    </div>
  );
}

export function ActionItem({ action: a, comments, fields, units, canChange, canFollowUp, canCheck, handlers }: Props) {
  const [editing, setEditing] = useState<PlanAction | null>(null);
  const [conflict, setConflict] = useState<{ opened: PlanAction; current: PlanAction; payload: Payload } | null>(null);
  const [commenting, setCommenting] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const save = async (opened: PlanAction, version: number, payload: Payload) => {
    const changes = changedParts(opened, payload);
    try {
      if (Object.keys(changes).length) await handlers.update(a, version, changes);
      setEditing(null);
      setConflict(null);
    } catch (err) {
      const current = isApiError(err, 409) ? (err.details as { current?: PlanAction } | undefined)?.current : undefined;
      if (current) {
        setEditing(null);
        setConflict({ opened, current, payload });
      }
      throw err;
    }
  };
  const run = (p: Promise<unknown>) => p.then(() => setError(null), (err: unknown) => setError(err instanceof Error ? err.message : String(err)));

  return (
    <li className="flex flex-col gap-2 border-b border-paper-edge py-3 last:border-b-0" data-testid="plan-action" data-action-id={a.id} data-status={a.status}>
      <div className="grid gap-x-3 gap-y-1 text-sm md:grid-cols-[minmax(0,2fr)_minmax(0,1.1fr)_minmax(0,0.8fr)_minmax(0,1.3fr)_minmax(0,1.1fr)]">
        <div className="flex flex-col">
          <span className="font-semibold" data-testid="plan-action-title">
            {a.title}
          </span>
          {a.doneBy ? <span className="text-ink-soft">by {a.doneBy}</span> : null}
        </div>
        <div className="num flex justify-between md:block">
          <span className="text-ink-soft md:hidden">Amount</span>
          {a.quantity != null && a.unit ? amountWords(a.quantity, a.unit, units) : '—'}
        </div>
        <div className="num flex justify-between md:block md:text-right" data-testid="plan-action-cost">
          <span className="text-ink-soft md:hidden">Cost</span>
          {a.cost != null ? formatMoney(a.cost, a.currency) : '—'}
        </div>
        <div className="flex justify-between md:block">
          <span className="text-ink-soft md:hidden">When</span>
          {whenWords(a)}
        </div>
        <div className="flex justify-between md:block" data-testid="plan-action-status">
          <span className="text-ink-soft md:hidden">Status</span>
          <span className="font-medium">
            <span aria-hidden="true">{STATUS_MARK[a.status]} </span>
            {STATUS_WORDS[a.status]}
          </span>
        </div>
      </div>
      {a.notes ? <p className="text-sm">{a.notes}</p> : null}
      <FollowUp a={a} units={units} />
      <p className="text-xs text-ink-soft" data-testid="plan-action-changed-by">
        Last changed by {byWhen(a.updatedBy, a.updatedAt)}
      </p>
      {conflict ? (
        <Notice tone="caution" title="Someone changed this work while you were editing it" testId="action-conflict">
          <p>What they changed since you opened it:</p>
          <PartChanges fields={actionChanges(conflict.opened, conflict.current)} />
          <div className="mt-2 flex flex-wrap gap-2">
            <Button
              size="sm"
              data-testid="action-redo"
              onClick={() => void save(conflict.opened, conflict.current.version, conflict.payload).catch((err: unknown) => setError(err instanceof Error ? err.message : String(err)))}
            >
              Make my change again on top
            </Button>
            <Button size="sm" variant="secondary" onClick={() => setConflict(null)}>
              Keep theirs
            </Button>
          </div>
        </Notice>
      ) : null}
      {editing ? (
        <ActionForm
          fields={fields}
          initial={draftOf(editing)}
          currency={a.currency}
          submitLabel="Save the change"
          onSubmit={(payload) => save(editing, editing.version, payload)}
          onCancel={() => setEditing(null)}
          testId="action-edit-form"
        />
      ) : null}
      <CommentList comments={comments} />
      {commenting ? <CommentForm label="Comment on this work" onSubmit={(body) => handlers.comment(a, body).then(() => setCommenting(false))} onCancel={() => setCommenting(false)} /> : null}
      {error ? (
        <p role="alert" className="text-sm text-alert">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-x-3 gap-y-1">
        {canChange && !editing ? (
          <Button variant="quiet" size="sm" className="px-0" onClick={() => setEditing(a)} data-testid="action-edit">
            Change
          </Button>
        ) : null}
        {canChange ? (
          <Button variant="quiet" size="sm" className="px-0" onClick={() => window.confirm(`Remove ${a.title} on ${a.fieldName} from the plan?`) && void run(handlers.remove(a))} data-testid="action-remove">
            Remove
          </Button>
        ) : null}
        {canFollowUp && a.status !== 'checked' ? (
          <Button variant="quiet" size="sm" className="px-0" onClick={() => handlers.markDone(a)} data-testid="action-mark-done">
            {a.status === 'done' ? 'Change the record of work done' : 'Record as done'}
          </Button>
        ) : null}
        {canCheck && a.status === 'done' ? (
          <Button variant="quiet" size="sm" className="px-0" onClick={() => void run(handlers.check(a))} data-testid="action-check">
            Mark as checked
          </Button>
        ) : null}
        {canFollowUp && !commenting ? (
          <Button variant="quiet" size="sm" className="px-0" onClick={() => setCommenting(true)} data-testid="action-comment">
            Comment on it
          </Button>
        ) : null}
      </div>
    </li>
  );
}
