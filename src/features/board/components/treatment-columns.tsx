// The board's treatments view: for each field its best option (the cheapest that brings A under
// T, else the one saving the most soil for the money), what it costs at the farm's prices, the A
// it would give and the soil it saves.
import { createColumnHelper } from '@tanstack/react-table';
import type { Units } from '../../../../shared/schemas/auth';
import type { FarmTreatmentsAnswer } from '../../../../shared/schemas/treatments';
import { formatFigure } from '../../../lib/format-figure';
import { lossFigure, tonnesFigure } from '../../../lib/loss-units';
import { formatMoney } from '../../../lib/money';
import type { RankedRow } from './board-table';

export type FieldTreatmentsRow = FarmTreatmentsAnswer['fields'][number];
export type BoardTreatments = { currency: string; byField: Map<number, FieldTreatmentsRow> };

/** The columns the treatments view hides to make room. */
export const HIDDEN_IN_TREATMENTS_VIEW = ['areaHa', 'tolerance', 'tonnes', 'runoff', 'problemClay', 'gaps'] as const;

const col = createColumnHelper<RankedRow>();
const dash = <span className="text-ink-faint">—</span>;

function BestCell({ row }: { row: FieldTreatmentsRow | undefined }) {
  if (!row) return dash;
  const best = row.best;
  if (!best) {
    const reason = row.answer.ok ? 'no option lowers the loss' : row.answer.reason;
    return <span className="text-xs text-ink-soft">{reason}</span>;
  }
  return (
    <span className="flex min-w-44 flex-col" data-testid="board-best-treatment">
      <span className="font-medium">{best.title}</span>
      <span className="text-xs text-ink-soft">{best.reachesT ? (best.cheapestUnderT ? 'cheapest way under T' : 'brings A under T') : 'best soil saved for the money; still above T'}</span>
    </span>
  );
}

export function treatmentColumns(treatments: BoardTreatments, lossUnits: Units) {
  const best = (r: RankedRow) => treatments.byField.get(r.fieldId)?.best ?? null;
  return [
    col.accessor((r) => best(r)?.title ?? undefined, {
      id: 'best',
      header: 'Best treatment',
      sortUndefined: 'last',
      cell: (c) => <BestCell row={treatments.byField.get(c.row.original.fieldId)} />,
    }),
    col.accessor((r) => best(r)?.cost.total ?? undefined, {
      id: 'cost',
      header: `Cost (${treatments.currency})`,
      sortUndefined: 'last',
      cell: (c) => {
        const b = best(c.row.original);
        return b ? (
          <span className="num block whitespace-nowrap text-right font-semibold" data-testid="board-best-cost">
            {formatMoney(b.cost.total, b.cost.currency)}
          </span>
        ) : (
          dash
        );
      },
    }),
    col.accessor((r) => best(r)?.soilLossTPerHaYr ?? undefined, {
      id: 'aAfter',
      header: lossUnits === 'ac' ? 'A after (US t/ac/yr)' : 'A after (t/ha/yr)',
      sortUndefined: 'last',
      cell: (c) => {
        const b = best(c.row.original);
        if (!b) return dash;
        const f = lossFigure(b.soilLossTPerHaYr, lossUnits);
        return (
          <span className="num block whitespace-nowrap text-right" title={`${f.alt}; A/T ${formatFigure(b.aOverT)}`} data-testid="board-a-after">
            {f.main}
            <span className="block text-xs text-ink-soft">A/T {formatFigure(b.aOverT)}</span>
          </span>
        );
      },
    }),
    col.accessor((r) => best(r)?.tonnesSavedPerYr ?? undefined, {
      id: 'saved',
      header: lossUnits === 'ac' ? 'Soil saved (US tons/yr)' : 'Soil saved (t/yr)',
      sortUndefined: 'last',
      cell: (c) => {
        const b = best(c.row.original);
        if (!b) return dash;
        const f = tonnesFigure(b.tonnesSavedPerYr, lossUnits);
        return (
          <span className="num block whitespace-nowrap text-right" title={f.alt}>
            {f.main}
          </span>
        );
      },
    }),
  ];
}
