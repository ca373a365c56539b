// Every input of the assessment in words, with where it came from: typed by someone, derived
// (from soil samples, the elevation model, the climate), a default, or still missing.
import type { FieldAssessment, InputOrigin } from '../../../../shared/schemas/assessment';

const ORIGIN: Record<InputOrigin, { text: string; className: string }> = {
  typed: { text: 'typed', className: 'border-clay-dark bg-clay-light text-clay-dark' },
  derived: { text: 'derived', className: 'border-ink-faint bg-paper-deep text-ink' },
  default: { text: 'default', className: 'border-caution bg-caution-light text-caution' },
  missing: { text: 'missing', className: 'border-alert bg-alert-light text-alert' },
};

export function AssessmentInputs({ inputs }: { inputs: FieldAssessment['inputs'] }) {
  return (
    <section aria-labelledby="inputs-heading" data-testid="assessment-inputs" className="flex flex-col gap-1">
      <h3 id="inputs-heading" className="font-serif text-lg font-semibold">
        What went in
      </h3>
      <ul className="flex flex-col divide-y divide-paper-edge rounded-md border border-paper-edge bg-white/40 text-sm">
        {inputs.map((i) => (
          <li key={i.key} className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5 px-3 py-1.5" data-testid={`input-${i.key}`}>
            <span className="w-48 shrink-0 text-ink-soft">{i.label}</span>
            <span className="num flex-1 font-medium">{i.value}</span>
            <span className={`rounded border px-1.5 text-xs font-semibold ${ORIGIN[i.origin].className}`} data-testid="input-origin">
              {ORIGIN[i.origin].text}
            </span>
            {i.note ? <span className="w-full text-xs text-ink-soft">{i.note}</span> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
