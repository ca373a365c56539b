// Recording work as done: the day, the amount actually applied (in the action's unit), a note
// and a photo. A record of what happened, not a change to the plan: an approved plan stays
// approved. The photo is checked for size here and for its content by the server.
import { useState, type FormEvent } from 'react';
import { PHOTO_MAX_BYTES, BYTES_PER_MIB } from '../../../../shared/limits';
import { PlanActionDone, type PlanAction } from '../../../../shared/schemas/plans';
import { Button } from '../../../components/ui/button';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { TextField } from '../../../components/ui/text-field';
import type { DoneInput } from '../api/mark-action-done';

const today = () => new Date().toISOString().slice(0, 10);

type Props = { action: PlanAction; onSave: (input: DoneInput) => Promise<unknown>; onClose: () => void };

export function DoneForm({ action, onSave, onClose }: Props) {
  const [doneOn, setDoneOn] = useState(action.doneOn ?? today());
  const [applied, setApplied] = useState(action.appliedQuantity != null ? String(action.appliedQuantity) : action.quantity != null ? String(action.quantity) : '');
  const [note, setNote] = useState(action.doneNote ?? '');
  const [photo, setPhoto] = useState<File | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const titleId = `done-${action.id}`;

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const parsed = PlanActionDone.safeParse({ version: action.version, doneOn, appliedQuantity: applied.trim() === '' ? undefined : Number(applied), note: note.trim() || undefined });
    const found: Record<string, string> = parsed.success ? {} : Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message]));
    if (photo && photo.size > PHOTO_MAX_BYTES) found.photo = `The photo is larger than the ${PHOTO_MAX_BYTES / BYTES_PER_MIB} MB limit.`;
    setErrors(found);
    if (!parsed.success || found.photo) return;
    setBusy(true);
    try {
      await onSave({ version: action.version, doneOn, appliedQuantity: parsed.data.appliedQuantity ?? null, note: parsed.data.note ?? null, photo });
      onClose();
    } catch (err) {
      setErrors({ form: err instanceof Error ? err.message : String(err) });
    } finally {
      setBusy(false);
    }
  };

  return (
    <ModalDialog titleId={titleId} onClose={onClose} testId="done-form" className="w-full max-w-md p-4">
      <form onSubmit={submit} className="flex flex-col gap-3">
        <h2 id={titleId} className="font-serif text-lg font-semibold">
          Record the work done: {action.title} on {action.fieldName}
        </h2>
        <p className="text-sm text-ink-soft">This records what happened. It does not change the plan, so an approved plan needs no new approval.</p>
        <TextField label="Done on" type="date" value={doneOn} onChange={(e) => setDoneOn(e.target.value)} error={errors.doneOn} data-testid="done-on" />
        <TextField
          label={`Amount actually applied${action.unit ? ` (${action.unit})` : ''}`}
          inputMode="decimal"
          value={applied}
          onChange={(e) => setApplied(e.target.value)}
          error={errors.appliedQuantity}
          hint={action.quantity != null ? `Planned: ${action.quantity} ${action.unit ?? ''}` : undefined}
          data-testid="done-applied"
        />
        <label className="flex flex-col gap-1 text-sm font-medium">
          Note
          <textarea className="min-h-14 rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base font-normal" value={note} onChange={(e) => setNote(e.target.value)} data-testid="done-note" />
          {errors.note ? <span className="text-alert">{errors.note}</span> : null}
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Photo of the work (JPEG, PNG or WebP; optional)
          <input type="file" accept="image/jpeg,image/png,image/webp" onChange={(e) => setPhoto(e.target.files?.[0] ?? null)} data-testid="done-photo" />
          {errors.photo ? <span className="text-alert">{errors.photo}</span> : null}
        </label>
        {errors.form ? (
          <p role="alert" className="text-sm text-alert">
            {errors.form}
          </p>
        ) : null}
        <div className="flex gap-2">
          <Button type="submit" size="sm" disabled={busy} data-testid="done-save">
            {busy ? 'Saving…' : 'Record as done'}
          </Button>
          <Button variant="secondary" size="sm" onClick={onClose}>
            Cancel
          </Button>
        </div>
      </form>
    </ModalDialog>
  );
}
