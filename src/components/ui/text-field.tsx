// A labelled text input with its error right under it.
import { forwardRef, type InputHTMLAttributes, type ReactNode } from 'react';
import { LabelledControl } from './labelled-control';

export type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: ReactNode };

export const TextField = forwardRef<HTMLInputElement, TextFieldProps>(function TextField({ label, error, hint, id, className = '', ...rest }, ref) {
  return (
    <LabelledControl label={label} error={error} hint={hint} id={id} className={className}>
      {({ controlId, describedBy, invalid }) => (
        <input
          ref={ref}
          id={controlId}
          aria-invalid={invalid}
          aria-describedby={describedBy}
          className={`rounded-md border bg-white/70 px-3 py-2 text-base text-ink placeholder:text-ink-faint ${error ? 'border-alert' : 'border-ink-faint'}`}
          {...rest}
        />
      )}
    </LabelledControl>
  );
});
