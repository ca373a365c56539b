// A short row of mutually exclusive choices (radio buttons drawn as joined pills), with a
// visible group label. Works with react-hook-form's register() via `inputProps`.
import { useId, type InputHTMLAttributes } from 'react';

type Choice<V extends string> = { value: V; label: string };

type Props<V extends string> = {
  label: string;
  choices: readonly Choice<V>[];
  /** register('name') or any props every radio input shares. */
  inputProps: InputHTMLAttributes<HTMLInputElement> & { name: string };
  testId?: string;
  className?: string;
};

export function ChoiceGroup<V extends string>({ label, choices, inputProps, testId, className = '' }: Props<V>) {
  const labelId = useId();
  return (
    <div role="radiogroup" aria-labelledby={labelId} data-testid={testId} className={`flex flex-col gap-1 ${className}`}>
      <span id={labelId} className="text-sm font-medium text-ink">
        {label}
      </span>
      <div className="flex flex-wrap gap-1">
        {choices.map((c) => (
          <label key={c.value} className="cursor-pointer">
            <input type="radio" value={c.value} className="peer sr-only" {...inputProps} />
            <span className="inline-block rounded-md border border-ink-faint bg-paper px-2.5 py-1 text-sm font-medium text-ink hover:bg-paper-deep peer-checked:border-clay-dark peer-checked:bg-clay peer-checked:text-paper peer-checked:hover:bg-clay-dark peer-focus-visible:outline peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-ink">
              {c.label}
            </span>
          </label>
        ))}
      </div>
    </div>
  );
}
