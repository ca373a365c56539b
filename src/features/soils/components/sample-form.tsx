// Lab results typed in (react-hook-form + the shared schema), or a stored sample changed. A lab
// sample shows sand, silt and clay with their live sum; a feel test keeps its feel answers and
// changes only the other figures. A conflict (someone else changed it) reloads the latest.
import { useEffect } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import type { SoilSample, SoilSampleCreate } from '../../../../shared/schemas/soils';
import { useCreateSoilSample } from '../api/create-soil-sample';
import { currentSampleFromConflict, useUpdateSoilSample } from '../api/update-soil-sample';
import { plainMessage, sampleResolver, updateOf, valuesOfSample, type SampleField, type SampleFormValues } from './sample-form-values';
import { ChemistryInputs, DrainageInputs, NumInput, WhereWhenInputs } from './sample-inputs';
import { SeparatesSum } from './separates-sum';

function Group({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold text-clay-dark">{title}</legend>
      {children}
    </fieldset>
  );
}

function LiveSum() {
  const [sand, silt, clay] = useWatch<SampleFormValues, ['sandPct', 'siltPct', 'clayPct']>({ name: ['sandPct', 'siltPct', 'clayPct'] });
  return <SeparatesSum sand={sand} silt={silt} clay={clay} />;
}

type Props = { fieldId: number; sample?: SoilSample; onDone: () => void };

export function SampleForm({ fieldId, sample, onDone }: Props) {
  const create = useCreateSoilSample(fieldId);
  const update = useUpdateSoilSample(fieldId);
  const mutation = sample ? update : create;
  const form = useForm<SampleFormValues, unknown, SoilSampleCreate>({
    resolver: sampleResolver,
    defaultValues: sample ? valuesOfSample(sample) : { kind: 'lab' },
    mode: 'onTouched',
  });
  const kind = sample?.kind ?? 'lab';

  // The server names the field it refuses: put its words beside that input.
  useEffect(() => {
    const error = mutation.error;
    if (!isApiError(error, 400)) return;
    for (const issue of error.issues) {
      const path = issue.path.split('.')[0] as SampleField;
      if (path) form.setError(path, { message: plainMessage(issue.message) });
    }
  }, [mutation.error, form]);

  const onSubmit = form.handleSubmit((checked) => {
    if (sample) update.mutate({ sampleId: sample.id, input: updateOf(checked, sample.version) }, { onSuccess: onDone });
    else create.mutate(checked, { onSuccess: () => { form.reset({ kind: 'lab' }); onDone(); } });
  });

  const conflict = sample ? currentSampleFromConflict(update.error) : null;
  const otherError = mutation.error && !isApiError(mutation.error, 400) ? mutation.error.message : null;

  return (
    <FormProvider {...form}>
      <form
        noValidate
        onSubmit={onSubmit}
        data-testid={sample ? 'sample-edit-form' : 'lab-form'}
        aria-label={sample ? `Change sample ${sample.label ?? sample.id}` : 'Lab results'}
        className="flex flex-col gap-4 rounded-md border border-paper-edge bg-white/40 p-3"
      >
        <h3 className="text-base font-semibold">
          {sample ? `Change ${kind === 'lab' ? 'lab sample' : 'feel test'} ${sample.label ?? ''}` : 'Lab results'}
        </h3>
        {kind === 'feel' && sample?.feelTest ? (
          <p className="text-sm text-ink-soft">
            The feel answers stay as recorded ({sample.textureClass ?? 'no class'}); to redo them, delete this sample and run the feel
            test again.
          </p>
        ) : null}
        <Group title="Where and when">
          <WhereWhenInputs />
        </Group>
        {kind === 'lab' ? (
          <Group title="Sand, silt and clay of the fine earth (under 2 mm)">
            <div className="grid grid-cols-3 gap-3">
              <NumInput name="sandPct" unit="%" hint="0.05–2 mm" />
              <NumInput name="siltPct" unit="%" hint="0.002–0.05 mm" />
              <NumInput name="clayPct" unit="%" hint="under 0.002 mm" />
            </div>
            <LiveSum />
          </Group>
        ) : null}
        <Group title="Gray or mottled colours">
          <DrainageInputs />
        </Group>
        <Group title="Organic matter and chemistry">
          <ChemistryInputs />
        </Group>
        {conflict ? (
          <Notice tone="caution" title="Someone else changed this sample" testId="sample-conflict">
            <p>{update.error?.message}</p>
            <Button variant="secondary" size="sm" className="mt-1" onClick={() => { form.reset(valuesOfSample(conflict)); update.reset(); }}>
              Start again from their version
            </Button>
          </Notice>
        ) : otherError ? (
          <Notice tone="error">{otherError}</Notice>
        ) : null}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={mutation.isPending || !!conflict} data-testid="sample-save">
            {mutation.isPending ? 'Saving…' : sample ? 'Save the change' : 'Save the lab results'}
          </Button>
          <Button variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
