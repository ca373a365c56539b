// The frame every form control shares: a label above, the error (or a hint) below, and the ids
// that tie them together for screen readers.
import { useId, type ReactNode } from 'react';

export type ControlIds = { controlId: string; describedBy: string | undefined; invalid: true | undefined };

export function LabelledControl({
  label,
  error,
  hint,
  id,
  className = '',
  children,
}: {
  label: string;
  error?: string;
  hint?: ReactNode;
  id?: string;
  className?: string;
  children: (ids: ControlIds) => ReactNode;
}) {
  const autoId = useId();
  const controlId = id ?? autoId;
  const messageId = `${controlId}-message`;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={controlId} className="text-sm font-medium text-ink">
        {label}
      </label>
      {children({ controlId, describedBy: error || hint ? messageId : undefined, invalid: error ? true : undefined })}
      {error ? (
        <p id={messageId} role="alert" className="text-sm text-alert">
          {error}
        </p>
      ) : hint ? (
        <p id={messageId} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
