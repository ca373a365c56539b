// The parts every treatment shows: the amounts to order or build (in the user's units, with
// where each figure came from), the cost lines at the farm's prices, what it does that RUSLE's A
// does not show, and its cautions (earthwork, drainage, spreading lime or gypsum, digging).
import { CAUTION_PLANNING_AID } from '../../../../shared/erosion/estimate';
import type { CostLine, TreatmentQuantity } from '../../../../shared/erosion/treatments/types';
import type { Units } from '../../../../shared/schemas/auth';
import { originWords } from '../../../../shared/schemas/provenance';
import { PRICE_ITEMS } from '../../../../shared/schemas/treatments';
import { formatFigure } from '../../../lib/format-figure';
import { formatMoney } from '../../../lib/money';
import { amountWords } from '../../../lib/amount-words';

export function Quantities({ quantities, units }: { quantities: TreatmentQuantity[]; units: Units }) {
  if (!quantities.length) return null;
  return (
    <ul className="flex flex-col gap-0.5" data-testid="treatment-quantities">
      {quantities.map((q, i) => (
        <li key={`${q.item}-${i}`}>
          <span className="num font-semibold">{amountWords(q.amount, q.unit, units)}</span> {q.item}
          {q.note || q.origin ? (
            <span className="text-ink-soft">
              {' '}
              ({[q.note, q.origin ? originWords(q.origin) : null].filter(Boolean).join('; ')})
            </span>
          ) : null}
        </li>
      ))}
    </ul>
  );
}

export function CostLines({ lines, currency }: { lines: CostLine[]; currency: string }) {
  if (!lines.length) return <p className="text-ink-soft">No cost at the farm’s prices.</p>;
  return (
    <ul className="flex flex-col gap-0.5" data-testid="treatment-cost-lines">
      {lines.map((l) => (
        <li key={`${l.priceKey}-${l.quantity}`} className="num">
          {PRICE_ITEMS[l.priceKey].label}: {formatFigure(l.quantity)} {l.unit} × {formatMoney(l.unitPrice, currency)} ={' '}
          <span className="font-semibold">{formatMoney(l.total, currency)}</span>
        </li>
      ))}
    </ul>
  );
}

/** What the treatment does that A does not show (a waterway stops gullies, a strip traps sediment …). */
export function Effects({ effects }: { effects: string[] }) {
  if (!effects.length) return null;
  return (
    <ul className="list-inside list-disc" data-testid="treatment-effects">
      {effects.map((e) => (
        <li key={e}>{e}</li>
      ))}
    </ul>
  );
}

/** The treatment's own cautions; the planning-aid caution is said once for the whole section. */
export function Cautions({ cautions }: { cautions: string[] }) {
  const own = cautions.filter((c) => c !== CAUTION_PLANNING_AID);
  if (!own.length) return null;
  return (
    <div className="rounded border border-caution bg-caution-light px-2 py-1 text-caution" data-testid="treatment-cautions">
      <p className="font-semibold">Caution</p>
      <ul className="list-inside list-disc">
        {own.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </div>
  );
}
