// A soil map unit's attribute values read as texture class, K, T, hydrologic soil group and
// drainage class, by the attribute names the person mapped; values that cannot be read are
// counted, not guessed.
import { DRAINAGE_CLASSES, HYDROLOGIC_SOIL_GROUPS, TEXTURE_CLASSES, kSiToUs, type TextureClass } from '../../../shared/erosion';
import type { SoilMapMeaning } from '../../../shared/schemas/soils';
import type { StoredMapping } from '../../models/soil-map.model';
export const EMPTY_MAPPING: StoredMapping = { texture: null, k: null, hsg: null, t: null, drainage: null, kUnits: 'us' };

export type UnitValues = { textureClass: TextureClass | null; kUs: number | null; tTonPerAcYr: number | null; hsg: string | null; drainageClass: string | null };

/** USDA texture abbreviations as soil surveys print them (S, LS, SL, L, SIL, SI, SCL, CL, SICL, SC, SIC, C). */
const TEXTURE_ABBREVIATIONS: Record<string, TextureClass> = {
  s: 'sand', ls: 'loamy sand', sl: 'sandy loam', l: 'loam', sil: 'silt loam', si: 'silt',
  scl: 'sandy clay loam', cl: 'clay loam', sicl: 'silty clay loam', sc: 'sandy clay', sic: 'silty clay', c: 'clay',
};
// Longest names first, so "gravelly silty clay loam" is silty clay loam, not loam.
const BY_LENGTH = [...TEXTURE_CLASSES].sort((a, b) => b.length - a.length);

const text = (v: unknown): string | null => (v === null || v === undefined ? null : String(v).trim().toLowerCase().replace(/[\s_-]+/g, ' ') || null);
const number = (v: unknown): number | null => {
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  const t = text(v);
  if (t === null) return null;
  const n = Number(t.replace(/^(-?\d+),(\d+)$/, '$1.$2'));
  return Number.isFinite(n) ? n : null;
};

export function readTexture(v: unknown): TextureClass | null {
  const t = text(v);
  if (t === null) return null;
  if (TEXTURE_ABBREVIATIONS[t.replace(/\s/g, '')]) return TEXTURE_ABBREVIATIONS[t.replace(/\s/g, '')];
  return BY_LENGTH.find((name) => t === name || t.endsWith(` ${name}`)) ?? null;
}

/** K in US units; survey K factors lie in 0.02–0.69 US, so anything outside 0–1 is not a K. */
export function readK(v: unknown, units: 'us' | 'si'): number | null {
  const n = number(v);
  if (n === null || n <= 0) return null;
  const us = units === 'si' ? kSiToUs(n) : n;
  return us <= 1 ? us : null;
}

/** T in t/ac/yr: soil surveys assign 1–5 (NSSH part 618). */
export function readT(v: unknown): number | null {
  const n = number(v);
  return n !== null && n >= 1 && n <= 5 ? n : null;
}

export function readHsg(v: unknown): string | null {
  const t = v === null || v === undefined ? '' : String(v).trim().toUpperCase().replace(/\s/g, '');
  return (HYDROLOGIC_SOIL_GROUPS as readonly string[]).includes(t) ? t : null;
}

export function readDrainage(v: unknown): string | null {
  let t = text(v);
  if (t === null) return null;
  if (!t.endsWith('drained')) t = `${t} drained`;
  return (DRAINAGE_CLASSES as readonly string[]).includes(t) ? t : null;
}

export function unitValues(attributes: Record<string, unknown>, m: StoredMapping): UnitValues {
  const get = (name: string | null) => (name === null ? undefined : attributes[name]);
  return {
    textureClass: m.texture ? readTexture(get(m.texture)) : null,
    kUs: m.k ? readK(get(m.k), m.kUnits) : null,
    tTonPerAcYr: m.t ? readT(get(m.t)) : null,
    hsg: m.hsg ? readHsg(get(m.hsg)) : null,
    drainageClass: m.drainage ? readDrainage(get(m.drainage)) : null,
  };
}

/** Reads one meaning's value (for the mapping checks). */
export function readMeaning(meaning: SoilMapMeaning, v: unknown, kUnits: 'us' | 'si'): unknown {
  switch (meaning) {
    case 'texture':
      return readTexture(v);
    case 'k':
      return readK(v, kUnits);
    case 't':
      return readT(v);
    case 'hsg':
      return readHsg(v);
    case 'drainage':
      return readDrainage(v);
  }
}

/** A first mapping from common attribute names; the person confirms or changes it. */
const GUESSES: Record<SoilMapMeaning, RegExp> = {
  texture: /^(texture|texcl|texture_?class|texdesc|tex)$/i,
  k: /^(k|kw|kf|kwfact|kffact|k_?factor|kfact)$/i,
  hsg: /^(hsg|hydgrp|hydgrpdcd|hyd_?group|hydrologic_?(soil_?)?group)$/i,
  t: /^(t|tfact|t_?factor)$/i,
  drainage: /^(drainage|drainagecl|drclassdcd|drainage_?class|drclass)$/i,
};

export function guessMapping(attributeNames: string[], previous?: StoredMapping): StoredMapping {
  const out: StoredMapping = { ...EMPTY_MAPPING, kUnits: previous?.kUnits ?? 'us' };
  for (const meaning of Object.keys(GUESSES) as SoilMapMeaning[]) {
    const kept = previous?.[meaning];
    out[meaning] = kept && attributeNames.includes(kept) ? kept : (attributeNames.find((n) => GUESSES[meaning].test(n)) ?? null);
  }
  return out;
}
