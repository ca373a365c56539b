// P, support practice, and the soil-loss tolerance T and field area the results use.
import { useFormContext, useWatch } from 'react-hook-form';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { DEFAULT_T_TON_PER_AC_YR, STRIP_ROTATION_WORDS, STRIP_ROTATIONS, tonPerAcToTPerHa, tPerHaToTonPerAc } from '../../../../shared/erosion';
import { formatFigure } from '../../../lib/format-figure';
import type { EstimateFormValues } from './estimate-form-values';
import { FormGroup, NumField } from './form-bits';

export function PracticeSection() {
  const { register, control } = useFormContext<EstimateFormValues>();
  const from = useWatch({ control, name: 'p.from' });
  const practice = useWatch({ control, name: 'p.practice' });
  return (
    <FormGroup title="Practice: P factor" testId="estimate-p" help="Work across the slope that slows the water down.">
      <ChoiceGroup
        label="P from"
        inputProps={register('p.from')}
        choices={[
          { value: 'practice', label: 'A practice' },
          { value: 'value', label: 'A known P value' },
        ]}
      />
      {from === 'value' ? (
        <NumField name="p.value" label="P" unit="0–1, no unit" testId="input-p-value" />
      ) : (
        <>
          <SelectField label="Support practice" data-testid="input-p-practice" {...register('p.practice')}>
            <option value="none">None (up and down the slope)</option>
            <option value="contouring">Contour farming</option>
            <option value="strip cropping">Contour strip cropping</option>
            <option value="terraces">Terraces</option>
          </SelectField>
          {practice === 'terraces' ? (
            <NumField name="p.terraceIntervalM" label="Distance between terraces" unit="m" testId="input-p-terrace-interval" />
          ) : null}
          {practice === 'strip cropping' ? (
            <>
              <SelectField label="Rotation in the strips" data-testid="input-p-strip-rotation" {...register('p.stripRotation')}>
                {STRIP_ROTATIONS.map((r) => (
                  <option key={r} value={r}>
                    {STRIP_ROTATION_WORDS[r]}
                  </option>
                ))}
              </SelectField>
              <NumField name="p.stripWidthM" label="Strip width" unit="m" optional hint="Checked against the widest strip the P table allows on this slope." testId="input-p-strip-width" />
            </>
          ) : null}
        </>
      )}
    </FormGroup>
  );
}

export function TargetSection() {
  const { control } = useFormContext<EstimateFormValues>();
  const t = useWatch({ control, name: 'tTPerHaYr' });
  const tHint =
    typeof t === 'number' && Number.isFinite(t)
      ? `= ${formatFigure(tPerHaToTonPerAc(t))} US t/ac/yr`
      : `From the soil survey; ${formatFigure(tonPerAcToTPerHa(DEFAULT_T_TON_PER_AC_YR))} t/ha/yr (${DEFAULT_T_TON_PER_AC_YR} US t/ac/yr) for a deep soil when left empty.`;
  return (
    <FormGroup title="Tolerance and area" testId="estimate-t">
      <div className="grid gap-3 sm:grid-cols-2">
        <NumField name="tTPerHaYr" label="Soil-loss tolerance T" unit="t/ha/yr" optional hint={tHint} testId="input-t" />
        <NumField name="areaHa" label="Field area" unit="ha" optional hint="Gives tonnes per year and runoff volume." testId="input-area" />
      </div>
    </FormGroup>
  );
}
