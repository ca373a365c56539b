// Runoff for one design storm by the curve-number method: rainfall depth, and the CN from the
// hydrologic soil group and cover, or typed in.
import { useFormContext, useWatch } from 'react-hook-form';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { CN_CHOICES, type EstimateFormValues } from './estimate-form-values';
import { FormGroup, NumField } from './form-bits';

const rowLabel = (c: (typeof CN_CHOICES)[number]) =>
  [c.cover, c.treatment, c.condition ? `${c.condition} condition` : null].filter(Boolean).join(', ');

export function RunoffSection({ kFromSoil }: { kFromSoil: boolean }) {
  const { register, control } = useFormContext<EstimateFormValues>();
  const on = useWatch({ control, name: 'runoffOn' });
  const cnFrom = useWatch({ control, name: 'runoff.cnFrom' });
  const hsg = useWatch({ control, name: 'runoff.hsg' });
  const drained = useWatch({ control, name: 'runoff.drained' });
  return (
    <FormGroup title="Runoff from a design storm" testId="estimate-runoff">
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" className="h-4 w-4 accent-clay" data-testid="input-runoff-on" {...register('runoffOn')} />
        Work out the runoff of one storm (curve-number method)
      </label>
      {on ? (
        <>
          <NumField
            name="runoff.rainfallMm"
            label="Storm rainfall"
            unit="mm"
            testId="input-runoff-rain"
            hint="The depth of the design storm, for example the 24-hour rain expected once in 10 years."
          />
          <ChoiceGroup
            label="Curve number from"
            inputProps={register('runoff.cnFrom')}
            choices={[
              { value: 'table', label: 'Soil group and cover' },
              { value: 'value', label: 'A known curve number' },
            ]}
          />
          {cnFrom === 'value' ? (
            <NumField name="runoff.cn" label="Curve number" unit="1–100, no unit" testId="input-runoff-cn" />
          ) : (
            <>
              <SelectField
                label="Hydrologic soil group"
                data-testid="input-runoff-hsg"
                hint="A drains fast (sands) … D sheds water (clays, shallow or wet soils). The soil survey names it."
                {...register('runoff.hsg')}
              >
                <option value="">
                  {kFromSoil ? 'From the soil texture above' : 'From the soil texture (give K by texture or feel)'}
                </option>
                {['A', 'B', 'C', 'D', 'A/D', 'B/D', 'C/D'].map((g) => (
                  <option key={g} value={g}>
                    Group {g}
                  </option>
                ))}
              </SelectField>
              {hsg.includes('/') ? (
                <>
                  <label className="flex items-center gap-2 text-sm">
                    <input type="checkbox" className="h-4 w-4 accent-clay" {...register('runoff.drained')} />
                    The field is drained (tile or ditches)
                  </label>
                  {drained ? (
                    <NumField
                      name="runoff.drainedWaterTableDepthCm"
                      label="Depth the drains keep the water table at"
                      unit="cm"
                      optional
                      hint="The first letter of the group counts only from 60 cm down; without a depth the group is taken as D."
                      testId="input-runoff-drained-depth"
                    />
                  ) : null}
                </>
              ) : null}
              <SelectField label="Cover and treatment" data-testid="input-runoff-cover" {...register('runoff.cnRow')}>
                {CN_CHOICES.map((c, i) => (
                  <option key={i} value={String(i)}>
                    {rowLabel(c)}
                  </option>
                ))}
              </SelectField>
            </>
          )}
          <SelectField label="Wetness before the storm" {...register('runoff.antecedent')}>
            <option value="I">Dry (condition I)</option>
            <option value="II">Average (condition II)</option>
            <option value="III">Wet (condition III)</option>
          </SelectField>
        </>
      ) : null}
    </FormGroup>
  );
}
