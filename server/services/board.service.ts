// The priority board: every field of a farm (or of an advisor's client farms) for a season,
// ranked by A/T (NSSH part 618: rank by A/T), then by tonnes lost; fields that cannot be
// assessed yet come last with what they lack.
import type { Sequelize } from 'sequelize';
import type { Board, BoardRow, FieldAssessment } from '../../shared/schemas/assessment';
import type { FieldFeature } from '../../shared/schemas/field';
import { listFieldFeatures } from './fields.service';
import { assessField } from './assessment.service';

function reasonsFor(a: FieldAssessment): string[] {
  const out: string[] = [];
  const e = a.estimate;
  if (e) {
    // Rules of thumb for the words beside a rank (common practice, no single source).
    if (e.factors.ls.value >= 1.5) out.push(`steep or long slope (LS ${e.factors.ls.value.toFixed(1)})`);
    if (e.factors.c.value >= 0.2) out.push(`little cover (C ${e.factors.c.value.toFixed(2)})`);
    if (e.factors.k.us && e.factors.k.us.value >= 0.4) out.push(`erodible soil (K ${e.factors.k.us.value.toFixed(2)} US)`);
    // Half or more of the design storm running off (common practice, no single source).
    const storm = e.runoff?.rainfallMm;
    if (a.runoffMm != null && storm && a.runoffMm >= 0.5 * storm) out.push(`much runoff (${a.runoffMm.toFixed(0)} of ${storm.toFixed(0)} mm in the design storm)`);
  }
  if (a.concentratedFlowCells) out.push(`water gathers in ${a.concentratedFlowCells} cells: a grassed waterway candidate`);
  if (a.problemClay) out.push(...a.problemClayReasons);
  return out;
}

export function toRow(a: FieldAssessment, farmName?: string): BoardRow {
  return {
    fieldId: a.fieldId,
    farmId: a.farmId,
    ...(farmName ? { farmName } : {}),
    name: a.name,
    areaHa: a.areaHa,
    soilLossTPerHaYr: a.soilLossTPerHaYr,
    toleranceTPerHaYr: a.toleranceTPerHaYr,
    aOverT: a.aOverT,
    tonnesPerYr: a.tonnesPerYr,
    runoffMm: a.runoffMm,
    riskClass: a.riskClass,
    problemClay: a.problemClay,
    gaps: a.gaps,
    reasons: reasonsFor(a),
  };
}

export function rankRows(rows: BoardRow[]): BoardRow[] {
  return [...rows].sort((x, y) => {
    if (x.aOverT == null || y.aOverT == null) return x.aOverT == null ? (y.aOverT == null ? x.name.localeCompare(y.name) : 1) : -1;
    return y.aOverT - x.aOverT || (y.tonnesPerYr ?? 0) - (x.tonnesPerYr ?? 0);
  });
}

export async function farmBoard(
  sequelize: Sequelize,
  farm: { id: number; name?: string },
  season: { id: number; label: string },
  only?: { ownerMembershipId: number },
): Promise<Board> {
  const fields: FieldFeature[] = await listFieldFeatures(sequelize, { farmId: farm.id, ...(only ? { ownerMembershipId: only.ownerMembershipId } : {}) });
  const rows: BoardRow[] = [];
  for (const f of fields) rows.push(toRow(await assessField(sequelize, f, season), farm.name));
  return { season: season.label, rows: rankRows(rows) };
}
