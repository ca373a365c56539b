// Gathered inputs → the engine's EstimateInput, every input said in words with its typed
// origin, and each missing input as a typed gap naming where it is filled. Pure.
import { curveNumberCover, rFromAnnualPrecipitationChecked, STRIP_ROTATION_WORDS } from '../../../shared/erosion';
import type { EstimateInput } from '../../../shared/schemas/estimate';
import type { AssessmentInput, Gap } from '../../../shared/schemas/assessment';
import { OVERRIDE_SPECS, type FactorOverride } from '../../../shared/schemas/overrides';
import type { Origin } from '../../../shared/schemas/provenance';
import type { GatheredInputs } from './gathered-inputs';
import { formatCount } from '../../../shared/format/quantities';

/** Slope length assumed for the support-practice limit when only a DEM gives the slope (common practice, no single source). */
const ASSUMED_SLOPE_LENGTH_M = 50;

const typed = (typedBy: string | null): Origin => (typedBy ? { kind: 'typed', typedBy } : { kind: 'typed' });
const fmt = (x: number, d = 1) => x.toFixed(d);

/** A factor typed for this field in place of the worked-out one: who typed it, and why. */
const overrideOrigin = (o: FactorOverride): Origin => ({ ...typed(o.setBy), detail: o.note });
const overrideLine = (key: 'r' | 'k' | 'c' | 'p', o: FactorOverride, digits: number): AssessmentInput => ({
  key,
  label: OVERRIDE_SPECS[key].name,
  value: `${fmt(o.value, digits)}${OVERRIDE_SPECS[key].unit ? ` ${OVERRIDE_SPECS[key].unit}` : ''}`,
  origin: overrideOrigin(o),
  note: 'overrides the worked-out figure',
});

type BuiltInput = { input: EstimateInput | null; gaps: Gap[]; lines: AssessmentInput[] };

export function buildEstimateInput(g: GatheredInputs): BuiltInput {
  const gaps: Gap[] = [];
  const lines: AssessmentInput[] = [];

  let r: EstimateInput['r'] | null = null;
  const climate = g.climate;
  const ov = g.overrides;
  if (ov.r) {
    r = { from: 'value', value: ov.r.value, units: 'si' };
    lines.push(overrideLine('r', ov.r, 0));
  } else if (!climate) gaps.push({ key: 'erosivity', tab: 'farm-climate', message: "the farm's rainfall erosivity R (set the farm climate)" });
  else if (climate.rFrom === 'record' && climate.rValue != null) {
    r = { from: 'value', value: climate.rValue, units: 'si' };
    const rec = climate.record;
    lines.push({
      key: 'r',
      label: 'Rainfall erosivity R',
      value: `${fmt(climate.rValue, 0)} MJ·mm/(ha·h·yr)`,
      quantity: { kind: 'erosivity', rSi: climate.rValue },
      origin: { kind: 'derived', source: { title: 'AH-703, ch. 2 (storm EI30 summed)' }, detail: rec ? `from a rainfall record, ${rec.years} yr, ${rec.erosiveStorms} erosive storms` : 'from a rainfall record' },
    });
  } else if (climate.rFrom === 'value' && climate.rValue != null) {
    r = { from: 'value', value: climate.rValue, units: 'si' };
    lines.push({ key: 'r', label: 'Rainfall erosivity R', value: `${fmt(climate.rValue, 0)} MJ·mm/(ha·h·yr)`, quantity: { kind: 'erosivity', rSi: climate.rValue }, origin: typed(climate.typedBy) });
  } else if (climate.annualPrecipitationMm != null) {
    r = { from: 'precipitation', annualPrecipitationMm: climate.annualPrecipitationMm };
    const checked = rFromAnnualPrecipitationChecked(climate.annualPrecipitationMm);
    lines.push({
      key: 'r',
      label: 'Rainfall erosivity R',
      value: `from ${fmt(climate.annualPrecipitationMm, 0)} mm/yr of rain`,
      quantity: { kind: 'annual-rain', mmPerYr: climate.annualPrecipitationMm },
      origin: { kind: 'derived', source: { title: 'Renard & Freimund 1994, J. Hydrol. 157:287' }, detail: `annual precipitation typed${climate.typedBy ? ` by ${climate.typedBy}` : ''}` },
      ...(checked.warning ? { note: checked.warning } : {}),
    });
  }

  let k: EstimateInput['k'] | null = null;
  if (ov.k) {
    k = { from: 'value', value: ov.k.value, units: 'us' };
    lines.push(overrideLine('k', ov.k, 3));
  } else if (g.soil.kUs == null) gaps.push({ key: 'erodibility', tab: 'soil', message: 'soil erodibility K (add a soil check with texture, a feel test, or a soil map with K)' });
  else {
    k = { from: 'value', value: g.soil.kUs, units: 'us' };
    lines.push({ key: 'k', label: 'Soil erodibility K', value: `${fmt(g.soil.kUs, 3)} (US units)`, origin: g.soil.kSource ?? { kind: 'derived' } });
  }

  let slopePct: number | null = null;
  let lsFromGrid: EstimateInput['lsFromGrid'];
  if (g.terrain) {
    slopePct = g.terrain.meanSlopePct;
    lines.push({
      key: 'slope',
      label: 'Mean slope',
      value: `${fmt(slopePct)} %`,
      origin: { kind: 'derived', source: { title: 'Horn 1981 slope of the elevation model' } },
      note: `elevation model, ${formatCount(g.terrain.cellCount)} cells${outdatedNote(g.terrain)}`,
    });
    if (g.terrain.meanLS != null) {
      lsFromGrid = { value: g.terrain.meanLS, source: 'Desmet & Govers 1996 grid L × RUSLE S (McCool et al. 1987), D8 flow', method: `mean of ${formatCount(g.terrain.cellCount)} cells of the elevation model` };
    }
  } else if (g.ground?.slopePct != null) {
    slopePct = g.ground.slopePct;
    lines.push({ key: 'slope', label: 'Slope', value: `${fmt(slopePct)} %`, origin: typed(g.ground.typedBy) });
  } else gaps.push({ key: 'slope', tab: 'ground', message: 'slope (upload an elevation model, or type the slope % on the Ground tab)' });

  let slopeLengthM: number | null = g.ground?.slopeLengthM ?? null;
  if (slopeLengthM != null) {
    lines.push({
      key: 'length',
      label: 'Slope length',
      value: `${fmt(slopeLengthM, 0)} m`,
      quantity: { kind: 'length', m: slopeLengthM },
      origin: typed(g.ground?.typedBy ?? null),
      ...(g.terrain ? { note: "also the longest flow path the elevation model's LS may use on this field" } : {}),
    });
  } else if (g.terrain) {
    slopeLengthM = ASSUMED_SLOPE_LENGTH_M;
    lines.push({
      key: 'length',
      label: 'Slope length',
      value: `${ASSUMED_SLOPE_LENGTH_M} m`,
      quantity: { kind: 'length', m: ASSUMED_SLOPE_LENGTH_M },
      origin: { kind: 'rule-of-thumb' },
      note: 'assumed for the practice limit only; LS comes from the elevation model',
    });
  } else gaps.push({ key: 'slope-length', tab: 'ground', message: 'slope length (type it on the Ground tab)' });

  let c: EstimateInput['c'] | null = null;
  let p: EstimateInput['p'] = { from: 'practice', practice: 'none' };
  const cr = g.cropping;
  if (!cr) gaps.push({ key: 'cropping', tab: 'cropping', message: `cropping for season ${g.season.label}` });
  else {
    c = {
      from: 'table',
      crop: cr.crop,
      ...(cr.tillage ? { tillage: cr.tillage } : {}),
      ...(cr.residuePct != null ? { residuePct: cr.residuePct } : {}),
      coverCrop: !!cr.coverCrop,
      ...(cr.groundCoverPct != null ? { groundCoverPct: cr.groundCoverPct } : {}),
    };
    p = {
      from: 'practice',
      practice: cr.practice,
      ...(cr.terraceIntervalM != null ? { terraceIntervalM: cr.terraceIntervalM } : {}),
      ...(cr.stripRotation != null ? { stripRotation: cr.stripRotation } : {}),
      ...(cr.stripWidthM != null ? { stripWidthM: cr.stripWidthM } : {}),
    };
    const words = [cr.crop, cr.tillage, cr.residuePct != null ? `${cr.residuePct} % residue` : null, cr.coverCrop ? `cover crop: ${cr.coverCrop.species}` : null];
    lines.push({ key: 'crop', label: 'Cropping', value: words.filter(Boolean).join(', '), origin: typed(cr.typedBy) });
    const strips = cr.practice === 'strip cropping' && cr.stripRotation ? `, ${STRIP_ROTATION_WORDS[cr.stripRotation]}${cr.stripWidthM != null ? `, strips ${fmt(cr.stripWidthM, 0)} m wide` : ''}` : '';
    lines.push({ key: 'practice', label: 'Support practice', value: `${cr.practice}${strips}`, origin: typed(cr.typedBy) });
  }
  if (ov.c) {
    c = { from: 'value', value: ov.c.value };
    lines.push(overrideLine('c', ov.c, 3));
  }
  if (ov.p) {
    p = { from: 'value', value: ov.p.value };
    lines.push(overrideLine('p', ov.p, 2));
  }

  const tOrigin = g.soil.tSource ?? { kind: 'default' };
  lines.push({ key: 't', label: 'Soil-loss tolerance T', value: `${g.soil.tTonPerAcYr} t/ac/yr`, ...(g.soil.tTonPerAcYr != null ? { quantity: { kind: 'tolerance' as const, tonPerAcYr: g.soil.tTonPerAcYr } } : {}), origin: tOrigin });

  let runoff: EstimateInput['runoff'];
  if (climate && cr) {
    if (!g.soil.hsg) gaps.push({ key: 'soil-group', tab: 'soil', message: 'hydrologic soil group for runoff (a soil texture or soil map)' });
    else {
      const cn = curveNumberCover({ ...cr, coverCrop: !!cr.coverCrop });
      const ground = g.ground;
      runoff = {
        rainfallMm: climate.designStormMm,
        hsg: g.soil.hsg as NonNullable<EstimateInput['runoff']>['hsg'],
        cover: cn.cover,
        treatment: cn.treatment,
        condition: cn.condition,
        drained: ground?.drained ?? false,
        ...(ground?.drained && ground.drainedWaterTableDepthCm != null ? { drainedWaterTableDepthCm: ground.drainedWaterTableDepthCm } : {}),
      };
      lines.push({ key: 'storm', label: 'Design storm', value: `${fmt(climate.designStormMm, 0)} mm`, quantity: { kind: 'storm', mm: climate.designStormMm }, origin: typed(climate.typedBy) });
      lines.push({ key: 'hsg', label: 'Hydrologic soil group', value: g.soil.hsg, origin: { kind: 'derived', detail: "from the field's soil checks or soil map" } });
      if (ground?.drained) {
        const depth = ground.drainedWaterTableDepthCm;
        lines.push({
          key: 'drainage',
          label: 'Drainage',
          value: depth != null ? `drained, water table kept at ${fmt(depth, 0)} cm` : 'drained, water-table depth not given',
          origin: typed(ground.typedBy),
          ...(g.soil.hsg.includes('/') ? { note: 'a dual soil group takes its first letter only when drainage keeps the water table at least 60 cm down (NEH 630 ch. 7)' } : {}),
        });
      }
    }
  }

  if (!r || !k || slopePct == null || slopeLengthM == null || !c) return { input: null, gaps, lines };
  return {
    input: {
      r,
      k,
      slopePct,
      slopeLengthM,
      c,
      p,
      // The engine's own default T (and its provenance) when nothing better is known.
      ...(g.soil.tTonPerAcYr != null && tOrigin.kind !== 'default' ? { tTonPerAcYr: g.soil.tTonPerAcYr } : {}),
      areaHa: g.field.areaHa,
      ...(runoff ? { runoff } : {}),
      ...(lsFromGrid ? { lsFromGrid } : {}),
    },
    gaps,
    lines,
  };
}

/** Why the elevation model's figures may not match the field's inputs now. */
function outdatedNote(t: { upToDate: boolean; stale: boolean }): string {
  if (t.upToDate) return '';
  return t.stale ? ' (the last terrain run stopped before it finished: run it again)' : ' (boundary changed: being recomputed)';
}
