// Number formats of the Soil tab, each with its unit. K and T are shown in both unit systems,
// the user's first (hectare users SI, acre users US customary).
import type { Units } from '../../../../shared/schemas/auth';
import { kUsToSi, tonPerAcToTPerHa } from '../../../../shared/erosion/units';
import { M2_PER_AC, M2_PER_HA } from '../../../../shared/erosion/units';

export const fmt = (x: number, digits: number) =>
  x.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** "54 %" (whole percent) or "4.1 %" with digits. */
export const fmtPct = (x: number, digits = 0) => `${fmt(x, digits)} %`;
export const fmtCm = (x: number) => `${fmt(x, Number.isInteger(x) ? 0 : 1)} cm`;
export const fmtPh = (x: number) => fmt(x, 1);
export const fmtShare = (share: number) => {
  const pct = share * 100;
  return pct > 0 && pct < 0.5 ? '< 1 %' : `${fmt(pct, 0)} %`;
};

export const K_US_UNIT = 'ton·acre·h/(hundreds of acre·ft·tonf·in)';
export const K_SI_UNIT = 't·ha·h/(ha·MJ·mm)';
export const T_US_UNIT = 'ton/ac/yr';
export const T_SI_UNIT = 't/ha/yr';

/** K in the user's system first, the other in brackets. */
export function formatK(kUs: number, units: Units): { main: string; other: string } {
  const us = `${fmt(kUs, 2)} ${K_US_UNIT}`;
  const si = `${fmt(kUsToSi(kUs), 3)} ${K_SI_UNIT}`;
  return units === 'ha' ? { main: si, other: us } : { main: us, other: si };
}

/** T in the user's system first, the other in brackets. */
export function formatT(tTonPerAcYr: number, units: Units): { main: string; other: string } {
  const us = `${fmt(tTonPerAcYr, 1)} ${T_US_UNIT}`;
  const si = `${fmt(tonPerAcToTPerHa(tTonPerAcYr), 1)} ${T_SI_UNIT}`;
  return units === 'ha' ? { main: si, other: us } : { main: us, other: si };
}


/** "1.23 ha" or "3.04 ac" from square metres. */
export function formatAreaM2(areaM2: number, units: Units): string {
  const v = units === 'ac' ? areaM2 / M2_PER_AC : areaM2 / M2_PER_HA;
  return `${fmt(v, Math.abs(v) < 10 ? 2 : 1)} ${units}`;
}

/** The sample's depth range in words: "0–20 cm", "from 30 cm", or null. */
export function depthRange(top: number | null, bottom: number | null): string | null {
  if (top !== null && bottom !== null) return `${fmt(top, 0)}–${fmt(bottom, 0)} cm`;
  if (top !== null) return `from ${fmtCm(top)}`;
  if (bottom !== null) return `to ${fmtCm(bottom)}`;
  return null;
}

/** "15 Oct 2026" from YYYY-MM-DD, read as a calendar date (no time zone shift). */
export function formatDay(isoDate: string): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d)).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
}
