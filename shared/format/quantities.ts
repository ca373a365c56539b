// How each kind of quantity is written, so a figure carries no more digits than its inputs can
// (RUSLE and curve-number figures are good to a few tens of per cent, lab pH to 0.1, slopes from
// a DEM or a level to about 0.1 %). Every figure has its unit; acre users read US customary units.
//   slope %            0.1 % below 20 %, whole per cent above ("8.4 %", "23 %")
//   shares %           whole per cent, "< 1 %" for a trace ("22 %")
//   lab contents %     0.1 % (organic matter, ESP: "2.9 %")
//   factors (LS, C, P, K)  two significant figures ("3.5", "0.47", "0.009")
//   pH                 0.1 ("5.6")
//   rates (t/ha, US t/ac)  two significant figures, at least 0.1 ("2.5 t/ha", "12 t/ha")
//   depths             whole cm; inches to 0.1 ("15 cm", "5.9 in")
//   counts             whole, with thousands separators ("1,466")
// Soil loss, tonnes, runoff and volume are in loss-units.ts, areas and lengths in units.ts,
// money in money.ts; anything else through formatFigure.
import { cmToIn, tPerHaToTonPerAc } from '../erosion/units';
import type { Units } from '../schemas/auth';

const fixed = (x: number, digits: number) => x.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Two significant figures, never in exponent form, with thousands separators. */
export function twoSignificant(x: number): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  return x.toLocaleString('en-US', { minimumSignificantDigits: 2, maximumSignificantDigits: 2 });
}

/** "8.4 %", "23 %". */
export const formatSlope = (slopePct: number): string => `${fixed(slopePct, Math.abs(slopePct) < 20 ? 1 : 0)} %`;

/** "22 %", "< 1 %" for a trace above zero. */
export const formatShare = (pct: number): string => (pct > 0 && pct < 0.5 ? '< 1 %' : `${fixed(pct, 0)} %`);

/** A lab content (organic matter, ESP): "2.9 %". */
export const formatContent = (pct: number): string => `${fixed(pct, 1)} %`;

/** A RUSLE ratio or K: "3.5", "0.47", "0.009". */
export const formatFactor = (x: number): string => twoSignificant(x);

/** "5.6". */
export const formatPh = (ph: number): string => fixed(ph, 1);

/** An application rate given per hectare: "2.5 t/ha" or "1.1 US t/ac". */
export function formatRate(tPerHa: number, units: Units): string {
  return `${rateNumber(tPerHa, units)} ${RATE_UNIT[units]}`;
}

/** A range of rates: "10–50 t/ha" or "4.5–22 US t/ac". */
export function formatRateRange(lowTPerHa: number, highTPerHa: number, units: Units): string {
  return `${rateNumber(lowTPerHa, units)}–${rateNumber(highTPerHa, units)} ${RATE_UNIT[units]}`;
}

const RATE_UNIT: Record<Units, string> = { ha: 't/ha', ac: 'US t/ac' };

function rateNumber(tPerHa: number, units: Units): string {
  const v = units === 'ac' ? tPerHaToTonPerAc(tPerHa) : tPerHa;
  return Math.abs(v) < 1 ? fixed(v, 1) : twoSignificant(v);
}

/** A depth below the surface: "15 cm" or "5.9 in". */
export const formatDepth = (cm: number, units: Units): string => (units === 'ac' ? `${fixed(cmToIn(cm), 1)} in` : `${fixed(cm, 0)} cm`);

/** A depth of water in inches: "2.6" (0.1 in, about 2.5 mm). */
export const formatInches = (inches: number): string => fixed(inches, 1);

/** "1,466". */
export const formatCount = (n: number): string => fixed(n, 0);
