// The review conversation: comments on the plan or on one piece of work, the advisor's reasons
// for sending it back and their words on approval, each with who and when.
import { useState, type FormEvent } from 'react';
import type { PlanComment } from '../../../../shared/schemas/plans';
import { Button } from '../../../components/ui/button';
import { byWhen } from './plan-words';

const KIND_WORDS: Record<PlanComment['kind'], string | null> = { comment: null, return: 'Sent back', approval: 'Approved' };

export function CommentList({ comments, testId = 'comment-list' }: { comments: PlanComment[]; testId?: string }) {
  if (!comments.length) return null;
  return (
    <ul className="flex flex-col gap-2" data-testid={testId}>
      {comments.map((c) => (
        <li key={c.id} className={`rounded border-l-4 bg-white/50 px-3 py-1.5 text-sm ${c.kind === 'return' ? 'border-caution' : c.kind === 'approval' ? 'border-ink' : 'border-paper-edge'}`} data-testid="plan-comment" data-kind={c.kind}>
          <p className="text-xs text-ink-soft">
            {KIND_WORDS[c.kind] ? <span className="font-semibold text-ink">{KIND_WORDS[c.kind]} · </span> : null}
            {byWhen(c.author, c.createdAt)} · revision {c.revision}
          </p>
          <p className="whitespace-pre-line">{c.body}</p>
        </li>
      ))}
    </ul>
  );
}

export function CommentForm({ label, onSubmit, onCancel }: { label: string; onSubmit: (body: string) => Promise<unknown>; onCancel?: () => void }) {
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const submit = async (e: FormEvent) => {
    e.preventDefault();
    if (!body.trim()) {
      setError('Write the comment first.');
      return;
    }
    setBusy(true);
    try {
      await onSubmit(body.trim());
      setBody('');
      setError(null);
    } catch (err) {
      setError(err instanceof Error ? err.message : String(err));
    } finally {
      setBusy(false);
    }
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-2" aria-label={label}>
      <label className="flex flex-col gap-1 text-sm font-medium">
        {label}
        <textarea className="min-h-16 rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base font-normal" value={body} onChange={(e) => setBody(e.target.value)} data-testid="comment-body" />
      </label>
      {error ? (
        <p role="alert" className="text-sm text-alert">
          {error}
        </p>
      ) : null}
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="secondary" disabled={busy} data-testid="comment-send">
          {busy ? 'Sending…' : 'Send the comment'}
        </Button>
        {onCancel ? (
          <Button size="sm" variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
