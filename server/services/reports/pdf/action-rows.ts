// Plan actions as table rows: what, how much, what it costs, when, its status and who does it.
// A row of careful work names it, so its page carries the cautions.
import { TREATMENT_KEYS, type TreatmentKey } from '../../../../shared/erosion/treatments/types';
import { actionWhen } from '../../../../shared/exports/action-words';
import { amountWords } from '../../../../shared/format/amount-words';
import type { Units } from '../../../../shared/schemas/auth';
import { formatMoney } from '../../../../shared/format/money';
import type { PlanAction } from '../../../../shared/schemas/plans';
import type { Column, Row } from './table';

export const isTreatmentKey = (k: string): k is TreatmentKey => (TREATMENT_KEYS as readonly string[]).includes(k);

export const ACTION_COLUMNS: Column[] = [
  { header: 'Action', width: 0.3 },
  { header: 'Amount', width: 0.12, align: 'right' },
  { header: 'Cost', width: 0.12, align: 'right' },
  { header: 'When', width: 0.2 },
  { header: 'Status', width: 0.09 },
  { header: 'Done by', width: 0.17 },
];

/** An action's cells under ACTION_COLUMNS; amounts in the reader's units (ha or ac, m or ft, t or US tons). */
export function actionRow(a: PlanAction, units: Units): Row {
  return {
    cells: [
      a.notes ? { text: a.title, note: a.notes } : a.title,
      a.quantity != null ? amountWords(a.quantity, a.unit ?? '', units) : '—',
      a.cost != null ? formatMoney(a.cost, a.currency) : '—',
      actionWhen(a),
      a.status,
      a.doneBy ?? '—',
    ],
    work: isTreatmentKey(a.treatment) ? [a.treatment] : [],
  };
}
