// The farm's climate: R (typed, from the mean annual precipitation, or from a rainfall record) and the design storm
// depth for runoff. Farmers and advisors edit it (with the version read; a 409 shows the other
// person's values); everyone else reads it.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { LastChange } from '../../../components/last-change';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { R_PRECIPITATION_HINT } from '../../../../shared/erosion/erosivity';
import { mmToIn } from '../../../../shared/erosion/units';
import { ClimateUpdate, type Climate } from '../../../../shared/schemas/season';
import type { Units } from '../../../../shared/schemas/auth';
import { formatFigure } from '../../../lib/format-figure';
import { useClimate } from '../api/get-climate';
import { useUpdateClimate } from '../api/update-climate';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';
import { saveErrorMessage } from './save-error-message';
import { RainfallRecordUpload } from './rainfall-record-upload';

type Values = {
  rFrom: 'value' | 'precipitation';
  rValue: number | null;
  annualPrecipitationMm: number | null;
  designStormMm: number | null;
};

const R_UNIT = 'MJ·mm/(ha·h·yr)';

function ClimateText({ climate, units }: { climate: Climate; units: Units }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="climate-summary">
      <dt className="text-ink-soft">R, rainfall erosivity</dt>
      <dd className="num">
        {climate.rFrom === 'record' && climate.record
          ? `${formatFigure(climate.rValue ?? 0)} ${R_UNIT}, from ${climate.record.years} year${climate.record.years === 1 ? '' : 's'} of rainfall record (${climate.record.erosiveStorms} erosive storms)`
          : climate.rFrom === 'value'
            ? `${formatFigure(climate.rValue ?? 0)} ${R_UNIT}, typed`
            : `from ${formatFigure(climate.annualPrecipitationMm ?? 0)} mm of rain a year`}
      </dd>
      <dt className="text-ink-soft">Design storm</dt>
      <dd className="num">
        {formatFigure(climate.designStormMm)} mm
        {units === 'ac' ? <span className="text-ink-soft"> ({formatFigure(mmToIn(climate.designStormMm))} in)</span> : null}
      </dd>
    </dl>
  );
}

function ClimateForm({ climate, units, onSave, saving }: { climate: Climate | null; units: Units; onSave: (v: z.output<typeof ClimateUpdate>) => void; saving: boolean }) {
  const form = useForm<Values, unknown, z.output<typeof ClimateUpdate>>({
    // The boxes may be empty (null); the schema says what is required.
    resolver: zodResolver(ClimateUpdate) as unknown as Resolver<Values, unknown, z.output<typeof ClimateUpdate>>,
    defaultValues: {
      // R from a rainfall record is shown as the typed value it gave.
      rFrom: climate?.rFrom === 'record' ? 'value' : (climate?.rFrom ?? 'precipitation'),
      rValue: climate?.rValue ?? null,
      annualPrecipitationMm: climate?.annualPrecipitationMm ?? null,
      designStormMm: climate?.designStormMm ?? null,
    },
  });
  const { register, handleSubmit, formState, control } = form;
  const rFrom = useWatch({ control, name: 'rFrom' });
  const storm = useWatch({ control, name: 'designStormMm' });
  const err = (k: keyof Values) => plainMessage(formState.errors[k]?.message);
  const num = { setValueAs: toNumberOrNull };

  return (
    <form
      className="flex flex-col gap-3"
      data-testid="climate-form"
      onSubmit={handleSubmit((v) =>
        onSave({
          ...v,
          ...(climate ? { version: climate.version } : {}),
          rValue: v.rFrom === 'value' ? v.rValue : null,
          annualPrecipitationMm: v.rFrom === 'precipitation' ? v.annualPrecipitationMm : null,
        }),
      )}
    >
      <ChoiceGroup
        label="R, rainfall erosivity"
        choices={[
          { value: 'precipitation', label: 'From yearly rainfall' },
          { value: 'value', label: 'Type R' },
        ]}
        inputProps={register('rFrom')}
        testId="climate-r-from"
      />
      {rFrom === 'value' ? (
        <TextField
          label={`R (${R_UNIT})`}
          inputMode="decimal"
          className="num"
          error={err('rValue')}
          hint="The published R for the farm's area, in SI units."
          data-testid="climate-r-value"
          {...register('rValue', num)}
        />
      ) : (
        <TextField
          label="Mean annual precipitation (mm)"
          inputMode="decimal"
          className="num"
          error={err('annualPrecipitationMm')}
          hint={R_PRECIPITATION_HINT}
          data-testid="climate-precipitation"
          {...register('annualPrecipitationMm', num)}
        />
      )}
      <TextField
        label="Design storm rainfall (mm)"
        inputMode="decimal"
        className="num"
        error={err('designStormMm')}
        hint={
          typeof storm === 'number' && units === 'ac' && Number.isFinite(storm)
            ? `${formatFigure(mmToIn(storm))} in. The storm runoff is worked out for, e.g. the 24-hour, 10-year rain.`
            : 'The storm runoff is worked out for, e.g. the 24-hour, 10-year rain.'
        }
        data-testid="climate-storm"
        {...register('designStormMm', num)}
      />
      <Button type="submit" size="sm" className="self-start" disabled={saving} data-testid="climate-save">
        {saving ? 'Saving…' : 'Save the climate'}
      </Button>
    </form>
  );
}

export function ClimatePanel({ farmId, canEdit, units }: { farmId: number; canEdit: boolean; units: Units }) {
  const climate = useClimate(farmId);
  const update = useUpdateClimate(farmId);

  return (
    <details className="rounded-md border border-paper-edge bg-white/40 p-3" data-testid="climate-panel" open={climate.data === null ? true : undefined}>
      <summary className="cursor-pointer font-serif text-lg font-semibold">Farm climate</summary>
      <div className="mt-2 flex flex-col gap-3">
        {climate.isPending ? (
          <p className="text-sm text-ink-soft">Loading the climate…</p>
        ) : climate.isError ? (
          <Notice tone="error">{climate.error.message}</Notice>
        ) : (
          <>
            {climate.data ? (
              <ClimateText climate={climate.data} units={units} />
            ) : (
              <Notice tone="caution" testId="climate-missing">
                No climate yet: every field waits for R and the design storm.
              </Notice>
            )}
            {canEdit ? (
              <ClimateForm
                key={climate.data?.version ?? 'new'}
                climate={climate.data}
                units={units}
                saving={update.isPending}
                onSave={(input) => update.mutate(input)}
              />
            ) : null}
            {canEdit ? <RainfallRecordUpload farmId={farmId} climate={climate.data} /> : null}
            <LastChange change={climate.data?.lastChange} testId="climate-last-change" />
            {update.isError ? <Notice tone="error">{saveErrorMessage(update.error, 'climate')}</Notice> : null}
            {update.isSuccess && !update.isPending ? (
              <p role="status" className="text-sm text-ink-soft">
                Saved. Every field's figures are being worked out again.
              </p>
            ) : null}
          </>
        )}
      </div>
    </details>
  );
}
