// The inputs of a soil sample, bound to the sample form's react-hook-form context: a number box
// (empty = not given) with its unit in the label and the schema's error beside it, and the
// groups the lab form and the feel test share (where and when; colours and drainage; chemistry).
import { useFormContext } from 'react-hook-form';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { BUFFER_METHOD_NAMES } from '../../../../shared/schemas/soils';
import { FIELD_LABELS, toNumber, toText, type SampleField, type SampleFormValues } from './sample-form-values';

type NumProps = { name: SampleField; unit?: string; hint?: string; optional?: boolean; className?: string };

export function NumInput({ name, unit, hint, optional = true, className = '' }: NumProps) {
  const { register, formState } = useFormContext<SampleFormValues>();
  return (
    <TextField
      label={`${FIELD_LABELS[name]}${unit ? `, ${unit}` : ''}${optional ? '' : ' *'}`}
      inputMode="decimal"
      autoComplete="off"
      className={`num ${className}`}
      data-testid={`sample-${name}`}
      hint={hint}
      error={formState.errors[name]?.message}
      {...register(name, { setValueAs: toNumber })}
    />
  );
}

export function WhereWhenInputs() {
  const { register, formState } = useFormContext<SampleFormValues>();
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
      <TextField
        label={FIELD_LABELS.label}
        className="col-span-2"
        placeholder="e.g. low corner, 0–20 cm"
        data-testid="sample-label"
        error={formState.errors.label?.message}
        {...register('label', { setValueAs: toText })}
      />
      <TextField
        label={FIELD_LABELS.sampledOn}
        type="date"
        className="num col-span-2 sm:col-span-1"
        data-testid="sample-sampledOn"
        error={formState.errors.sampledOn?.message}
        {...register('sampledOn', { setValueAs: toText })}
      />
      <div className="col-span-2 grid grid-cols-2 gap-3 sm:col-span-4 sm:grid-cols-4">
        <NumInput name="depthTopCm" unit="cm" />
        <NumInput name="depthBottomCm" unit="cm" />
      </div>
    </div>
  );
}

export function DrainageInputs() {
  return (
    <div className="grid grid-cols-2 gap-3">
      <NumInput name="depthToGrayCm" unit="cm" hint="gray (chroma 2 or less) or mottled; leave empty if none was seen" />
      <NumInput name="describedToCm" unit="cm" hint="how deep you dug or augered and looked" />
    </div>
  );
}

export function ChemistryInputs({ full = true }: { full?: boolean }) {
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
      <NumInput name="organicMatterPct" unit="%" />
      <NumInput name="ph" unit="no unit" />
      <NumInput name="bufferPh" unit="no unit" />
      <BufferMethodInput />
      {full ? (
        <>
          <NumInput name="bulkDensity" unit="Mg/m³" />
          <NumInput name="cecCmolPerKg" unit="cmolc/kg" />
          <NumInput name="espPct" unit="%" />
        </>
      ) : null}
    </div>
  );
}

/** The lab's buffer: lime is worked out differently for each, so a buffer pH needs its method. */
function BufferMethodInput() {
  const { register, formState } = useFormContext<SampleFormValues>();
  return (
    <SelectField
      label={FIELD_LABELS.bufferMethod}
      data-testid="sample-bufferMethod"
      hint="as printed on the lab report"
      error={formState.errors.bufferMethod?.message}
      {...register('bufferMethod', { setValueAs: (v: unknown) => (v === '' || v == null ? undefined : v) })}
    >
      <option value="">not given</option>
      {Object.entries(BUFFER_METHOD_NAMES).map(([value, name]) => (
        <option key={value} value={value}>
          {name}
        </option>
      ))}
    </SelectField>
  );
}
