// Small form pieces of the estimate form, bound to its react-hook-form context: a number box
// (empty = not given) with its unit in the label and the schema's error beside it, and a
// titled group of inputs.
import type { ReactNode } from 'react';
import { get, useFormContext, type FieldPath } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';
import { plainError, toNumber, type EstimateFormValues } from './estimate-form-values';

type Name = FieldPath<EstimateFormValues>;

export function useFieldError(name: Name): string | undefined {
  const { formState } = useFormContext<EstimateFormValues>();
  return plainError((get(formState.errors, name) as { message?: string } | undefined)?.message);
}

type NumFieldProps = {
  name: Name;
  label: string;
  unit?: string;
  hint?: string;
  optional?: boolean;
  testId?: string;
  className?: string;
};

export function NumField({ name, label, unit, hint, optional, testId, className }: NumFieldProps) {
  const { register } = useFormContext<EstimateFormValues>();
  const error = useFieldError(name);
  return (
    <TextField
      label={`${label}${unit ? ` (${unit})` : ''}${optional ? ', optional' : ''}`}
      inputMode="decimal"
      autoComplete="off"
      className={`num ${className ?? ''}`}
      data-testid={testId}
      hint={hint}
      error={error}
      {...register(name, { setValueAs: toNumber })}
    />
  );
}

export function FormGroup({ title, help, children, testId }: { title: string; help?: ReactNode; children: ReactNode; testId?: string }) {
  return (
    <fieldset data-testid={testId} className="flex min-w-0 flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3">
      <legend className="px-1 font-serif text-lg font-semibold">{title}</legend>
      {help ? <div className="-mt-1 text-sm text-ink-soft">{help}</div> : null}
      {children}
    </fieldset>
  );
}
