// The estimate form's values and how they become the shared EstimateInput. The form keeps
// every way of giving a factor (typed, from precipitation, from texture, by feel …) so a user
// can switch back and forth without losing what they typed; toEstimateInput() picks the
// chosen one. Validation is the shared zod schema, run on that picked input, so its field
// paths (k.sandPct, slopePct, …) are the form's own names and errors land beside the inputs.
import { zodResolver } from '@hookform/resolvers/zod';
import type { Resolver } from 'react-hook-form';
import {
  EstimateInput,
  T_TON_PER_AC_YR_RANGE,
  type Crop,
  type FeelClass,
  type HydrologicSoilGroup,
  type Practice,
  type Tillage,
} from '../../../../shared/schemas/estimate';
import { curveNumberChoices, DEFAULT_COVER_TABLE, tonPerAcToTPerHa, tPerHaToTonPerAc, type StripRotation } from '../../../../shared/erosion';
import { formatFigure } from '../../../lib/format-figure';
import type { z } from 'zod';

type UnitsChoice = 'si' | 'us';

export type EstimateFormValues = {
  r: { from: 'value' | 'precipitation'; value?: number; units: UnitsChoice; annualPrecipitationMm?: number };
  k: {
    from: 'value' | 'texture' | 'feel';
    value?: number;
    units: UnitsChoice;
    sandPct?: number;
    siltPct?: number;
    clayPct?: number;
    organicMatterPct?: number;
    method: 'williams' | 'table';
    balls: 'yes' | 'no';
    ribbonCm?: number;
    feel: z.infer<typeof FeelClass> | '';
  };
  slopePct?: number;
  slopeLengthM?: number;
  rillRatio: 'low' | 'moderate' | 'high';
  c: {
    from: 'value' | 'table';
    value?: number;
    crop: z.infer<typeof Crop>;
    tillage: z.infer<typeof Tillage>;
    residuePct?: number;
    coverCrop: boolean;
    groundCoverPct?: number;
  };
  p: { from: 'value' | 'practice'; value?: number; practice: z.infer<typeof Practice>; terraceIntervalM?: number; stripRotation: StripRotation; stripWidthM?: number };
  /** T in t/ha/yr, as every input of the page is SI; the engine takes US t/ac/yr. */
  tTPerHaYr?: number;
  areaHa?: number;
  runoffOn: boolean;
  runoff: {
    rainfallMm?: number;
    cnFrom: 'table' | 'value';
    cn?: number;
    /** '' = take the group from the soil texture. */
    hsg: z.infer<typeof HydrologicSoilGroup> | '';
    /** Index into CN_CHOICES. */
    cnRow: string;
    drained: boolean;
    drainedWaterTableDepthCm?: number;
    antecedent: 'I' | 'II' | 'III';
  };
};

/** Cover rows of the TR-55 tables the engine reads, for the runoff drop-down. */
export const CN_CHOICES = curveNumberChoices();

/** Tillage systems the C table has for a crop; empty when the crop has no tillage choice. */
export function tillagesFor(crop: string): z.infer<typeof Tillage>[] {
  const rows = DEFAULT_COVER_TABLE.rows.filter((r) => r.crop === crop);
  const named = rows.map((r) => r.tillage).filter((t) => t !== 'any' && t !== 'none');
  return named as z.infer<typeof Tillage>[];
}

const defaultCnRow = String(
  Math.max(
    0,
    CN_CHOICES.findIndex((c) => c.cover === 'row crops' && c.treatment === 'straight row + crop residue' && c.condition === 'good'),
  ),
);

/** An invented example: a gently rolling silt loam in corn after chisel tillage. */
export const DEFAULT_VALUES: EstimateFormValues = {
  r: { from: 'value', value: 2500, units: 'si', annualPrecipitationMm: 850 },
  k: {
    from: 'texture',
    value: 0.32,
    units: 'us',
    sandPct: 20,
    siltPct: 62,
    clayPct: 18,
    organicMatterPct: 3,
    method: 'williams',
    balls: 'yes',
    ribbonCm: 3,
    feel: 'very smooth',
  },
  slopePct: 6,
  slopeLengthM: 90,
  rillRatio: 'moderate',
  c: { from: 'table', value: 0.2, crop: 'corn', tillage: 'chisel or mulch-till', residuePct: undefined, coverCrop: false, groundCoverPct: 80 },
  p: { from: 'practice', value: 1, practice: 'none', terraceIntervalM: 40, stripRotation: 'B', stripWidthM: undefined },
  tTPerHaYr: undefined,
  areaHa: 12,
  runoffOn: true,
  runoff: { rainfallMm: 75, cnFrom: 'table', cn: 78, hsg: '', cnRow: defaultCnRow, drained: false, antecedent: 'II' },
};

/** The one input the engine and POST /api/estimate take, from the chosen ways of the form. */
export function toEstimateInput(v: EstimateFormValues): EstimateInput {
  const r: EstimateInput['r'] =
    v.r.from === 'value'
      ? { from: 'value', value: v.r.value as number, units: v.r.units }
      : { from: 'precipitation', annualPrecipitationMm: v.r.annualPrecipitationMm as number };

  let k: EstimateInput['k'];
  if (v.k.from === 'value') k = { from: 'value', value: v.k.value as number, units: v.k.units };
  else if (v.k.from === 'texture')
    k = {
      from: 'texture',
      sandPct: v.k.sandPct as number,
      siltPct: v.k.siltPct as number,
      clayPct: v.k.clayPct as number,
      organicMatterPct: v.k.organicMatterPct as number,
      method: v.k.method,
    };
  else {
    const balls = v.k.balls === 'yes';
    const ribbons = balls && (v.k.ribbonCm ?? 0) > 0;
    k = {
      from: 'feel',
      balls,
      organicMatterPct: v.k.organicMatterPct as number,
      ...(balls ? { ribbonCm: v.k.ribbonCm } : {}),
      ...(ribbons && v.k.feel ? { feel: v.k.feel } : {}),
    };
  }

  let c: EstimateInput['c'];
  if (v.c.from === 'value') c = { from: 'value', value: v.c.value as number };
  else if (v.c.crop === 'pasture') c = { from: 'table', crop: 'pasture', groundCoverPct: v.c.groundCoverPct };
  else {
    const tillages = tillagesFor(v.c.crop);
    c = {
      from: 'table',
      crop: v.c.crop,
      coverCrop: v.c.coverCrop,
      ...(tillages.length ? { tillage: tillages.includes(v.c.tillage) ? v.c.tillage : tillages[0] } : {}),
      ...(v.c.residuePct !== undefined && tillages.length ? { residuePct: v.c.residuePct } : {}),
    };
  }

  const p: EstimateInput['p'] =
    v.p.from === 'value'
      ? { from: 'value', value: v.p.value as number }
      : {
          from: 'practice',
          practice: v.p.practice,
          ...(v.p.practice === 'terraces' ? { terraceIntervalM: v.p.terraceIntervalM } : {}),
          ...(v.p.practice === 'strip cropping' ? { stripRotation: v.p.stripRotation, ...(v.p.stripWidthM !== undefined ? { stripWidthM: v.p.stripWidthM } : {}) } : {}),
        };

  let runoff: EstimateInput['runoff'];
  if (v.runoffOn) {
    const ro = v.runoff;
    if (ro.cnFrom === 'value') runoff = { rainfallMm: ro.rainfallMm as number, cn: ro.cn, antecedent: ro.antecedent };
    else {
      const row = CN_CHOICES[Number(ro.cnRow)] ?? CN_CHOICES[0];
      runoff = {
        rainfallMm: ro.rainfallMm as number,
        cover: row.cover,
        treatment: row.treatment,
        condition: row.condition as 'poor' | 'fair' | 'good' | null,
        ...(ro.hsg ? { hsg: ro.hsg } : {}),
        drained: ro.drained,
        ...(ro.drained && ro.drainedWaterTableDepthCm !== undefined ? { drainedWaterTableDepthCm: ro.drainedWaterTableDepthCm } : {}),
        antecedent: ro.antecedent,
      };
    }
  }

  return {
    r,
    k,
    slopePct: v.slopePct as number,
    slopeLengthM: v.slopeLengthM as number,
    rillRatio: v.rillRatio,
    c,
    p,
    ...(v.tTPerHaYr !== undefined ? { tTonPerAcYr: tPerHaToTonPerAc(v.tTPerHaYr) } : {}),
    ...(v.areaHa !== undefined ? { areaHa: v.areaHa } : {}),
    ...(runoff ? { runoff } : {}),
  };
}

const zodEstimate = zodResolver(EstimateInput);

/** T's limits in the page's units, for the message beside the T input. */
const T_RANGE_WORDS = `between ${formatFigure(tonPerAcToTPerHa(T_TON_PER_AC_YR_RANGE.min))} and ${formatFigure(tonPerAcToTPerHa(T_TON_PER_AC_YR_RANGE.max))} t/ha/yr`;

/** zodResolver(EstimateInput), run on the input the form's choices make; T's error moves to the t/ha input. */
export const estimateResolver: Resolver<EstimateFormValues> = async (values, context, options) => {
  const result = (await zodEstimate(toEstimateInput(values), context, options as never)) as unknown as Awaited<ReturnType<Resolver<EstimateFormValues>>>;
  const errors = result.errors as Record<string, { type: string; message?: string } | undefined>;
  if (errors.tTonPerAcYr) {
    const { tTonPerAcYr, ...rest } = errors;
    return { values: {}, errors: { ...rest, tTPerHaYr: { type: tTonPerAcYr.type, message: `Soil-loss tolerance T must be ${T_RANGE_WORDS}` } } } as typeof result;
  }
  return result;
};

/** A text box's number: empty is "not given", a comma may be the decimal mark. */
export const toNumber = (raw: unknown): number | undefined => {
  if (typeof raw === 'number') return raw;
  const s = String(raw ?? '').trim().replace(',', '.');
  return s === '' ? undefined : Number(s);
};

/** The schema's messages name the field path ("slopePct must be …"); beside the input, the label already does. */
export function plainError(message: string | undefined): string | undefined {
  if (!message) return undefined;
  const m = /^[a-z][\w.]*\s+(must|is|needs)\b(.*)$/i.exec(message);
  if (!m) return message;
  return `${m[1][0].toUpperCase()}${m[1].slice(1)}${m[2]}`;
}

/** What each input is called on the page, by the schema's field path. */
const FIELD_LABELS: Record<string, string> = {
  'r.value': 'R',
  'r.annualPrecipitationMm': 'Mean annual precipitation',
  'k.value': 'K',
  'k.sandPct': 'Sand',
  'k.siltPct': 'Silt',
  'k.clayPct': 'Clay',
  'k.organicMatterPct': 'Organic matter',
  'k.ribbonCm': 'Ribbon length',
  slopePct: 'Slope',
  slopeLengthM: 'Slope length',
  'c.value': 'C',
  'c.residuePct': 'Residue cover',
  'c.groundCoverPct': 'Ground cover',
  'p.value': 'P',
  'p.terraceIntervalM': 'Distance between terraces',
  'p.stripRotation': 'Rotation in the strips',
  'p.stripWidthM': 'Strip width',
  'runoff.drainedWaterTableDepthCm': 'Water-table depth kept by the drains',
  tTPerHaYr: 'Soil-loss tolerance T',
  areaHa: 'Field area',
  'runoff.rainfallMm': 'Storm rainfall',
  'runoff.cn': 'Curve number',
  'runoff.hsg': 'Hydrologic soil group',
};

/** An engine failure in the page's words: "Slope must be at most 100 %". */
export function describeFailure(failure: { reason: string; field?: string }): string {
  const m = /^([a-z][\w.]*)(\s.*)$/i.exec(failure.reason);
  if (m && FIELD_LABELS[m[1]]) return `${FIELD_LABELS[m[1]]}${m[2]}`;
  return failure.reason;
}
