// The field's treatment options, best first: what each leaves of A, against T, the soil it saves,
// what it costs and takes, the soil saved for the money, and whether it reaches T. A table on a
// wide screen; on a phone each option stacks its figures under its name.
import { useState, type ReactNode } from 'react';
import type { TreatmentKey, TreatmentOption } from '../../../../shared/erosion/treatments/types';
import type { Units } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { formatFigure } from '../../../lib/format-figure';
import { lossFigure, tonnesFigure } from '../../../lib/loss-units';
import { formatMoney } from '../../../lib/money';
import { Cautions, CostLines, Effects, Quantities } from './treatment-details';
import { OptionExtraSlot } from './option-extra';

const FIRST_SHOWN = 6;
const PER_MONEY = 1000;

/** "2.4 t/yr per $1,000". */
function perMoneyWords(o: TreatmentOption, units: Units): string {
  if (o.tonnesSavedPerMoney === null) return o.tonnesSavedPerYr > 0 ? 'at no cost' : '—';
  return `${tonnesFigure(o.tonnesSavedPerMoney * PER_MONEY, units).main} per ${formatMoney(PER_MONEY, o.cost.currency)}`;
}

const GRID = 'md:grid md:grid-cols-[minmax(0,2.2fr)_repeat(5,minmax(0,1fr))] md:gap-x-3';

function Cell({ label, children, testId }: { label: string; children: ReactNode; testId?: string }) {
  return (
    <div className="flex justify-between gap-3 md:block md:text-right" data-testid={testId}>
      <span className="text-ink-soft md:sr-only">{label}</span>
      <span className="num">{children}</span>
    </div>
  );
}

export function OptionRow({ o, units, onTry, fieldId, season }: { o: TreatmentOption; units: Units; onTry: (keys: TreatmentKey[]) => void; fieldId: number; season: string }) {
  const saved = tonnesFigure(o.tonnesSavedPerYr, units);
  return (
    <li className="flex flex-col gap-2 border-b border-paper-edge py-2 last:border-b-0" data-testid="treatment-option" data-option-id={o.id}>
      <div className={`flex flex-col gap-1 text-sm ${GRID}`}>
        <div className="flex flex-col">
          <span className="font-semibold" data-testid="treatment-option-title">
            {o.title}
          </span>
          {o.cheapestUnderT ? <span className="text-xs font-semibold text-clay-dark">cheapest way under T</span> : null}
        </div>
        <Cell label="A after">{lossFigure(o.soilLossTPerHaYr, units).main}</Cell>
        <Cell label="A/T">{formatFigure(o.aOverT)}</Cell>
        <Cell label="Soil saved">{o.tonnesSavedPerYr > 0 ? saved.main : 'none'}</Cell>
        <Cell label="Cost" testId="treatment-option-cost">
          {formatMoney(o.cost.total, o.cost.currency)}
        </Cell>
        <Cell label="Reaches T">{o.reachesT ? <span className="font-semibold">yes</span> : <span className="text-ink-soft">not yet</span>}</Cell>
      </div>
      <p className="text-xs text-ink-soft">Soil saved for the money: {perMoneyWords(o, units)}.</p>
      <Cautions cautions={o.cautions} />
      <details className="text-sm">
        <summary className="cursor-pointer font-medium text-clay-dark">Amounts, cost lines and what it does</summary>
        <div className="mt-1 grid gap-2 md:grid-cols-2">
          <div className="flex flex-col gap-1">
            <Quantities quantities={o.quantities} units={units} />
            <CostLines lines={o.cost.lines} currency={o.cost.currency} />
          </div>
          <Effects effects={o.effects} />
        </div>
      </details>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1">
        <OptionExtraSlot fieldId={fieldId} season={season} option={o} />
        <Button variant="quiet" size="sm" className="px-0" onClick={() => onTry(o.treatments)} data-testid="treatment-option-try">
          Try it in the what-if above
        </Button>
      </div>
    </li>
  );
}

type OptionsProps = { options: TreatmentOption[]; units: Units; onTry: (keys: TreatmentKey[]) => void; fieldId: number; season: string };

export function TreatmentOptions({ options, units, onTry, fieldId, season }: OptionsProps) {
  const [all, setAll] = useState(false);
  const shown = all ? options : options.slice(0, FIRST_SHOWN);
  const unit = units === 'ac' ? 'US t/ac/yr' : 't/ha/yr';
  return (
    <section aria-labelledby="options-heading" className="flex flex-col gap-1" data-testid="treatment-options">
      <h4 id="options-heading" className="font-serif text-lg font-semibold">
        Every option, best first
      </h4>
      <p className="text-sm text-ink-soft">
        Those bringing A under T come first, cheapest first; then those saving the most soil for the money.
      </p>
      <div className={`hidden border-b border-paper-edge pb-1 text-xs font-medium text-ink-soft ${GRID}`} aria-hidden="true">
        <span>Treatment</span>
        <span className="text-right">A after ({unit})</span>
        <span className="text-right">A/T</span>
        <span className="text-right">Soil saved ({units === 'ac' ? 'US tons/yr' : 't/yr'})</span>
        <span className="text-right">Cost</span>
        <span className="text-right">Reaches T</span>
      </div>
      <ul>
        {shown.map((o) => (
          <OptionRow key={o.id} o={o} units={units} onTry={onTry} fieldId={fieldId} season={season} />
        ))}
      </ul>
      {options.length > FIRST_SHOWN ? (
        <Button variant="secondary" size="sm" className="self-start" onClick={() => setAll(!all)} data-testid="treatment-options-more">
          {all ? `Show the first ${FIRST_SHOWN}` : `Show all ${options.length} options`}
        </Button>
      ) : null}
    </section>
  );
}
