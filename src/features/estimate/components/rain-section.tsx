// R, rainfall erosivity: typed in (SI or US units) or roughly from mean annual precipitation.
import { useFormContext, useWatch } from 'react-hook-form';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { R_PRECIPITATION_HINT, R_UNIT, R_UNIT_US } from '../../../../shared/erosion';
import type { EstimateFormValues } from './estimate-form-values';
import { FormGroup, NumField } from './form-bits';

export function RainSection() {
  const { register, control } = useFormContext<EstimateFormValues>();
  const from = useWatch({ control, name: 'r.from' });
  const units = useWatch({ control, name: 'r.units' });
  return (
    <FormGroup title="Rain: R factor" testId="estimate-r" help="How hard the year's storms hit bare soil.">
      <ChoiceGroup
        label="R from"
        inputProps={register('r.from')}
        choices={[
          { value: 'value', label: 'A known R value' },
          { value: 'precipitation', label: 'Annual precipitation' },
        ]}
      />
      {from === 'value' ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <NumField name="r.value" label="R" unit={units === 'us' ? R_UNIT_US : R_UNIT} testId="input-r-value" />
          <SelectField label="R given in" {...register('r.units')}>
            <option value="si">SI: MJ·mm/(ha·h·yr)</option>
            <option value="us">US: hundreds ft·tonf·in/(ac·h·yr)</option>
          </SelectField>
        </div>
      ) : (
        <NumField
          name="r.annualPrecipitationMm"
          label="Mean annual precipitation"
          unit="mm"
          testId="input-r-precip"
          hint={R_PRECIPITATION_HINT}
        />
      )}
    </FormGroup>
  );
}
