// Display units. The API speaks SI (areaHa, perimeterM); the user picks hectares or acres.
// The conversions themselves live in shared/erosion/units.ts; the server's reports use the same words.
import type { Units } from '../schemas/auth';
import { FT_PER_MI, haToAc, mToFt } from '../erosion/units';

const fmt = (value: number, digits: number) =>
  value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** "12.3 ha" or "30.4 ac"; two decimals below 10. */
export function formatArea(areaHa: number, units: Units): string {
  const value = units === 'ac' ? haToAc(areaHa) : areaHa;
  const digits = Math.abs(value) < 10 ? 2 : 1;
  return `${fmt(value, digits)} ${units}`;
}

/** "840 m", "2.35 km", "2,756 ft" or "1.23 mi" — metric for hectare users, feet/miles for acre users. */
export function formatLength(lengthM: number, units: Units): string {
  if (units === 'ac') {
    const ft = mToFt(lengthM);
    return ft < FT_PER_MI ? `${fmt(ft, 0)} ft` : `${fmt(ft / FT_PER_MI, 2)} mi`;
  }
  return lengthM < 1000 ? `${fmt(lengthM, 0)} m` : `${fmt(lengthM / 1000, 2)} km`;
}

export const UNIT_LABELS: Record<Units, string> = { ha: 'hectares', ac: 'acres' };
