// A field's soil figures from its samples and the soil map units under it. Pure: rows in,
// summary out, every number by the engine in shared/erosion with its source named.
import {
  DEFAULT_DRAINAGE_KEY,
  classifyTexture,
  DEFAULT_T_SOURCE,
  DEFAULT_T_TON_PER_AC_YR,
  drainageVerdict,
  hydrologicSoilGroup,
  kFactorWilliams,
  kFromTextureTable,
  organicCarbonFromOm,
  soilGroupFromTexture,
  TEXTURE_CLASSES,
  type TextureClass,
} from '../../../shared/erosion';
import type { FieldSoilSummary } from '../../../shared/schemas/soils';
import type { Origin } from '../../../shared/schemas/provenance';
import type { SoilSample } from '../../models';
import type { MapAggregate } from './field-soil-map';
import { formatShare } from '../../../shared/format/quantities';

/** What the summary reads of each sample. */
export type SampleFigures = Pick<
  SoilSample,
  'kind' | 'sandPct' | 'siltPct' | 'clayPct' | 'organicMatterPct' | 'ph' | 'bufferPh' | 'bufferMethod' | 'depthToGrayCm' | 'describedToCm' | 'textureClass' | 'bulkDensityMgM3' | 'cecCmolKg' | 'espPct'
>;

/** Organic matter taken when no sample gives it, for the K table only (common practice). */
export const ASSUMED_OM_PCT = 2;
/** Clay at or above this is problem clay: the clay and silty clay classes of the SSM ch. 3 triangle start at 40 %. */
export const PROBLEM_CLAY_PCT = 40;
/** The SSM ch. 3 classes named for clay (sandy clay from 35 % clay with over 45 % sand); the clay loams are not among them. */
export const PROBLEM_CLAY_CLASSES: readonly string[] = ['clay', 'silty clay', 'sandy clay'];

const mean = (xs: (number | null)[]): number | null => {
  const v = xs.filter((x): x is number => x !== null);
  return v.length ? v.reduce((s, x) => s + x, 0) / v.length : null;
};
const pct = (share: number) => `${Math.round(share * 100)} %`;
const round1 = (x: number) => Math.round(x * 10) / 10;
const isTexture = (s: string | null): s is TextureClass => s !== null && (TEXTURE_CLASSES as readonly string[]).includes(s);

/** The most common feel-test class; a tie goes to the latest sample. */
function feelClass(samples: SampleFigures[]): TextureClass | null {
  const counts = new Map<string, number>();
  let best: string | null = null;
  for (const s of samples) {
    if (s.kind !== 'feel' || !s.textureClass) continue;
    const n = (counts.get(s.textureClass) ?? 0) + 1;
    counts.set(s.textureClass, n);
    if (best === null || n >= (counts.get(best) ?? 0)) best = s.textureClass;
  }
  return isTexture(best) ? best : null;
}

/**
 * Buffer pH readings of different buffers cannot be averaged (each starts at its own pH): the
 * mean of the samples read with the method of the newest reading that names one; without any
 * method, the mean of all readings and no method (lime then asks for it).
 */
function bufferReading(samples: SampleFigures[]): { bufferPh: number | null; bufferMethod: 'smp' | 'mehlich' | null } {
  const named = samples.filter((s) => s.bufferPh !== null && s.bufferMethod !== null);
  const method = named.length ? named[named.length - 1].bufferMethod : null;
  if (!method) return { bufferPh: mean(samples.map((s) => s.bufferPh)), bufferMethod: null };
  return { bufferPh: mean(named.filter((s) => s.bufferMethod === method).map((s) => s.bufferPh)), bufferMethod: method };
}

export function summariseSoils(samples: SampleFigures[], map: MapAggregate): FieldSoilSummary {
  const lab = samples.filter((s) => s.kind === 'lab' && s.sandPct !== null);
  const sandPct = mean(lab.map((s) => s.sandPct));
  const siltPct = mean(lab.map((s) => s.siltPct));
  const clayPct = mean(lab.map((s) => s.clayPct));
  const organicMatterPct = mean(samples.map((s) => s.organicMatterPct));
  const grays = samples.map((s) => s.depthToGrayCm).filter((d): d is number => d !== null);
  const depthToGrayCm = grays.length ? Math.min(...grays) : null;

  // Texture: the mean of the lab fractions (SSM ch. 3), else the feel tests, else the soil map.
  let textureClass: TextureClass | null = null;
  let textureFrom: 'lab' | 'feel' | 'map' | null = null;
  if (sandPct !== null && siltPct !== null && clayPct !== null) [textureClass, textureFrom] = [classifyTexture({ sand: sandPct, silt: siltPct, clay: clayPct }), 'lab'];
  else if (feelClass(samples)) [textureClass, textureFrom] = [feelClass(samples), 'feel'];
  else if (isTexture(map.textureClass)) [textureClass, textureFrom] = [map.textureClass, 'map'];

  // Drainage: the shallowest gray of any sample (or no gray down to the deepest look), else the map.
  let drainageClass: string | null = null;
  let notWorthAmending = false;
  const describedTo = samples.map((s) => s.describedToCm).filter((d): d is number => d !== null);
  const verdict = depthToGrayCm !== null
    ? drainageVerdict({ depthToGrayCm })
    : describedTo.length ? drainageVerdict({ depthToGrayCm: null, describedToCm: Math.max(...describedTo) }) : null;
  if (verdict?.ok) [drainageClass, notWorthAmending] = [verdict.value.drainageClass, verdict.value.notWorthAmending];
  else if (map.drainageClass) {
    drainageClass = map.drainageClass;
    notWorthAmending = DEFAULT_DRAINAGE_KEY.notWorthAmendingClasses.includes(map.drainageClass);
  }

  // K: the soil map where mapped; else Williams (EPIC) from the lab fractions; else the table by class and OM.
  let kUs: number | null = null;
  let kSource: Origin | null = null;
  if (map.kUs !== null) {
    kUs = map.kUs;
    kSource = { kind: 'derived', source: { title: 'soil map K' }, detail: `area-weighted over the ${pct(map.kShareOfField)} of the field that the map gives a K for` };
  } else if (textureFrom === 'lab' && organicMatterPct !== null) {
    kUs = kFactorWilliams({ sandPct: sandPct!, siltPct: siltPct!, clayPct: clayPct!, organicCarbonPct: organicCarbonFromOm(organicMatterPct) }).us;
    kSource = {
      kind: 'derived',
      source: { title: 'Williams (EPIC) equation, Sharpley & Williams 1990, eq. 2.96' },
      detail: `from the mean of ${lab.length} lab sample${lab.length === 1 ? '' : 's'}`,
    };
  } else if (textureClass) {
    const om = organicMatterPct ?? ASSUMED_OM_PCT;
    const r = kFromTextureTable(textureClass, om);
    if (r.ok) {
      kUs = r.value.us;
      const omWords = organicMatterPct === null ? `organic matter unknown, ${ASSUMED_OM_PCT} % assumed (rule of thumb)` : `organic matter ${round1(om)} %`;
      // A midpoint of a printed range, or an assumed OM, makes the K a rule of thumb.
      const kind = r.value.flag === 'practice' || organicMatterPct === null ? 'rule-of-thumb' : 'published-table';
      kSource = { kind, source: { title: r.value.source }, detail: `${textureClass}, ${omWords}${r.value.note ? `; ${r.value.note}` : ''}` };
    }
  }

  // T: the soil map's where mapped, else the deep-soil default.
  const tTonPerAcYr = map.tTonPerAcYr ?? DEFAULT_T_TON_PER_AC_YR;
  const tSource: Origin =
    map.tTonPerAcYr !== null
      ? { kind: 'derived', source: { title: 'soil map T' }, detail: `area-weighted over the ${pct(map.tShareOfField)} of the field that the map gives a T for` }
      : { kind: 'default', source: DEFAULT_T_SOURCE };

  // Hydrologic soil group: the map's mix wins; else a water table within 60 cm (gray colours) gives D; else by texture.
  let hsgShares = map.hsgShares;
  let hsg = map.hsg;
  if (hsgShares.length === 0) {
    const wet = depthToGrayCm !== null && depthToGrayCm < 60 ? hydrologicSoilGroup({ depthToWaterTableCm: depthToGrayCm }) : null;
    if (wet?.ok) hsg = wet.value.hsg;
    else if (textureClass) hsg = soilGroupFromTexture(textureClass).hsg;
    hsgShares = hsg ? [{ group: hsg, share: 1 }] : [];
  }

  // Problem clay is about the clay alone (SSM ch. 3 texture classes); a wet subsoil is its own
  // verdict (notWorthAmending), whatever the texture: a wet silty clay loam is not problem clay.
  const problemClayReasons: string[] = [];
  if (clayPct !== null && clayPct >= PROBLEM_CLAY_PCT) problemClayReasons.push(`clay ${formatShare(clayPct)} (${PROBLEM_CLAY_PCT} % or more)`);
  if (textureClass && PROBLEM_CLAY_CLASSES.includes(textureClass)) problemClayReasons.push(`texture class ${textureClass}${textureFrom === 'map' ? ' (soil map)' : ''}`);

  return {
    sampleCount: samples.length,
    sandPct,
    siltPct,
    clayPct,
    organicMatterPct,
    textureClass,
    ph: mean(samples.map((s) => s.ph)),
    ...bufferReading(samples),
    depthToGrayCm,
    drainageClass,
    notWorthAmending,
    kUs,
    kSource,
    tTonPerAcYr,
    tSource,
    hsg,
    hsgShares,
    bulkDensity: mean(samples.map((s) => s.bulkDensityMgM3)),
    cecCmolPerKg: mean(samples.map((s) => s.cecCmolKg)),
    espPct: mean(samples.map((s) => s.espPct)),
    problemClay: problemClayReasons.length > 0,
    problemClayReasons,
  };
}
