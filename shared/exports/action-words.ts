// A plan action in a few plain words, for files and printed pages: what, how much, what it
// costs and when.
import type { PlanAction } from '../schemas/plans';
import { formatFigure } from '../format/figure';
import { formatMoney } from '../format/money';

type When = Pick<PlanAction, 'plannedOn' | 'plannedFrom' | 'plannedTo'>;

/** "2027-08-25", "2027-04-20 to 2027-05-10", "from 2027-04-20", "by 2027-05-10" or "no date set". */
export function actionWhen(a: When): string {
  if (a.plannedOn) return a.plannedOn;
  if (a.plannedFrom && a.plannedTo) return `${a.plannedFrom} to ${a.plannedTo}`;
  if (a.plannedFrom) return `from ${a.plannedFrom}`;
  if (a.plannedTo) return `by ${a.plannedTo}`;
  return 'no date set';
}

/** "420 m" or null. */
const actionQuantity = (a: Pick<PlanAction, 'quantity' | 'unit'>): string | null =>
  a.quantity != null ? `${formatFigure(a.quantity)}${a.unit ? ` ${a.unit}` : ''}` : null;

/** "Grassed waterway: 420 m, $15,960, 2027-08-25 (planned)". */
export function actionSummary(a: PlanAction): string {
  const parts = [actionQuantity(a), a.cost != null ? formatMoney(a.cost, a.currency) : null, actionWhen(a), `(${a.status})`];
  return `${a.title}: ${parts.filter(Boolean).join(', ')}`;
}
