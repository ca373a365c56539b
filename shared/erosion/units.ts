// Every SI <-> US customary conversion of the engine, in one place.
// Conversion factors: AH-703 app. A for R and K; the others by the definitions of the units.

/** 1 short ton/acre = 2.2417 t/ha (907.18474 kg / 0.40468564 ha). */
export const T_PER_HA_PER_TON_PER_AC = 2.2417;
/** 1 US R unit (hundreds ft·tonf·in/(ac·h·yr)) = 17.02 MJ·mm/(ha·h·yr) (AH-703 app. A). */
export const R_SI_PER_US = 17.02;
/** 1 US K unit (ton·ac·h/(hundreds ac·ft·tonf·in)) = 0.1317 t·ha·h/(ha·MJ·mm) (AH-703 app. A). */
export const K_SI_PER_US = 0.1317;
/** International foot. */
export const M_PER_FT = 0.3048;
/** Inch. */
export const MM_PER_IN = 25.4;
/** 1 in/h = 25400 µm / 3600 s = 7.0556 µm/s (often rounded to 7.056). */
export const UM_PER_S_PER_IN_PER_H = 25400 / 3600;
/** International acre = 0.40468564224 ha. */
export const HA_PER_AC = 0.40468564224;
/** Square metres in a hectare. */
export const M2_PER_HA = 10_000;
/** International acre = 4046.8564224 m². */
export const M2_PER_AC = 4046.8564224;
/** Acre-foot = 43,560 ft³ = 1233.48183754752 m³. */
export const M3_PER_ACRE_FT = 1233.48183754752;
/** Feet in a statute mile. */
export const FT_PER_MI = 5280;

export const tPerHaToTonPerAc = (tPerHa: number): number => tPerHa / T_PER_HA_PER_TON_PER_AC;
export const tonPerAcToTPerHa = (tonPerAc: number): number => tonPerAc * T_PER_HA_PER_TON_PER_AC;

export const rUsToSi = (rUs: number): number => rUs * R_SI_PER_US;
export const rSiToUs = (rSi: number): number => rSi / R_SI_PER_US;

export const kUsToSi = (kUs: number): number => kUs * K_SI_PER_US;
export const kSiToUs = (kSi: number): number => kSi / K_SI_PER_US;

export const ftToM = (ft: number): number => ft * M_PER_FT;
export const mToFt = (m: number): number => m / M_PER_FT;

export const inToMm = (inches: number): number => inches * MM_PER_IN;
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const cmToIn = (cm: number): number => (cm * 10) / MM_PER_IN;

export const inPerHToUmPerS = (inPerH: number): number => inPerH * UM_PER_S_PER_IN_PER_H;
export const umPerSToInPerH = (umPerS: number): number => umPerS / UM_PER_S_PER_IN_PER_H;

/** 1 mm/h = 1000 µm / 3600 s. */
export const mmPerHToUmPerS = (mmPerH: number): number => mmPerH / 3.6;
export const umPerSToMmPerH = (umPerS: number): number => umPerS * 3.6;

export const haToAc = (ha: number): number => ha / HA_PER_AC;
export const acToHa = (ac: number): number => ac * HA_PER_AC;

/** Metric tonnes to US short tons (2000 lb = 0.90718474 t). */
export const tToShortTon = (t: number): number => t / 0.90718474;
export const shortTonToT = (ton: number): number => ton * 0.90718474;
