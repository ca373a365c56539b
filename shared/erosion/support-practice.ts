// Support-practice factor P: contouring, contour strip cropping and terraces by slope, with the
// slope-length limits beyond which a practice loses its effect (AH-537 [memory]; NRCS 330).
import contourJson from '../../data/reference/contour-p.json';
import { assertNonNegative, fail, succeed, type Result } from './assert';
import type { Flag } from './cover';

export type ContourRow = {
  minSlopePct: number;
  maxSlopePct: number;
  contourP: number;
  contourMaxLengthM: number;
  stripP: number;
  stripMaxLengthM: number;
  source: string;
  flag: Flag;
};
export type ContourTable = {
  rows: ContourRow[];
  stripSource: string;
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
};

export type SupportPracticeResult = {
  practice: Practice;
  p: number;
  /** False when the practice gives no benefit here (too steep, or the slope is longer than its limit). */
  effective: boolean;
  /** Slope length the LS factor should use: the terrace interval for terraces, else the input. */
  effectiveSlopeLengthM: number;
  maxLengthM?: number;
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
  const base = { practice, effectiveSlopeLengthM: slopeLengthM, notes: [] as string[], cautions: [] as string[] };
  if (practice === 'none') {
    return succeed({ ...base, p: 1, effective: true, source: 'no support practice: P = 1 (AH-703 ch. 6)', flag: 'pub' });
  }
  if (!PRACTICES.includes(practice)) return fail(`practice must be one of: ${PRACTICES.join(', ')}`);

  let lengthForLimitM = slopeLengthM;
  if (practice === 'terraces') {
    const interval = input.terraceIntervalM;
    if (interval === undefined || !Number.isFinite(interval) || interval <= 0) {
      return fail('terraceIntervalM is needed for terraces (horizontal distance between terraces, m)');
    }
    assertNonNegative('terraceIntervalM', interval);
    base.effectiveSlopeLengthM = Math.min(interval, slopeLengthM);
    lengthForLimitM = base.effectiveSlopeLengthM;
    base.notes.push(`slope length taken as the terrace interval, ${round(base.effectiveSlopeLengthM)} m (AH-537)`);
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
  const strip = practice === 'strip cropping';
  const p = strip ? row.stripP : row.contourP;
  const maxLengthM = strip ? row.stripMaxLengthM : row.contourMaxLengthM;
  const source = strip ? table.stripSource : row.source;
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
        `slope length ${round(lengthForLimitM)} m is beyond the ${maxLengthM} m limit for ${practice} at ${slopePct} %: the practice loses its effect, P = 1${practice === 'terraces' ? '; narrow the terrace interval' : '; shorten the slope (terraces, diversions) for it to work'}`,
      ],
      source,
      flag: row.flag,
    });
  }
  return succeed({ ...base, p, effective: true, maxLengthM, source, flag: row.flag });
}

const round = (x: number) => Math.round(x * 10) / 10;
