// Adding or changing one piece of work: which field, the treatment (or other work, typed), the
// amount and unit, the cost, a day or a window, who does it, and notes. Checked with the same
// schema as the server; the server's answer names any field it refuses.
import { useId, useState, type FormEvent } from 'react';
import { TREATMENT_TITLES } from '../../../../shared/erosion';
import { TREATMENT_KEYS } from '../../../../shared/erosion/treatments/types';
import { PlanActionCreate, type PlanAction, type PlanActionCreate as PlanActionInput } from '../../../../shared/schemas/plans';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-client';

type Timing = 'day' | 'window' | 'none';
type Draft = {
  fieldId: string; treatment: string; title: string; quantity: string; unit: string; cost: string;
  timing: Timing; plannedOn: string; plannedFrom: string; plannedTo: string; doneBy: string; notes: string;
};

const s = (v: string | number | null | undefined) => (v == null ? '' : String(v));

export function draftOf(a: Partial<PlanAction> | null, fieldId?: number): Draft {
  return {
    fieldId: s(a?.fieldId ?? fieldId), treatment: a?.treatment ?? 'cover-crop', title: a?.treatment === 'other' ? s(a.title) : '',
    quantity: s(a?.quantity), unit: s(a?.unit), cost: s(a?.cost),
    timing: a?.plannedOn ? 'day' : a?.plannedFrom || a?.plannedTo ? 'window' : 'none',
    plannedOn: s(a?.plannedOn), plannedFrom: s(a?.plannedFrom), plannedTo: s(a?.plannedTo), doneBy: s(a?.doneBy), notes: s(a?.notes),
  };
}

const num = (v: string) => (v.trim() === '' ? null : Number(v));
const text = (v: string) => (v.trim() === '' ? null : v.trim());

/** The draft as the API's payload (no status: done and checked are recorded apart). */
export function payloadOf(d: Draft): Omit<PlanActionInput, 'status'> {
  return {
    fieldId: Number(d.fieldId), treatment: d.treatment as PlanActionInput['treatment'], title: d.treatment === 'other' ? text(d.title) : null,
    quantity: num(d.quantity), unit: text(d.unit), cost: num(d.cost),
    plannedOn: d.timing === 'day' ? text(d.plannedOn) : null,
    plannedFrom: d.timing === 'window' ? text(d.plannedFrom) : null,
    plannedTo: d.timing === 'window' ? text(d.plannedTo) : null,
    doneBy: text(d.doneBy), notes: text(d.notes),
  };
}

/**
 * Only the parts the person changed from the action as they opened it, so a change made again
 * after a 409 keeps what the other person changed in the parts this person did not touch.
 */
export function changedParts(opened: PlanAction, payload: Omit<PlanActionInput, 'status'>): Partial<Omit<PlanActionInput, 'status'>> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(payload)) {
    // A treatment's own title comes with it; only typed work has a title of its own.
    if (k === 'title' && payload.treatment !== 'other') continue;
    if ((opened[k as keyof PlanAction] ?? null) !== (v ?? null)) out[k] = v;
  }
  return out;
}

type Props = {
  fields: { id: number; name: string }[];
  initial: Draft;
  submitLabel: string;
  currency: string;
  onSubmit: (payload: Omit<PlanActionInput, 'status'>) => Promise<unknown>;
  onCancel?: () => void;
  testId?: string;
};

export function ActionForm({ fields, initial, submitLabel, currency, onSubmit, onCancel, testId = 'action-form' }: Props) {
  const [d, setD] = useState<Draft>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const timingName = useId();
  const set = (k: keyof Draft) => (e: { target: { value: string } }) => setD((x) => ({ ...x, [k]: e.target.value }));

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const payload = payloadOf(d);
    const parsed = PlanActionCreate.safeParse(payload);
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0] ?? 'form'), i.message])));
      return;
    }
    setErrors({});
    setBusy(true);
    try {
      await onSubmit(payload);
    } catch (err) {
      // A 409 is shown by the caller with what changed; other refusals beside their field.
      if (isApiError(err, 409)) return;
      const issues = isApiError(err) ? err.issues : [];
      setErrors(issues.length ? Object.fromEntries(issues.map((i) => [i.path, i.message])) : { form: err instanceof Error ? err.message : String(err) });
    } finally {
      setBusy(false);
    }
  };

  return (
    <form onSubmit={submit} className="grid gap-3 rounded-md border border-paper-edge bg-white/60 p-3 sm:grid-cols-2" data-testid={testId} aria-label={submitLabel}>
      <SelectField label="Field" value={d.fieldId} onChange={set('fieldId')} error={errors.fieldId} data-testid="action-field">
        <option value="">Choose a field</option>
        {fields.map((f) => (
          <option key={f.id} value={f.id}>
            {f.name}
          </option>
        ))}
      </SelectField>
      <SelectField label="Work" value={d.treatment} onChange={set('treatment')} error={errors.treatment} data-testid="action-treatment">
        {TREATMENT_KEYS.map((k) => (
          <option key={k} value={k}>
            {TREATMENT_TITLES[k]}
          </option>
        ))}
        <option value="other">Other work (type what)</option>
      </SelectField>
      {d.treatment === 'other' ? (
        <TextField label="What work" value={d.title} onChange={set('title')} error={errors.title} className="sm:col-span-2" data-testid="action-title" />
      ) : null}
      <div className="grid grid-cols-[1fr_6rem] gap-2">
        <TextField label="Amount" inputMode="decimal" value={d.quantity} onChange={set('quantity')} error={errors.quantity} className="num" data-testid="action-quantity" />
        <TextField label="Unit" placeholder="ha, t, m" value={d.unit} onChange={set('unit')} error={errors.unit} data-testid="action-unit" />
      </div>
      <TextField label={`Cost (${currency})`} inputMode="decimal" value={d.cost} onChange={set('cost')} error={errors.cost} data-testid="action-cost" />
      <fieldset className="flex flex-col gap-2 sm:col-span-2">
        <legend className="text-sm font-medium">When</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
          {(
            [
              ['day', 'On a day'],
              ['window', 'Within a window'],
              ['none', 'Not settled yet'],
            ] as const
          ).map(([k, label]) => (
            <label key={k} className="flex items-center gap-1.5">
              <input type="radio" name={timingName} checked={d.timing === k} onChange={() => setD((x) => ({ ...x, timing: k }))} data-testid={`action-timing-${k}`} />
              {label}
            </label>
          ))}
        </div>
        {d.timing === 'day' ? <TextField label="Day" type="date" value={d.plannedOn} onChange={set('plannedOn')} error={errors.plannedOn} className="max-w-xs" data-testid="action-planned-on" /> : null}
        {d.timing === 'window' ? (
          <div className="grid gap-2 sm:grid-cols-2">
            <TextField label="From" type="date" value={d.plannedFrom} onChange={set('plannedFrom')} error={errors.plannedFrom} />
            <TextField label="To" type="date" value={d.plannedTo} onChange={set('plannedTo')} error={errors.plannedTo} />
          </div>
        ) : null}
      </fieldset>
      <TextField label="Who does it" placeholder="a person or a contractor" value={d.doneBy} onChange={set('doneBy')} error={errors.doneBy} data-testid="action-done-by" />
      <label className="flex flex-col gap-1 text-sm font-medium sm:col-span-2">
        Notes
        <textarea className="min-h-16 rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base font-normal" value={d.notes} onChange={set('notes')} data-testid="action-notes" />
        {errors.notes ? <span className="text-alert">{errors.notes}</span> : null}
      </label>
      {errors.form ? (
        <p role="alert" className="text-sm text-alert sm:col-span-2">
          {errors.form}
        </p>
      ) : null}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" size="sm" disabled={busy} data-testid="action-save">
          {busy ? 'Saving…' : submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="secondary" size="sm" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
