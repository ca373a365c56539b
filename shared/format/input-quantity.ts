// The figure of an assessment input that has a unit, written in the reader's unit system:
// hectare readers get SI (MJ·mm/(ha·h·yr), mm, m, t/ha/yr), acre readers US customary (R in US
// units, inches, feet, US t/ac/yr). Conversions from shared/erosion/units.ts (AH-703 app. A).
import { mmToIn, rSiToUs, tonPerAcToTPerHa } from '../erosion/units';
import type { Units } from '../schemas/auth';
import type { InputQuantity } from '../schemas/assessment';
import { formatLength } from './units';

const fixed = (x: number, digits: number) => x.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
const rain = (mm: number, units: Units) => (units === 'ac' ? `${fixed(mmToIn(mm), 1)} in` : `${fixed(mm, 0)} mm`);

export function formatInputQuantity(q: InputQuantity, units: Units): string {
  switch (q.kind) {
    case 'erosivity':
      return units === 'ac' ? `${fixed(rSiToUs(q.rSi), 0)} (US units)` : `${fixed(q.rSi, 0)} MJ·mm/(ha·h·yr)`;
    case 'annual-rain':
      return `from ${rain(q.mmPerYr, units)}/yr of rain`;
    case 'storm':
      return rain(q.mm, units);
    case 'length':
      return formatLength(q.m, units);
    case 'tolerance':
      // T is assigned in whole US tons per acre (NSSH part 618).
      return units === 'ac' ? `${fixed(q.tonPerAcYr, 0)} t/ac/yr` : `${fixed(tonPerAcToTPerHa(q.tonPerAcYr), 1)} t/ha/yr`;
  }
}
