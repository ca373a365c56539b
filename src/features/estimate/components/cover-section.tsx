// C, cover and management: typed in, or from the crop, tillage, residue and cover crop (a
// pasture by its ground cover instead).
import { useEffect } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { Crop } from '../../../../shared/schemas/estimate';
import { tillagesFor, type EstimateFormValues } from './estimate-form-values';
import { FormGroup, NumField } from './form-bits';

const CROP_LABELS: Record<string, string> = {
  corn: 'Corn (maize)',
  soybean: 'Soybean',
  'small grain': 'Small grain (wheat, oats, barley)',
  'hay or meadow': 'Hay or meadow',
  pasture: 'Pasture',
};

export function CoverSection() {
  const { register, control, setValue, getValues } = useFormContext<EstimateFormValues>();
  const from = useWatch({ control, name: 'c.from' });
  const crop = useWatch({ control, name: 'c.crop' });
  const tillages = tillagesFor(crop);
  // A crop with other tillage rows: keep the choice one the table has.
  useEffect(() => {
    if (tillages.length && !tillages.includes(getValues('c.tillage'))) setValue('c.tillage', tillages[0]);
  }, [tillages, getValues, setValue]);

  return (
    <FormGroup title="Cover: C factor" testId="estimate-c" help="How much the crop, its residue and the tillage shield the soil over the year.">
      <ChoiceGroup
        label="C from"
        inputProps={register('c.from')}
        testId="c-from"
        choices={[
          { value: 'table', label: 'Crop and tillage' },
          { value: 'value', label: 'A known C value' },
        ]}
      />
      {from === 'value' ? (
        <NumField name="c.value" label="C" unit="0–1, no unit" testId="input-c-value" />
      ) : (
        <>
          <div className="grid gap-3 sm:grid-cols-2">
            <SelectField label="Crop" data-testid="input-c-crop" {...register('c.crop')}>
              {Crop.options.map((c) => (
                <option key={c} value={c}>
                  {CROP_LABELS[c] ?? c}
                </option>
              ))}
            </SelectField>
            {tillages.length ? (
              <SelectField label="Tillage" data-testid="input-c-tillage" {...register('c.tillage')}>
                {tillages.map((t) => (
                  <option key={t} value={t}>
                    {t[0].toUpperCase() + t.slice(1)}
                  </option>
                ))}
              </SelectField>
            ) : null}
          </div>
          {crop === 'pasture' ? (
            <NumField
              name="c.groundCoverPct"
              label="Ground cover in contact with the soil"
              unit="%"
              testId="input-c-ground-cover"
              hint="Grass, litter and low plants touching the ground, 20–100 %."
            />
          ) : tillages.length ? (
            <>
              <NumField
                name="c.residuePct"
                label="Residue cover after planting"
                unit="%"
                optional
                testId="input-c-residue"
                hint="Leave empty for the table's usual cover for this tillage."
              />
              <label className="flex items-center gap-2 text-sm">
                <input type="checkbox" className="h-4 w-4 accent-clay" data-testid="input-c-cover-crop" {...register('c.coverCrop')} />
                A cover crop is grown over winter
              </label>
            </>
          ) : null}
        </>
      )}
    </FormGroup>
  );
}
