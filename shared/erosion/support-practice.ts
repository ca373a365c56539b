// Support-practice factor P: contouring, contour strip cropping and terraces by slope, with the
// slope-length limits beyond which a practice loses its effect (AH-537 tables 13 and 14 [memory];
// NRCS 330). Strip cropping P depends on the rotation in the strips (AH-537 table 14).
import contourJson from '../../data/reference/contour-p.json';
import { assertNonNegative, fail, succeed, type Result } from './assert';
import type { Flag } from './cover';
import { ftToM } from './units';
import { formatSlope } from '../format/quantities';
import { formatLength } from '../format/units';

/** The rotation columns of AH-537 table 14. */
export type StripRotation = 'A' | 'B' | 'C';
export const STRIP_ROTATIONS: readonly StripRotation[] = ['A', 'B', 'C'];
/** Each rotation column of AH-537 table 14 in plain words (the table's own footnotes, reworded). */
export const STRIP_ROTATION_WORDS: Record<StripRotation, string> = {
  A: '4-year rotation: row crop, small grain sown with meadow, then 2 years of meadow',
  B: '4-year rotation: 2 years of row crop, winter grain sown with meadow, then 1 year of meadow',
  C: 'strips of row crop alternating with strips of winter grain',
};

export type ContourRow = {
  minSlopePct: number;
  maxSlopePct: number;
  contourP: number;
  contourMaxLengthM: number;
  /** AH-537 table 14: P by the rotation in the strips. */
  stripP: Record<StripRotation, number>;
  /** AH-537 table 14: widest strip and longest slope, in feet as printed. */
  stripMaxWidthFt: number;
  stripMaxLengthFt: number;
  source: string;
  flag: Flag;
};
export type ContourTable = {
  rows: ContourRow[];
  stripSource: string;
  stripFlag: Flag;
  mostEffective: { minSlopePct: number; maxSlopePct: number; source: string };
};
export const DEFAULT_CONTOUR_TABLE = contourJson as unknown as ContourTable;

export type Practice = 'none' | 'contouring' | 'strip cropping' | 'terraces';
export const PRACTICES: readonly Practice[] = ['none', 'contouring', 'strip cropping', 'terraces'];

export type SupportPracticeInput = {
  practice: Practice;
  slopePct: number;
  /** Field slope length, m (for terraces the length is replaced by the terrace interval). */
  slopeLengthM: number;
  /** Horizontal distance between terraces, m (terraces only). */
  terraceIntervalM?: number;
  /** The rotation in the strips (strip cropping only; required there). */
  stripRotation?: StripRotation;
  /** Width of each strip, m (strip cropping only; checked against the table's widest strip). */
  stripWidthM?: number;
};

export type SupportPracticeResult = {
  practice: Practice;
  p: number;
  /** False when the practice gives no benefit here (too steep, or the slope is longer than its limit). */
  effective: boolean;
  /** Slope length the LS factor should use: the terrace interval for terraces, else the input. */
  effectiveSlopeLengthM: number;
  maxLengthM?: number;
  /** Strip cropping: the widest strip the table's P holds for, m. */
  maxStripWidthM?: number;
  /** Strip cropping: set when the strips are wider than the table allows. */
  stripWidthWarning?: string;
  notes: string[];
  cautions: string[];
  source: string;
  flag: Flag;
};

const TERRACE_CAUTION =
  'Terraces need a design to local standards by a qualified person (spacing, grade, outlets); check for buried utilities before any earthwork.';

function findRow(slopePct: number, table: ContourTable): ContourRow | undefined {
  const rows = table.rows;
  const last = rows[rows.length - 1];
  if (slopePct === last.maxSlopePct) return last;
  return rows.find((r) => slopePct >= r.minSlopePct && slopePct < r.maxSlopePct);
}

/** P for a support practice on a slope, with whether it still works. Expected failures as values. */
export function supportPractice(
  input: SupportPracticeInput,
  table: ContourTable = DEFAULT_CONTOUR_TABLE,
): Result<SupportPracticeResult> {
  const { practice, slopePct, slopeLengthM } = input;
  if (!Number.isFinite(slopePct) || slopePct < 0) return fail('slopePct must be a number >= 0');
  if (!Number.isFinite(slopeLengthM) || slopeLengthM <= 0) return fail('slopeLengthM must be a number > 0');
  const base: Pick<SupportPracticeResult, 'practice' | 'effectiveSlopeLengthM' | 'notes' | 'cautions' | 'maxStripWidthM' | 'stripWidthWarning'> = { practice, effectiveSlopeLengthM: slopeLengthM, notes: [], cautions: [] };
  if (practice === 'none') {
    return succeed({ ...base, p: 1, effective: true, source: 'no support practice: P = 1 (AH-703 ch. 6)', flag: 'pub' });
  }
  if (!PRACTICES.includes(practice)) return fail(`practice must be one of: ${PRACTICES.join(', ')}`);
  const strip = practice === 'strip cropping';
  if (strip && (input.stripRotation === undefined || !STRIP_ROTATIONS.includes(input.stripRotation))) {
    return fail(`stripRotation is needed for strip cropping: A (${STRIP_ROTATION_WORDS.A}), B (${STRIP_ROTATION_WORDS.B}) or C (${STRIP_ROTATION_WORDS.C})`);
  }
  if (strip && input.stripWidthM !== undefined && (!Number.isFinite(input.stripWidthM) || input.stripWidthM <= 0)) return fail('stripWidthM must be a number > 0');

  let lengthForLimitM = slopeLengthM;
  if (practice === 'terraces') {
    const interval = input.terraceIntervalM;
    if (interval === undefined || !Number.isFinite(interval) || interval <= 0) {
      return fail('terraceIntervalM is needed for terraces (horizontal distance between terraces, m)');
    }
    assertNonNegative('terraceIntervalM', interval);
    base.effectiveSlopeLengthM = Math.min(interval, slopeLengthM);
    lengthForLimitM = base.effectiveSlopeLengthM;
    base.notes.push(`slope length taken as the terrace interval, ${metres(base.effectiveSlopeLengthM)} (AH-537)`);
    base.cautions.push(TERRACE_CAUTION);
  }

  const row = findRow(slopePct, table);
  if (!row) {
    const last = table.rows[table.rows.length - 1];
    return succeed({
      ...base,
      p: 1,
      effective: false,
      notes: [...base.notes, `no ${practice === 'strip cropping' ? 'strip cropping' : 'contouring'} value beyond ${last.maxSlopePct} % slope: the practice loses its effect, P = 1`],
      source: last.source,
      flag: last.flag,
    });
  }
  const rotation = input.stripRotation as StripRotation;
  // AH-537 table 14: strip-cropping P by the rotation column; table 13: contouring P
  const p = strip ? row.stripP[rotation] : row.contourP;
  const maxLengthM = strip ? round(ftToM(row.stripMaxLengthFt)) : row.contourMaxLengthM;
  const source = strip ? table.stripSource : row.source;
  const flag = strip ? table.stripFlag : row.flag;
  if (strip) {
    const maxStripWidthM = round(ftToM(row.stripMaxWidthFt));
    base.notes.push(`strip cropping with rotation ${rotation}: ${STRIP_ROTATION_WORDS[rotation]}`);
    base.maxStripWidthM = maxStripWidthM;
    if (input.stripWidthM !== undefined && input.stripWidthM > maxStripWidthM) {
      base.stripWidthWarning = `strips ${metres(input.stripWidthM)} wide are wider than the ${metres(ftToM(row.stripMaxWidthFt))} AH-537 table 14 allows at ${formatSlope(slopePct)}: its P assumes strips no wider, so narrow them`;
      base.notes.push(base.stripWidthWarning);
    }
  }
  const { minSlopePct, maxSlopePct } = table.mostEffective;
  if (practice !== 'terraces' && (slopePct < minSlopePct || slopePct > maxSlopePct)) {
    base.notes.push(`contour farming is most effective on ${minSlopePct}–${maxSlopePct} % slopes (${table.mostEffective.source})`);
  }
  if (lengthForLimitM > maxLengthM) {
    return succeed({
      ...base,
      p: 1,
      effective: false,
      maxLengthM,
      notes: [
        ...base.notes,
        `slope length ${metres(lengthForLimitM)} is beyond the ${metres(maxLengthM)} limit for ${practice} at ${formatSlope(slopePct)}: the practice loses its effect, P = 1${practice === 'terraces' ? '; narrow the terrace interval' : '; shorten the slope (terraces, diversions) for it to work'}`,
      ],
      source,
      flag,
    });
  }
  return succeed({ ...base, p, effective: true, maxLengthM, source, flag });
}

const round = (x: number) => Math.round(x * 10) / 10;
/** The P table's notes are in SI; the treatment options word their own in the reader's units. */
const metres = (m: number) => formatLength(m, 'ha');
