// A small control beside R, K, C or P on the Risk tab: type a figure for this field in place of
// the worked-out one, with a note saying why (required), change it, or remove it. Farmers and
// advisors only; the shared FactorOverrideUpdate schema checks the form as it checks the API.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { LastChange } from '../../../components/last-change';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { FactorOverrideUpdate, OVERRIDE_SPECS, type FactorOverride, type OverrideFactor } from '../../../../shared/schemas/overrides';
import { useRemoveFactorOverride } from '../../seasons/api/remove-factor-override';
import { useSetFactorOverride } from '../../seasons/api/set-factor-override';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';

type Props = { fieldId: number; factor: OverrideFactor; current: FactorOverride | undefined };
type Values = z.input<typeof FactorOverrideUpdate>;

function OverrideForm({ fieldId, factor, current, onDone }: Props & { onDone: () => void }) {
  const set = useSetFactorOverride(fieldId);
  const remove = useRemoveFactorOverride(fieldId);
  const spec = OVERRIDE_SPECS[factor];
  const form = useForm<Values, unknown, z.output<typeof FactorOverrideUpdate>>({
    resolver: zodResolver(FactorOverrideUpdate),
    defaultValues: { factor, value: current?.value, note: current?.note ?? '' },
  });
  const e = form.formState.errors;
  const failure = set.error ?? remove.error;
  return (
    <form
      className="flex min-w-56 flex-col gap-2 rounded-md border border-paper-edge bg-paper p-2"
      data-testid={`override-form-${factor}`}
      noValidate
      onSubmit={form.handleSubmit((v) => set.mutate(v, { onSuccess: onDone }))}
    >
      <TextField
        label={`${factor.toUpperCase()} for this field${spec.unit ? ` (${spec.unit})` : ''}`}
        inputMode="decimal"
        className="num"
        error={plainMessage(e.value?.message)}
        data-testid={`override-value-${factor}`}
        {...form.register('value', { setValueAs: toNumberOrNull })}
      />
      <TextField
        label="Why (shown beside the figure)"
        placeholder="e.g. the county's published figure"
        error={plainMessage(e.note?.message)}
        data-testid={`override-note-${factor}`}
        {...form.register('note')}
      />
      {failure ? (
        <p role="alert" className="text-sm text-alert">
          {failure.message}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" size="sm" disabled={set.isPending} data-testid={`override-save-${factor}`}>
          {set.isPending ? 'Saving…' : 'Use this figure'}
        </Button>
        {current ? (
          <Button variant="danger" size="sm" disabled={remove.isPending} onClick={() => remove.mutate(factor, { onSuccess: onDone })} data-testid={`override-remove-${factor}`}>
            Back to the worked-out figure
          </Button>
        ) : null}
        <Button variant="quiet" size="sm" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

export function FactorOverrideControl(props: Props) {
  const [open, setOpen] = useState(false);
  if (open) return <OverrideForm {...props} onDone={() => setOpen(false)} />;
  return (
    <span className="inline-flex flex-col items-start">
      <Button variant="quiet" size="sm" onClick={() => setOpen(true)} data-testid={`override-open-${props.factor}`}>
        {props.current ? 'change override' : 'override'}
      </Button>
      {props.current ? <LastChange change={{ by: props.current.setBy, at: props.current.updatedAt }} testId={`override-last-change-${props.factor}`} /> : null}
    </span>
  );
}
