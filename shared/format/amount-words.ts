// An amount in the user's units: hectares or acres, metres or feet, tonnes or US tons; any
// other unit as typed. Used by the treatment options and the season plan.
import { tToShortTon } from '../erosion/units';
import type { Units } from '../schemas/auth';
import { formatFigure } from './figure';
import { formatArea, formatLength } from './units';

export function amountWords(amount: number, unit: string, units: Units): string {
  if (unit === 'ha') return formatArea(amount, units);
  if (unit === 'm') return formatLength(amount, units);
  if (unit === 't') return units === 'ac' ? `${formatFigure(tToShortTon(amount))} US tons` : `${formatFigure(amount)} t`;
  return `${formatFigure(amount)} ${unit}`;
}
