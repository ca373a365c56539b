// K, soil erodibility: typed in, from a lab texture (sand/silt/clay and organic matter), or
// from a feel test in the hand, explained step by step.
import { useFormContext, useWatch } from 'react-hook-form';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { K_UNIT, K_UNIT_US } from '../../../../shared/erosion';
import type { EstimateFormValues } from './estimate-form-values';
import { FormGroup, NumField } from './form-bits';

const num = (x: number | undefined) => (typeof x === 'number' && Number.isFinite(x) ? x : 0);

function TextureInputs({ textureClass }: { textureClass?: string }) {
  const { register, control } = useFormContext<EstimateFormValues>();
  const sand = useWatch({ control, name: 'k.sandPct' });
  const silt = useWatch({ control, name: 'k.siltPct' });
  const clay = useWatch({ control, name: 'k.clayPct' });
  const sum = num(sand) + num(silt) + num(clay);
  return (
    <>
      <div className="grid grid-cols-3 gap-3">
        <NumField name="k.sandPct" label="Sand" unit="%" testId="input-k-sand" />
        <NumField name="k.siltPct" label="Silt" unit="%" testId="input-k-silt" />
        <NumField name="k.clayPct" label="Clay" unit="%" testId="input-k-clay" />
      </div>
      <p className="text-sm text-ink-soft" data-testid="texture-sum">
        Together <span className="num">{sum.toLocaleString('en-US', { maximumFractionDigits: 1 })} %</span>
        {Math.abs(sum - 100) > 0.5 ? ' (scaled to 100 %)' : ''}
        {textureClass ? (
          <>
            {' '}
            — texture class <strong className="text-ink">{textureClass}</strong>
          </>
        ) : null}
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <NumField name="k.organicMatterPct" label="Organic matter" unit="%" testId="input-k-om" />
        <SelectField label="Worked out by" {...register('k.method')}>
          <option value="williams">Williams equation (EPIC)</option>
          <option value="table">Table by texture class</option>
        </SelectField>
      </div>
    </>
  );
}

function FeelInputs({ textureClass }: { textureClass?: string }) {
  const { register, control } = useFormContext<EstimateFormValues>();
  const balls = useWatch({ control, name: 'k.balls' });
  const ribbonCm = useWatch({ control, name: 'k.ribbonCm' });
  const ribbons = balls === 'yes' && num(ribbonCm) > 0;
  return (
    <div className="flex flex-col gap-3" data-testid="feel-test">
      <p className="text-sm text-ink-soft">
        Take a walnut-sized lump of soil, pick out stones and roots, and work it with water until it is like putty.
      </p>
      <ChoiceGroup
        label="1. Squeeze it: does the moist soil form a ball?"
        inputProps={register('k.balls')}
        testId="feel-balls"
        choices={[
          { value: 'yes', label: 'Yes, it holds' },
          { value: 'no', label: 'No, it falls apart' },
        ]}
      />
      {balls === 'yes' ? (
        <NumField
          name="k.ribbonCm"
          label="2. Push it between thumb and finger into a flat ribbon: how long before it breaks?"
          unit="cm"
          testId="input-k-ribbon"
          hint="0 if it will not make a ribbon. Under 2.5 cm is weak, 2.5–5 cm medium, over 5 cm strong."
        />
      ) : null}
      {ribbons ? (
        <ChoiceGroup
          label="3. Wet a pinch in your palm and rub it with a finger: how does it feel?"
          inputProps={register('k.feel')}
          testId="feel-grit"
          choices={[
            { value: 'very gritty', label: 'Very gritty' },
            { value: 'very smooth', label: 'Very smooth' },
            { value: 'neither', label: 'Neither' },
          ]}
        />
      ) : null}
      <NumField name="k.organicMatterPct" label="Organic matter" unit="%" testId="input-k-om" hint="From a soil test, or about 2–4 % for most cropped ground." />
      {textureClass ? (
        <p className="text-sm" data-testid="feel-result">
          By feel this soil is <strong>{textureClass}</strong>.
        </p>
      ) : null}
    </div>
  );
}

export function SoilSection({ textureClass }: { textureClass?: string }) {
  const { register, control } = useFormContext<EstimateFormValues>();
  const from = useWatch({ control, name: 'k.from' });
  const units = useWatch({ control, name: 'k.units' });
  return (
    <FormGroup title="Soil: K factor" testId="estimate-k" help="How easily the soil's particles come loose and wash away.">
      <ChoiceGroup
        label="K from"
        inputProps={register('k.from')}
        testId="k-from"
        choices={[
          { value: 'value', label: 'A known K value' },
          { value: 'texture', label: 'Lab texture' },
          { value: 'feel', label: 'Feel test' },
        ]}
      />
      {from === 'value' ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <NumField name="k.value" label="K" unit={units === 'us' ? K_UNIT_US : K_UNIT} testId="input-k-value" />
          <SelectField label="K given in" {...register('k.units')}>
            <option value="us">US: ton·ac·h/(hundreds ac·ft·tonf·in)</option>
            <option value="si">SI: t·ha·h/(ha·MJ·mm)</option>
          </SelectField>
        </div>
      ) : from === 'texture' ? (
        <TextureInputs textureClass={textureClass} />
      ) : (
        <FeelInputs textureClass={textureClass} />
      )}
    </FormGroup>
  );
}
