// A labelled drop-down with its error or hint right under it (same look as TextField).
import { forwardRef, type ReactNode, type SelectHTMLAttributes } from 'react';
import { LabelledControl } from './labelled-control';

export type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  error?: string;
  hint?: ReactNode;
};

export const SelectField = forwardRef<HTMLSelectElement, SelectFieldProps>(function SelectField(
  { label, error, hint, id, className = '', children, ...rest },
  ref,
) {
  return (
    <LabelledControl label={label} error={error} hint={hint} id={id} className={className}>
      {({ controlId, describedBy, invalid }) => (
        <select
          ref={ref}
          id={controlId}
          aria-invalid={invalid}
          aria-describedby={describedBy}
          className={`rounded-md border bg-white/70 px-3 py-2 text-base text-ink ${error ? 'border-alert' : 'border-ink-faint'}`}
          {...rest}
        >
          {children}
        </select>
      )}
    </LabelledControl>
  );
});
