// LS from one slope: steepness in %, length in m along the flow path, and the rill ratio.
import { useFormContext } from 'react-hook-form';
import { SelectField } from '../../../components/ui/select-field';
import type { EstimateFormValues } from './estimate-form-values';
import { FormGroup, NumField } from './form-bits';

export function SlopeSection() {
  const { register } = useFormContext<EstimateFormValues>();
  return (
    <FormGroup title="Slope: LS factor" testId="estimate-ls" help="The typical slope of the field, and how far water runs down it before it reaches a channel, a flatter place or the field edge.">
      <div className="grid gap-3 sm:grid-cols-2">
        <NumField name="slopePct" label="Slope" unit="%" testId="input-slope-pct" />
        <NumField name="slopeLengthM" label="Slope length" unit="m" testId="input-slope-length" />
      </div>
      <SelectField
        label="Rill and interrill erosion"
        hint="Moderate suits most cropped fields; high for freshly tilled, thawing or easily rilled soil; low for pasture and meadow."
        {...register('rillRatio')}
      >
        <option value="low">Low rill ratio</option>
        <option value="moderate">Moderate rill ratio</option>
        <option value="high">High rill ratio</option>
      </SelectField>
    </FormGroup>
  );
}
