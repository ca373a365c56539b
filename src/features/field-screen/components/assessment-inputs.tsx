// Every input of the assessment in words, with where it came from: typed by someone, worked
// out (from soil samples, the elevation model, a rainfall record), a published table, a rule of
// thumb, or an example value to replace.
import type { FieldAssessment } from '../../../../shared/schemas/assessment';
import { originWords, type Origin, type OriginKind } from '../../../../shared/schemas/provenance';
import type { Units } from '../../../../shared/schemas/auth';
import { formatInputQuantity } from '../../../../shared/format/input-quantity';

const KIND: Record<OriginKind, { text: string; className: string }> = {
  typed: { text: 'typed', className: 'border-clay-dark bg-clay-light text-clay-dark' },
  derived: { text: 'worked out', className: 'border-ink-faint bg-paper-deep text-ink' },
  'published-table': { text: 'published table', className: 'border-ink-faint bg-paper-deep text-ink' },
  'rule-of-thumb': { text: 'rule of thumb', className: 'border-caution bg-caution-light text-caution' },
  default: { text: 'example value', className: 'border-caution bg-caution-light text-caution' },
};

/** The words under an input: where it came from, how, and any note. */
function whence(origin: Origin, note: string | undefined): string {
  const words = origin.kind === 'typed' || origin.source || origin.kind === 'default' ? originWords(origin) : null;
  return [words, origin.detail, note].filter(Boolean).join('; ');
}

export function AssessmentInputs({ inputs, units }: { inputs: FieldAssessment['inputs']; units: Units }) {
  return (
    <section aria-labelledby="inputs-heading" data-testid="assessment-inputs" className="flex flex-col gap-1">
      <h3 id="inputs-heading" className="font-serif text-lg font-semibold">
        What went in
      </h3>
      <ul className="flex flex-col divide-y divide-paper-edge rounded-md border border-paper-edge bg-white/40 text-sm">
        {inputs.map((i) => {
          const words = whence(i.origin, i.note);
          return (
            <li key={i.key} className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5 px-3 py-1.5" data-testid={`input-${i.key}`}>
              <span className="w-full shrink-0 text-ink-soft sm:w-48">{i.label}</span>
              <span className="num min-w-0 flex-1 font-medium">{i.quantity ? formatInputQuantity(i.quantity, units) : i.value}</span>
              <span className={`whitespace-nowrap rounded border px-1.5 text-xs font-semibold ${KIND[i.origin.kind].className}`} data-testid="input-origin">
                {KIND[i.origin.kind].text}
              </span>
              {words ? <span className="w-full text-xs text-ink-soft" data-testid="input-source">{words}</span> : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
