// Display units. The API speaks SI (areaHa, perimeterM); the user picks hectares or acres.
import type { Units } from '../../shared/schemas/auth';

/** Acres in one hectare (1 ac = 4046.8564224 m², exact by the 1959 international foot). */
export const AC_PER_HA = 2.4710538;
/** Feet in one metre (1 ft = 0.3048 m exactly). */
export const FT_PER_M = 1 / 0.3048;
/** Feet in one mile. */
export const FT_PER_MI = 5280;

const fmt = (value: number, digits: number) =>
  value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

export function haToAc(areaHa: number): number {
  return areaHa * AC_PER_HA;
}

/** "12.3 ha" or "30.4 ac"; two decimals below 10. */
export function formatArea(areaHa: number, units: Units): string {
  const value = units === 'ac' ? haToAc(areaHa) : areaHa;
  const digits = Math.abs(value) < 10 ? 2 : 1;
  return `${fmt(value, digits)} ${units}`;
}

/** "840 m", "2.35 km", "2,756 ft" or "1.23 mi" — metric for hectare users, feet/miles for acre users. */
export function formatLength(lengthM: number, units: Units): string {
  if (units === 'ac') {
    const ft = lengthM * FT_PER_M;
    return ft < FT_PER_MI ? `${fmt(ft, 0)} ft` : `${fmt(ft / FT_PER_MI, 2)} mi`;
  }
  return lengthM < 1000 ? `${fmt(lengthM, 0)} m` : `${fmt(lengthM / 1000, 2)} km`;
}

export const UNIT_LABELS: Record<Units, string> = { ha: 'hectares', ac: 'acres' };

/** Cubic metres in one acre-foot (43,560 ft³). */
export const M3_PER_ACRE_FT = 1233.48183754752;
