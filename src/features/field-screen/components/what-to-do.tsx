// What to do about this field, on the Risk tab: the cheapest way under T with its amounts and
// cost, the what-if, every option best first, and the treatments the field cannot take yet with
// what each needs. For farmers and advisors.
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { CAUTION_PLANNING_AID } from '../../../../shared/erosion/estimate';
import { TREATMENT_TITLES } from '../../../../shared/erosion';
import type { TreatmentKey, TreatmentOption, Unavailable } from '../../../../shared/erosion/treatments/types';
import type { Units } from '../../../../shared/schemas/auth';
import { Notice } from '../../../components/ui/notice';
import { formatFigure } from '../../../lib/format-figure';
import { lossFigure, tonnesFigure } from '../../../lib/loss-units';
import { formatMoney } from '../../../lib/money';
import { paths } from '../../../lib/paths';
import { useFieldTreatments } from '../api/get-field-treatments';
import type { FieldTab } from './field-tabs';
import { Cautions, Quantities } from './treatment-details';
import { TreatmentOptions } from './treatment-options';
import { WhatIfPanel } from './what-if-panel';
import { OptionExtraSlot } from './option-extra';

const NEEDS_TAB: Record<NonNullable<Unavailable['needs']>, FieldTab> = {
  'soil-check': 'soil',
  'buffer-method': 'soil',
  texture: 'soil',
  terrain: 'ground',
};

function CheapestUnderT({ o, units, aboveT, fieldId, season }: { o: TreatmentOption | undefined; units: Units; aboveT: boolean; fieldId: number; season: string }) {
  if (!aboveT)
    return (
      <Notice testId="already-under-t" title="Already under T">
        The field loses soil no faster than it is tolerated. The options below still show what each would save.
      </Notice>
    );
  if (!o)
    return (
      <Notice tone="caution" testId="no-way-under-t" title="No option brings A under T on its own">
        The options below are ranked by the soil they save for the money; the what-if lets you try more together.
      </Notice>
    );
  return (
    <section aria-labelledby="cheapest-heading" className="flex flex-col gap-2 rounded-md border border-clay bg-clay-light/40 p-3 text-sm" data-testid="cheapest-under-t">
      <h4 id="cheapest-heading" className="text-xs font-semibold uppercase tracking-wide text-clay-dark">
        The cheapest way under T
      </h4>
      <p className="font-serif text-xl font-semibold" data-testid="cheapest-title">
        {o.title}
      </p>
      <p className="num">
        A {lossFigure(o.soilLossTPerHaYr, units).main}, A/T {formatFigure(o.aOverT)}; saves {tonnesFigure(o.tonnesSavedPerYr, units).main}, for{' '}
        <span className="font-semibold" data-testid="cheapest-cost">
          {formatMoney(o.cost.total, o.cost.currency)}
        </span>
        .
      </p>
      <Quantities quantities={o.quantities} units={units} />
      <Cautions cautions={o.cautions} />
      <OptionExtraSlot fieldId={fieldId} season={season} option={o} />
    </section>
  );
}

function NotYet({ unavailable, onOpenTab }: { unavailable: Unavailable[]; onOpenTab?: (tab: FieldTab) => void }) {
  if (!unavailable.length) return null;
  return (
    <section aria-labelledby="not-yet-heading" className="flex flex-col gap-1" data-testid="treatments-unavailable">
      <h4 id="not-yet-heading" className="font-serif text-lg font-semibold">
        Not offered on this field
      </h4>
      <ul className="flex flex-col gap-1 text-sm">
        {unavailable.map((u) => (
          <li key={u.key} data-testid={`unavailable-${u.key}`}>
            <span className="font-semibold">{TREATMENT_TITLES[u.key]}</span>: {u.reason}
            {u.needs && onOpenTab ? (
              <>
                {' '}
                <button type="button" className="font-semibold text-clay-dark underline underline-offset-2" onClick={() => onOpenTab(NEEDS_TAB[u.needs!])}>
                  Open the {NEEDS_TAB[u.needs] === 'soil' ? 'Soil' : 'Ground'} tab
                </button>
              </>
            ) : null}
          </li>
        ))}
      </ul>
    </section>
  );
}

type Props = { farmId: number; fieldId: number; season: string; units: Units; onOpenTab?: (tab: FieldTab) => void };

export function WhatToDo({ farmId, fieldId, season, units, onOpenTab }: Props) {
  const q = useFieldTreatments(fieldId, season);
  const [chosen, setChosen] = useState<TreatmentKey[]>([]);

  let body;
  if (q.isPending) body = <p className="text-sm text-ink-soft">Working out the treatments…</p>;
  else if (q.isError)
    body = (
      <Notice tone="error" title="The treatments could not be worked out">
        {q.error.message}
      </Notice>
    );
  else if (!q.data.ok)
    body = (
      <Notice tone="caution" title="No treatments until the field is assessed" testId="treatments-not-ready">
        <p>{q.data.reason}</p>
        {q.data.gaps.length ? (
          <ul className="mt-1 list-inside list-disc">
            {q.data.gaps.map((g) => (
              <li key={g.key}>{g.message}</li>
            ))}
          </ul>
        ) : null}
      </Notice>
    );
  else {
    const t = q.data;
    const tryKeys = (keys: TreatmentKey[]) => {
      setChosen(keys);
      document.getElementById('whatif-heading')?.scrollIntoView({ behavior: 'smooth', block: 'start' });
    };
    body = (
      <>
        <CheapestUnderT o={t.options.find((o) => o.cheapestUnderT)} units={units} aboveT={t.current.aOverT > 1} fieldId={fieldId} season={season} />
        <WhatIfPanel site={t.site} current={t.current} titles={TREATMENT_TITLES} unavailable={t.unavailable} chosen={chosen} onChange={setChosen} units={units} />
        <TreatmentOptions options={t.options} units={units} onTry={tryKeys} fieldId={fieldId} season={season} />
        <NotYet unavailable={t.unavailable} onOpenTab={onOpenTab} />
        <p className="text-xs text-ink-soft">
          {CAUTION_PLANNING_AID} Costs use the farm’s price list;{' '}
          <Link to={paths.budget.getHref(farmId, season)} className="font-semibold text-clay-dark underline underline-offset-2">
            change the prices or plan a budget
          </Link>
          .
        </p>
      </>
    );
  }

  return (
    <section aria-labelledby="what-to-do-heading" className="flex flex-col gap-4 border-t-2 border-clay pt-4" data-testid="what-to-do">
      <h3 id="what-to-do-heading" className="text-xl font-semibold">
        What to do about it
      </h3>
      {body}
    </section>
  );
}
