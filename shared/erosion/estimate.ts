// One whole estimate: R, K, LS, C, P and T to A and A/T, plus curve-number runoff, each factor
// with its provenance. Pure: validates with the shared schema, returns values, never throws for
// bad input.
import {
  EstimateInput,
  type EstimateFailure,
  type EstimateInputParsed,
  type EstimateResult,
  type Provenance,
} from '../schemas/estimate';
import { annualCFromSubfactors, coverFromTable, DEFAULT_EI_DISTRIBUTION, type Flag } from './cover';
import { R_FROM_PRECIPITATION_NOTE, rFromAnnualPrecipitationChecked } from './erosivity';
import { kFactorWilliams, kFromTextureTable, organicCarbonFromOm, permeabilityClassFromKsat, tryKFactorNomograph, type PermeabilityCode, type StructureCode } from './k-factor';
import { ADEQUATELY_DRAINED_MIN_DEPTH_CM, antecedentCurveNumber, curveNumberFromTable, curveNumberRunoff, runoffVolumeM3 } from './runoff';
import { tryRusleLS, usleLS, type LsResult } from './slope-length';
import { soilGroupFromTexture } from './soil-group';
import { soilLoss, soilLossTonnesPerYr } from './soil-loss';
import { supportPractice } from './support-practice';
import { textureByFeel, tryClassifyTexture, type TextureClass } from './texture';
import { soilLossTolerance } from './tolerance';
import { kSiToUs, kUsToSi, mmToIn, rSiToUs, rUsToSi, tPerHaToTonPerAc } from './units';

export const R_UNIT = 'MJ·mm/(ha·h·yr)';
export const R_UNIT_US = 'hundreds ft·tonf·in/(ac·h·yr)';
export const K_UNIT = 't·ha·h/(ha·MJ·mm)';
export const K_UNIT_US = 'ton·ac·h/(hundreds ac·ft·tonf·in)';

export const CAUTION_SHEET_AND_RILL = 'RUSLE estimates sheet and rill loss only, not gullies or deposition.';
export const CAUTION_PLANNING_AID = 'These figures are planning aids, not designs.';
export const CAUTION_TERRACES = 'Terraces need a design to local standards by a qualified person; check for buried utilities before any earthwork.';
export const CAUTION_RUNOFF = 'Curve-number runoff is for one design storm on the whole area; it is not a drainage or waterway design.';

const flagOf = (f: Flag | undefined): Provenance['flag'] => (f === 'memory' || f === 'practice' ? f : undefined);
const failAt = (field: string, reason: string): EstimateFailure => ({ ok: false, reason, field });

function prov(value: number, unit: string, source: string, method: string, flag?: Flag, us?: { value: number; unit: string }): Provenance {
  const p: Provenance = { value, unit, source, method };
  const f = flagOf(flag);
  if (f) p.flag = f;
  if (us) p.us = us;
  return p;
}

/**
 * Runs a whole estimate from the fields of shared/schemas/estimate.ts. Input is validated
 * here too; any expected failure comes back as { ok:false, reason, field }.
 */
export function estimate(input: EstimateInput | unknown): EstimateResult {
  const parsed = EstimateInput.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return failAt(issue.path.join('.') || '(body)', issue.message);
  }
  return run(parsed.data as EstimateInputParsed);
}

function run(inp: EstimateInputParsed): EstimateResult {
  const warnings: string[] = [];
  const cautions: string[] = [CAUTION_SHEET_AND_RILL, CAUTION_PLANNING_AID];
  let textureClass: TextureClass | undefined;

  // ---- R
  let r: Provenance;
  if (inp.r.from === 'value') {
    const si = inp.r.units === 'us' ? rUsToSi(inp.r.value) : inp.r.value;
    r = prov(si, R_UNIT, 'typed in', `R typed in ${inp.r.units === 'us' ? 'US' : 'SI'} units`, undefined, { value: rSiToUs(si), unit: R_UNIT_US });
  } else {
    const checked = rFromAnnualPrecipitationChecked(inp.r.annualPrecipitationMm);
    const si = checked.r;
    const range = checked.withinFittedRange ? '' : ' (outside the range the fit was made from)';
    r = prov(si, R_UNIT, 'Renard & Freimund 1994, J. Hydrol. 157:287', `from mean annual precipitation ${inp.r.annualPrecipitationMm} mm${range}`, 'memory', { value: rSiToUs(si), unit: R_UNIT_US });
    warnings.push(checked.warning ?? R_FROM_PRECIPITATION_NOTE);
  }

  // ---- K
  let k: Provenance;
  const kin = inp.k;
  if (kin.from === 'value') {
    const si = kin.units === 'us' ? kUsToSi(kin.value) : kin.value;
    k = prov(si, K_UNIT, 'typed in', `K typed in ${kin.units === 'us' ? 'US' : 'SI'} units`, undefined, { value: kSiToUs(si), unit: K_UNIT_US });
  } else if (kin.from === 'nomograph') {
    const permeability = (kin.permeability ?? permeabilityClassFromKsat(kin.ksatMmPerH as number)) as PermeabilityCode;
    const res = tryKFactorNomograph({ siltVfsPct: kin.siltVfsPct, sandPct: kin.sandPct, organicMatterPct: kin.organicMatterPct, structure: kin.structure as StructureCode, permeability });
    if (!res.ok) return failAt('k', res.reason);
    warnings.push(...res.value.warnings);
    k = prov(res.value.si, K_UNIT, 'AH-537 nomograph; AH-703 eq. 3-1', `nomograph equation, structure ${kin.structure}, permeability class ${permeability}${kin.permeability === undefined ? ` (from Ksat ${kin.ksatMmPerH} mm/h)` : ''}`, kin.organicMatterPct > 4 ? 'memory' : undefined, { value: res.value.us, unit: K_UNIT_US });
  } else if (kin.from === 'texture') {
    const tex = tryClassifyTexture({ sand: kin.sandPct, silt: kin.siltPct, clay: kin.clayPct });
    if (!tex.ok) return failAt('k', tex.reason);
    textureClass = tex.value.textureClass;
    const n = tex.value.normalised;
    if (kin.method === 'williams') {
      const kv = kFactorWilliams({ sandPct: n.sand, siltPct: n.silt, clayPct: n.clay, organicCarbonPct: organicCarbonFromOm(kin.organicMatterPct) });
      k = prov(kv.si, K_UNIT, 'Sharpley & Williams 1990 (EPIC), eq. 2.96', `Williams equation, ${textureClass}, organic carbon = OM/1.724`, undefined, { value: kv.us, unit: K_UNIT_US });
    } else {
      const kv = kFromTextureTable(textureClass, kin.organicMatterPct);
      if (!kv.ok) return failAt('k', kv.reason);
      if (kv.value.note) warnings.push(kv.value.note);
      k = prov(kv.value.si, K_UNIT, kv.value.source, `table by texture (${textureClass}) and OM ${kin.organicMatterPct} %`, kv.value.flag as Flag, { value: kv.value.us, unit: K_UNIT_US });
    }
  } else {
    const feel = textureByFeel({ balls: kin.balls, ribbonCm: kin.ribbonCm, feel: kin.feel });
    if (!feel.ok) return failAt('k', feel.reason);
    textureClass = feel.value.textureClass;
    const kv = kFromTextureTable(textureClass, kin.organicMatterPct);
    if (!kv.ok) return failAt('k', kv.reason);
    if (kv.value.note) warnings.push(kv.value.note);
    k = prov(kv.value.si, K_UNIT, `${kv.value.source}; texture by feel (Thien 1979)`, `feel test → ${textureClass}, table by texture and OM ${kin.organicMatterPct} %`, kv.value.flag as Flag, { value: kv.value.us, unit: K_UNIT_US });
    warnings.push('K from a feel test is approximate: a lab texture and organic matter give a better K');
  }

  // ---- P first: terraces change the slope length LS uses
  let p: Provenance;
  let lengthForLsM = inp.slopeLengthM;
  let practice: { practice: string; effective: boolean; effectiveSlopeLengthM: number; notes: string[] } | undefined;
  if (inp.p.from === 'value') {
    p = prov(inp.p.value, '', 'typed in', 'P typed in');
  } else {
    const sp = supportPractice({
      practice: inp.p.practice,
      slopePct: inp.slopePct,
      slopeLengthM: inp.slopeLengthM,
      terraceIntervalM: inp.p.terraceIntervalM,
      stripRotation: inp.p.stripRotation,
      stripWidthM: inp.p.stripWidthM,
    });
    if (!sp.ok) return failAt('p', sp.reason);
    const v = sp.value;
    lengthForLsM = v.effectiveSlopeLengthM;
    practice = { practice: v.practice, effective: v.effective, effectiveSlopeLengthM: v.effectiveSlopeLengthM, notes: v.notes };
    p = prov(v.p, '', v.source, v.practice === 'none' ? 'no support practice' : `${v.practice}${inp.p.stripRotation && v.practice === 'strip cropping' ? `, rotation ${inp.p.stripRotation}` : ''}${v.effective ? '' : ' (no effect here)'}`, v.flag);
    if (!v.effective) warnings.push(...v.notes.filter((n) => n.includes('loses its effect')));
    if (v.stripWidthWarning) warnings.push(v.stripWidthWarning);
    if (v.practice === 'terraces') cautions.push(CAUTION_TERRACES);
  }

  // ---- LS
  let ls: LsResult;
  let lsSource: string;
  if (inp.lsMethod === 'usle') {
    ls = usleLS({ slopePct: inp.slopePct, lengthM: lengthForLsM });
    lsSource = 'AH-537 eq. 4 (USLE)';
  } else {
    const res = tryRusleLS({ slopePct: inp.slopePct, lengthM: lengthForLsM, rillRatio: inp.rillRatio });
    if (!res.ok) return failAt('slopeLengthM', res.reason);
    ls = res.value;
    lsSource = 'AH-703 ch. 4 (McCool et al. 1987, 1989)';
  }
  if (inp.slopePct > 60) warnings.push(`slope ${inp.slopePct} % is beyond the steepness RUSLE was fitted to (about 60 %)`);
  const lsMethod = `${inp.lsMethod === 'usle' ? 'USLE' : `RUSLE, ${inp.rillRatio} rill/interrill ratio`}, ${round(inp.slopePct, 2)} %, ${round(lengthForLsM, 1)} m, m = ${round(ls.m, 3)}`;
  const l = prov(ls.l, '', lsSource, lsMethod);
  const s = prov(ls.s, '', lsSource, lsMethod);
  let lsP = prov(ls.ls, '', lsSource, lsMethod);
  const terraced = practice?.practice === 'terraces' && practice.effective;
  if (inp.lsFromGrid && terraced) {
    // Terraces cut every flow path at each terrace (AH-537: slope length = terrace interval),
    // which the elevation model's uninterrupted paths do not know.
    warnings.push("Terraces cut the slope at each terrace: LS is taken on the terrace interval at the mean slope, not from the elevation model.");
  } else if (inp.lsFromGrid) {
    // A field's LS from its elevation model (mean of the per-cell Desmet–Govers L × RUSLE S)
    // replaces the one-slope LS; L and S above stay as the mean-slope figures for reference.
    lsP = prov(inp.lsFromGrid.value, '', inp.lsFromGrid.source, inp.lsFromGrid.method);
    ls = { ...ls, ls: inp.lsFromGrid.value };
    warnings.push('L and S are shown for the mean slope; the soil loss uses the LS of the elevation model.');
  }

  // ---- C
  let c: Provenance;
  if (inp.c.from === 'value') {
    c = prov(inp.c.value, '', 'typed in', 'C typed in');
  } else if (inp.c.from === 'table') {
    const res = coverFromTable({ crop: inp.c.crop, tillage: inp.c.tillage, residuePct: inp.c.residuePct, coverCrop: inp.c.coverCrop, groundCoverPct: inp.c.groundCoverPct });
    if (!res.ok) return failAt('c', res.reason);
    c = prov(res.value.c, '', res.value.source, res.value.method, res.value.flag);
    if (res.value.flag !== 'pub') warnings.push('C from a typical-value table: override it with a local value when you have one');
  } else {
    const dist = inp.c.monthlyEiSharePct ? { monthlySharePct: inp.c.monthlyEiSharePct, source: 'typed in', flag: 'pub' as Flag } : DEFAULT_EI_DISTRIBUTION;
    const res = annualCFromSubfactors(inp.c.periods, dist);
    if (!res.ok) return failAt('c', res.reason);
    warnings.push(...res.value.warnings);
    c = prov(res.value.c, '', 'AH-703 ch. 5 subfactor method', `EI-weighted soil-loss ratios of ${inp.c.periods.length} periods (${inp.c.monthlyEiSharePct ? 'given' : 'default'} EI distribution)`, inp.c.monthlyEiSharePct ? undefined : DEFAULT_EI_DISTRIBUTION.flag);
  }

  // ---- T
  const tol = soilLossTolerance(inp.tTonPerAcYr !== undefined ? { surveyTTonPerAcYr: inp.tTonPerAcYr } : {});
  const t = prov(tol.tPerHaYr, 't/ha/yr', inp.tTonPerAcYr !== undefined ? 'typed in (soil survey T, NSSH part 618)' : tol.source, tol.method, tol.flag, { value: tol.tonPerAcYr, unit: 't/ac/yr' });

  // ---- A
  const a = soilLoss({ r: r.value, k: k.value, ls: ls.ls, c: c.value, p: p.value });
  const soil = { tPerHaYr: a, tonPerAcYr: tPerHaToTonPerAc(a), ...(inp.areaHa !== undefined ? { tonnesPerYr: soilLossTonnesPerYr(a, inp.areaHa) } : {}) };

  // ---- runoff
  let runoff: Extract<EstimateResult, { ok: true }>['runoff'];
  if (inp.runoff) {
    const ro = inp.runoff;
    let cnP: Provenance;
    let hsg: string | undefined = ro.hsg;
    if (ro.cn !== undefined) {
      cnP = prov(ro.cn, '', 'typed in', 'curve number typed in');
    } else {
      let hsgFlag: Flag | undefined;
      if (!hsg) {
        if (!textureClass) return failAt('runoff.hsg', 'runoff.hsg is required (or give K from texture or a feel test so a default group can be taken)');
        const g = soilGroupFromTexture(textureClass);
        hsg = g.hsg;
        hsgFlag = g.flag;
        warnings.push(`hydrologic soil group ${g.hsg} taken from the texture (${textureClass}) by a rule of thumb; the soil survey's group wins`);
      }
      const res = curveNumberFromTable({
        cover: ro.cover as string,
        treatment: ro.treatment ?? null,
        condition: ro.condition ?? null,
        hsg: hsg as never,
        drained: ro.drained,
        drainedWaterTableDepthCm: ro.drainedWaterTableDepthCm,
      });
      if (!res.ok) return failAt('runoff', res.reason);
      const row = res.value.row;
      const desc = [row.cover, row.treatment, row.condition ? `${row.condition} condition` : null].filter(Boolean).join(', ');
      const dual = hsg.includes('/');
      if (dual && ro.drained && res.value.group === 'D') warnings.push(drainedAsDWarning(hsg, ro.drainedWaterTableDepthCm));
      cnP = prov(res.value.cn, '', res.value.source, `${desc}, group ${res.value.group}${dual ? ` (dual ${hsg}, ${dualWords(ro.drained, ro.drainedWaterTableDepthCm)})` : ''}`, hsgFlag ?? res.value.flag);
    }
    if (ro.antecedent !== 'II') {
      const adj = antecedentCurveNumber(cnP.value, ro.antecedent);
      cnP = { ...cnP, value: adj, method: `${cnP.method}; antecedent condition ${ro.antecedent} (Hawkins et al. 1985)` };
    }
    const q = curveNumberRunoff({ rainfallMm: ro.rainfallMm, cn: cnP.value });
    runoff = {
      rainfallMm: ro.rainfallMm,
      runoffMm: q,
      runoffIn: mmToIn(q),
      cn: cnP,
      ...(hsg ? { hsg } : {}),
      ...(inp.areaHa !== undefined ? { volumeM3: runoffVolumeM3(q, inp.areaHa) } : {}),
    };
    cautions.push(CAUTION_RUNOFF);
  }

  return {
    ok: true,
    factors: { r, k, l, s, ls: lsP, c, p, t },
    soilLoss: soil,
    aOverT: a / tol.tPerHaYr,
    ...(textureClass ? { textureClass } : {}),
    ...(practice ? { practice } : {}),
    ...(runoff ? { runoff } : {}),
    cautions,
    warnings,
  };
}

/** Why a drained soil of a dual group still takes D (NEH 630 ch. 7). */
function drainedAsDWarning(hsg: string, depthCm: number | undefined): string {
  const why =
    depthCm === undefined
      ? 'the depth the drainage keeps the water table at is not given'
      : `the drainage keeps the water table at ${depthCm} cm, shallower than ${ADEQUATELY_DRAINED_MIN_DEPTH_CM} cm`;
  return `group ${hsg} taken as D although the field is drained: ${why}. NEH 630 ch. 7 gives the first letter only when drainage keeps the seasonal high water table at least ${ADEQUATELY_DRAINED_MIN_DEPTH_CM} cm down.`;
}

function dualWords(drained: boolean, depthCm: number | undefined): string {
  if (!drained) return 'undrained';
  return depthCm === undefined ? 'drained, water-table depth not given' : `drained, water table kept at ${depthCm} cm`;
}

const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;
