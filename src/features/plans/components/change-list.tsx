// What changed, in words: between two versions of a plan (added, removed, changed actions), or
// in one action (each part from → to). The versions list and the 409 message both use it.
import type { ActionFieldChange, PlanChanges } from '../../../../shared/schemas/plans';
import { PART_WORDS, valueWords } from './plan-words';

export function PartChanges({ fields }: { fields: ActionFieldChange[] }) {
  return (
    <ul className="list-inside list-disc" data-testid="part-changes">
      {fields.map((f) => (
        <li key={f.key}>
          {PART_WORDS[f.key] ?? f.key}: <span className="line-through decoration-ink-faint">{valueWords(f.from)}</span> → <span className="font-semibold">{valueWords(f.to)}</span>
        </li>
      ))}
    </ul>
  );
}

export function PlanChangeList({ changes }: { changes: PlanChanges }) {
  const none = !changes.added.length && !changes.removed.length && !changes.changed.length;
  if (none) return <p className="text-sm text-ink-soft">No change to the work since revision {changes.fromRevision}.</p>;
  return (
    <ul className="flex flex-col gap-1 text-sm" data-testid="plan-changes">
      {changes.added.map((a) => (
        <li key={`a${a.id}`}>
          <span className="font-semibold">Added</span> {a.title} on {a.fieldName}
        </li>
      ))}
      {changes.removed.map((a) => (
        <li key={`r${a.id}`}>
          <span className="font-semibold">Removed</span> {a.title} on {a.fieldName}
        </li>
      ))}
      {changes.changed.map((c) => (
        <li key={`c${c.actionId}`}>
          <span className="font-semibold">Changed</span> {c.title} on {c.fieldName}
          <PartChanges fields={c.fields} />
        </li>
      ))}
    </ul>
  );
}
