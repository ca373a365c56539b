// Every factor of the estimate: its value and unit (SI, or US where the units differ), where
// it came from and how it was worked out; figures to check against the handbook and rules of
// thumb are marked in plain words, and a figure typed for the field in place of the worked-out
// one says so with its note. A screen may add a control per factor (the field's override).
// On a phone each row stacks into a small card (name, value and unit, then source and method).
import type { ReactNode } from 'react';
import type { EstimateSuccess, Provenance } from '../../../../shared/schemas/estimate';
import { formatFigure } from '../../../lib/format-figure';

const FACTORS: { key: keyof EstimateSuccess['factors']; name: string }[] = [
  { key: 'r', name: 'R, rainfall erosivity' },
  { key: 'k', name: 'K, soil erodibility' },
  { key: 'l', name: 'L, slope length' },
  { key: 's', name: 'S, slope steepness' },
  { key: 'ls', name: 'LS, used in A' },
  { key: 'c', name: 'C, cover and management' },
  { key: 'p', name: 'P, support practice' },
  { key: 't', name: 'T, soil-loss tolerance' },
];

const FLAG_BADGES: Record<NonNullable<Provenance['flag']>, { text: string; title: string }> = {
  memory: { text: 'check against the handbook', title: 'Taken from the named handbook without re-reading it: check the figure there, or use your local one, before relying on it.' },
  practice: { text: 'rule of thumb', title: 'Common practice with no single published source.' },
};

export function FlagBadge({ flag }: { flag: Provenance['flag'] }) {
  if (!flag) return null;
  const b = FLAG_BADGES[flag];
  return (
    <span title={b.title} data-testid={`flag-${flag}`} className="ml-1 inline-block whitespace-nowrap rounded border border-ink-faint bg-paper-deep px-1.5 text-xs font-medium text-ink-soft">
      {b.text}
    </span>
  );
}

type FactorKey = keyof EstimateSuccess['factors'];
type Props = {
  factors: EstimateSuccess['factors'];
  units: 'si' | 'us';
  extra?: { name: string; p: Provenance }[];
  /** A control beside a factor (e.g. to override it for a field); rows without one get none. */
  control?: (key: FactorKey) => ReactNode;
};

export function FactorTable({ factors, units, extra, control }: Props) {
  const rows: { name: string; p: Provenance; key?: FactorKey }[] = [...FACTORS.map((f) => ({ name: f.name, p: factors[f.key], key: f.key })), ...(extra ?? [])];
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm max-sm:block" data-testid="factor-table">
        <caption className="mb-1 text-left font-serif text-lg font-semibold max-sm:block">Where the figures come from</caption>
        <thead className="max-sm:hidden">
          <tr className="border-b border-ink-faint text-ink-soft">
            <th scope="col" className="py-1 pr-2 font-medium">Factor</th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">Value</th>
            <th scope="col" className="py-1 pr-2 font-medium">Unit</th>
            <th scope="col" className="py-1 pr-2 font-medium">Source</th>
            <th scope="col" className="py-1 font-medium">Method</th>
            {control ? (
              <th scope="col" className="py-1 pl-2 font-medium">
                <span className="sr-only">Change</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody className="max-sm:block">
          {rows.map(({ name, p, key }) => {
            const shown = units === 'us' && p.us ? p.us : { value: p.value, unit: p.unit };
            return (
              <tr key={name} className="border-b border-paper-edge align-top max-sm:flex max-sm:flex-wrap max-sm:items-baseline max-sm:gap-x-2 max-sm:py-1.5">
                <th scope="row" className="py-1.5 pr-2 font-medium max-sm:w-full max-sm:py-0">{name}</th>
                <td className="num py-1.5 pr-2 text-right whitespace-nowrap max-sm:py-0 max-sm:pr-0">{formatFigure(shown.value)}</td>
                <td className="py-1.5 pr-2 text-xs text-ink-soft max-sm:py-0">{shown.unit || 'no unit'}</td>
                <td className="py-1.5 pr-2 max-sm:w-full max-sm:py-0">
                  {p.override ? (
                    <span data-testid={`override-${key}`} className="font-medium text-clay-dark">
                      override: {p.override.note}
                      {p.override.by ? `, by ${p.override.by}` : ''}
                    </span>
                  ) : (
                    <>
                      {p.source}
                      <FlagBadge flag={p.flag} />
                    </>
                  )}
                </td>
                <td className="py-1.5 text-xs text-ink-soft max-sm:w-full max-sm:py-0">{p.override ? 'typed for this field in place of the worked-out figure' : p.method}</td>
                {control ? <td className="py-1.5 pl-2 align-top max-sm:w-full max-sm:pl-0">{key ? control(key) : null}</td> : null}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
