// The farm's lime and gypsum products inside the price form: what the label says (CCE and the
// sieve analysis), the pH to lime to, and the gypsum's purity and the extra allowed because
// exchange in the field is incomplete. Every lime and gypsum amount is worked out with them.
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';
import type { AmendmentChoices } from '../../../../shared/schemas/treatments';

type Key = keyof AmendmentChoices;
type Values = { amendments: Record<Key, number | null> };

const INPUTS: { key: Key; label: string; hint: string }[] = [
  { key: 'limeTargetPh', label: 'Lime to pH', hint: "Leave empty for the usual target of the lab's buffer method." },
  { key: 'limeCcePct', label: 'Lime CCE, %', hint: 'Calcium carbonate equivalent, from the label.' },
  { key: 'limePassing20MeshPct', label: 'Lime passing a 20-mesh sieve, %', hint: 'From the label’s sieve analysis.' },
  { key: 'limePassing60MeshPct', label: 'Lime passing a 60-mesh sieve, %', hint: 'Finer particles act sooner.' },
  { key: 'limePassing100MeshPct', label: 'Lime passing a 100-mesh sieve, %', hint: 'The finest fraction counts in full.' },
  { key: 'gypsumPurityPct', label: 'Gypsum in the product, %', hint: 'Purity from the label.' },
  { key: 'gypsumExchangeEfficiency', label: 'Extra gypsum for sodic soil, ×', hint: 'Exchange in the field is incomplete: 1.1 to 1.3 is used in practice.' },
];

export function AmendmentInputs<T extends Values>({ register, errors, examples }: { register: UseFormRegister<T>; errors: FieldErrors<T>; examples: boolean }) {
  const reg = register as unknown as UseFormRegister<Values>;
  const errs = (errors as FieldErrors<Values>).amendments;
  return (
    <fieldset className="flex flex-col gap-2 border-t border-paper-edge pt-3" data-testid="amendment-inputs">
      <legend className="text-base font-semibold">Lime and gypsum products</legend>
      {examples ? (
        <p className="text-sm text-caution" data-testid="amendment-examples">
          These are example products — replace them with what your supplier’s label says.
        </p>
      ) : null}
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
        {INPUTS.map(({ key, label, hint }) => (
          <TextField
            key={key}
            label={label}
            inputMode="decimal"
            className="num"
            hint={hint}
            error={plainMessage(errs?.[key]?.message)}
            data-testid={`amendment-${key}`}
            {...reg(`amendments.${key}`, { setValueAs: toNumberOrNull })}
          />
        ))}
      </div>
      <p className="text-xs text-ink-soft">
        Wear dust protection when spreading lime or gypsum and follow the product label.
      </p>
    </fieldset>
  );
}
