// The farm's climate as a form (R typed or from the yearly rainfall, the design storm), for the
// climate panel, which loads it on demand: the form's libraries stay off the screens' first load.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { TextField } from '../../../components/ui/text-field';
import { R_PRECIPITATION_HINT } from '../../../../shared/erosion/erosivity';
import { mmToIn } from '../../../../shared/erosion/units';
import { ClimateUpdate, type Climate } from '../../../../shared/schemas/season';
import type { Units } from '../../../../shared/schemas/auth';
import { formatFigure } from '../../../lib/format-figure';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';

type Values = {
  rFrom: 'value' | 'precipitation';
  rValue: number | null;
  annualPrecipitationMm: number | null;
  designStormMm: number | null;
};

const R_UNIT = 'MJ·mm/(ha·h·yr)';

export function ClimateForm({ climate, units, onSave, saving }: { climate: Climate | null; units: Units; onSave: (v: z.output<typeof ClimateUpdate>) => void; saving: boolean }) {
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
