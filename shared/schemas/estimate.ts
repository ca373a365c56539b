// POST /api/estimate payload (EstimateInput) and the engine's answer (EstimateResult).
// Shared by the estimate form and the server's validate() middleware; shared/erosion/estimate.ts
// runs it. SI units unless a field says otherwise.
import { z } from 'zod';

/** A number field with a message that names it. */
/** The T an estimate accepts, US t/ac/yr (NSSH part 618 assigns 1–5; a margin either side). */
export const T_TON_PER_AC_YR_RANGE = { min: 0.5, max: 10 } as const;

const num = (field: string, min: number, max: number, unit = '') =>
  z
    .number({ error: `${field} must be a number` })
    .refine(Number.isFinite, `${field} must be a finite number`)
    .pipe(
      z
        .number()
        .min(min, `${field} must be at least ${min}${unit}`)
        .max(max, `${field} must be at most ${max}${unit}`),
    );
const pct = (field: string) => num(field, 0, 100, ' %');
const int = (field: string, min: number, max: number) =>
  z.number({ error: `${field} must be a whole number ${min}–${max}` }).int(`${field} must be a whole number ${min}–${max}`).min(min, `${field} must be a whole number ${min}–${max}`).max(max, `${field} must be a whole number ${min}–${max}`);
const unitsOf = (field: string) => z.enum(['si', 'us'], { error: `${field} must be 'si' or 'us'` });

// ------------------------------------------------------------------ R
export const RInput = z.discriminatedUnion(
  'from',
  [
    z.object({ from: z.literal('value'), value: num('r.value', 0, 100000), units: unitsOf('r.units').default('si') }),
    z.object({ from: z.literal('precipitation'), annualPrecipitationMm: num('r.annualPrecipitationMm', 0, 12000, ' mm') }),
  ],
  { error: "r.from must be 'value' or 'precipitation'" },
);

// ------------------------------------------------------------------ K
export const FeelClass = z.enum(['very gritty', 'very smooth', 'neither'], { error: "k.feel must be 'very gritty', 'very smooth' or 'neither'" });
export const KInput = z.discriminatedUnion(
  'from',
  [
    /** K typed in; US units by default (0.1–0.7), SI on request. */
    z.object({ from: z.literal('value'), value: num('k.value', 0, 1), units: unitsOf('k.units').default('us') }),
    z
      .object({
        from: z.literal('nomograph'),
        siltVfsPct: pct('k.siltVfsPct'),
        sandPct: pct('k.sandPct'),
        organicMatterPct: pct('k.organicMatterPct'),
        structure: int('k.structure', 1, 4),
        /** Permeability class 1–6, or give ksatMmPerH. */
        permeability: int('k.permeability', 1, 6).optional(),
        ksatMmPerH: num('k.ksatMmPerH', 0, 10000, ' mm/h').optional(),
      })
      .refine((k) => k.permeability !== undefined || k.ksatMmPerH !== undefined, {
        message: 'k.permeability (class 1–6) or k.ksatMmPerH is required',
        path: ['permeability'],
      })
      .refine((k) => k.siltVfsPct + k.sandPct <= 100, { message: 'k.siltVfsPct + k.sandPct must not exceed 100 %', path: ['sandPct'] }),
    z.object({
      from: z.literal('texture'),
      sandPct: pct('k.sandPct'),
      siltPct: pct('k.siltPct'),
      clayPct: pct('k.clayPct'),
      organicMatterPct: pct('k.organicMatterPct'),
      method: z.enum(['williams', 'table'], { error: "k.method must be 'williams' or 'table'" }).default('williams'),
    }),
    z.object({
      from: z.literal('feel'),
      balls: z.boolean({ error: 'k.balls must be true or false' }),
      ribbonCm: num('k.ribbonCm', 0, 30, ' cm').optional(),
      feel: FeelClass.optional(),
      organicMatterPct: pct('k.organicMatterPct'),
    }),
  ],
  { error: "k.from must be 'value', 'nomograph', 'texture' or 'feel'" },
);

// ------------------------------------------------------------------ C
export const Crop = z.enum(['corn', 'soybean', 'small grain', 'hay or meadow', 'pasture'], {
  error: "c.crop must be one of: corn, soybean, small grain, hay or meadow, pasture",
});
export const Tillage = z.enum(['moldboard plough', 'chisel or mulch-till', 'no-till'], {
  error: "c.tillage must be one of: moldboard plough, chisel or mulch-till, no-till",
});
export const SubfactorPeriodInput = z.object({
  label: z.string().max(80).optional(),
  months: z.array(int('c.periods.months', 1, 12)).min(1, 'c.periods.months needs at least one month'),
  slr: num('c.periods.slr', 0, 2).optional(),
  cc: num('c.periods.cc', 0, 1).optional(),
  sc: num('c.periods.sc', 0, 1).optional(),
  sr: num('c.periods.sr', 0, 2).optional(),
  plu: num('c.periods.plu', 0, 2).optional(),
  sm: num('c.periods.sm', 0, 2).optional(),
});
export const CInput = z.discriminatedUnion(
  'from',
  [
    z.object({ from: z.literal('value'), value: num('c.value', 0, 1) }),
    z.object({
      from: z.literal('table'),
      crop: Crop,
      tillage: Tillage.optional(),
      residuePct: pct('c.residuePct').optional(),
      coverCrop: z.boolean({ error: 'c.coverCrop must be true or false' }).default(false),
      groundCoverPct: pct('c.groundCoverPct').optional(),
    }),
    z.object({
      from: z.literal('subfactors'),
      periods: z.array(SubfactorPeriodInput).min(1, 'c.periods needs at least one period'),
      /** 12 monthly EI shares (%); the default distribution when omitted. */
      monthlyEiSharePct: z.array(num('c.monthlyEiSharePct', 0, 100)).length(12, 'c.monthlyEiSharePct needs 12 monthly values').optional(),
    }),
  ],
  { error: "c.from must be 'value', 'table' or 'subfactors'" },
);

// ------------------------------------------------------------------ P
export const Practice = z.enum(['none', 'contouring', 'strip cropping', 'terraces'], {
  error: 'p.practice must be one of: none, contouring, strip cropping, terraces',
});
/** The rotation in contour strips: the columns of AH-537 table 14. */
export const StripRotation = z.enum(['A', 'B', 'C'], { error: "p.stripRotation must be 'A', 'B' or 'C'" });
export const PInput = z.discriminatedUnion(
  'from',
  [
    z.object({ from: z.literal('value'), value: num('p.value', 0, 1) }),
    z
      .object({
        from: z.literal('practice'),
        practice: Practice,
        terraceIntervalM: num('p.terraceIntervalM', 1, 1000, ' m').optional(),
        /** Strip cropping: the rotation column of AH-537 table 14 (A, B or C); required there. */
        stripRotation: StripRotation.optional(),
        /** Strip cropping: width of each strip, m; checked against the table's widest strip. */
        stripWidthM: num('p.stripWidthM', 1, 500, ' m').optional(),
      })
      .refine((p) => p.practice !== 'strip cropping' || p.stripRotation !== undefined, {
        message: 'p.stripRotation is required with strip cropping (A, B or C: the rotation in the strips)',
        path: ['stripRotation'],
      }),
  ],
  { error: "p.from must be 'value' or 'practice'" },
);

// ------------------------------------------------------------------ runoff
export const HydrologicSoilGroup = z.enum(['A', 'B', 'C', 'D', 'A/D', 'B/D', 'C/D'], {
  error: 'runoff.hsg must be one of A, B, C, D, A/D, B/D, C/D',
});
export const RunoffInput = z
  .object({
    /** Design storm rainfall depth, mm. */
    rainfallMm: num('runoff.rainfallMm', 0, 2000, ' mm'),
    /** CN typed in; otherwise looked up from cover/treatment/condition/hsg. */
    cn: num('runoff.cn', 1, 100).optional(),
    /** Omit to take it from the texture (when K came from texture or feel). */
    hsg: HydrologicSoilGroup.optional(),
    cover: z.string().min(1, 'runoff.cover must not be empty').optional(),
    treatment: z.string().min(1).nullable().optional(),
    condition: z.enum(['poor', 'fair', 'good'], { error: "runoff.condition must be 'poor', 'fair' or 'good'" }).nullable().optional(),
    drained: z.boolean({ error: 'runoff.drained must be true or false' }).default(false),
    /** How deep the drainage keeps the seasonal high water table, cm; a dual group takes its first letter only from 60 cm (NEH 630 ch. 7). */
    drainedWaterTableDepthCm: num('runoff.drainedWaterTableDepthCm', 0, 500, ' cm').optional(),
    antecedent: z.enum(['I', 'II', 'III'], { error: "runoff.antecedent must be 'I', 'II' or 'III'" }).default('II'),
  })
  .refine((r) => r.cn !== undefined || r.cover !== undefined, { message: 'runoff.cn or runoff.cover is required', path: ['cover'] });

// ------------------------------------------------------------------ the whole estimate
export const EstimateInput = z.object({
  r: RInput,
  k: KInput,
  slopePct: num('slopePct', 0, 100, ' %'),
  slopeLengthM: num('slopeLengthM', 0.1, 2000, ' m'),
  rillRatio: z.enum(['low', 'moderate', 'high'], { error: "rillRatio must be 'low', 'moderate' or 'high'" }).default('moderate'),
  lsMethod: z.enum(['rusle', 'usle'], { error: "lsMethod must be 'rusle' or 'usle'" }).default('rusle'),
  c: CInput,
  p: PInput.default({ from: 'practice', practice: 'none' }),
  /** Soil-loss tolerance T, t/ac/yr (1–5); 5 when omitted. */
  tTonPerAcYr: num('tTonPerAcYr', T_TON_PER_AC_YR_RANGE.min, T_TON_PER_AC_YR_RANGE.max, ' t/ac/yr').optional(),
  /** Field area, ha: gives tonnes per year and runoff volume. */
  areaHa: num('areaHa', 0, 100000, ' ha').optional(),
  runoff: RunoffInput.optional(),
  /** LS worked out elsewhere (a field's elevation model); replaces the one-slope LS. */
  lsFromGrid: z
    .object({ value: num('lsFromGrid.value', 0, 100), source: z.string().min(1).max(300), method: z.string().min(1).max(300) })
    .optional(),
});
/** What a form sends (defaults may be left out). */
export type EstimateInput = z.input<typeof EstimateInput>;
/** After parsing (defaults filled). */
export type EstimateInputParsed = z.output<typeof EstimateInput>;

// ------------------------------------------------------------------ the answer

/** Where a figure came from. flag: 'memory' recalled, not re-read; 'practice' rule of thumb. */
export type Provenance = {
  value: number;
  unit: string;
  source: string;
  method: string;
  flag?: 'memory' | 'practice';
  /** The same figure in US customary units, where they differ. */
  us?: { value: number; unit: string };
  /** Set when a person typed this figure for the field in place of the worked-out one. */
  override?: { note: string; by: string | null };
};

export type EstimateSuccess = {
  ok: true;
  factors: {
    r: Provenance;
    k: Provenance;
    l: Provenance;
    s: Provenance;
    ls: Provenance;
    c: Provenance;
    p: Provenance;
    t: Provenance;
  };
  soilLoss: { tPerHaYr: number; tonPerAcYr: number; tonnesPerYr?: number };
  /** A/T; above 1 the soil goes faster than it is tolerated. */
  aOverT: number;
  textureClass?: string;
  practice?: { practice: string; effective: boolean; effectiveSlopeLengthM: number; notes: string[] };
  runoff?: {
    rainfallMm: number;
    runoffMm: number;
    runoffIn: number;
    cn: Provenance;
    hsg?: string;
    volumeM3?: number;
  };
  cautions: string[];
  warnings: string[];
};
export type EstimateFailure = { ok: false; reason: string; field?: string };
export type EstimateResult = EstimateSuccess | EstimateFailure;
