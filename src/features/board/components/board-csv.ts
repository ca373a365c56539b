// The board as the screen shows it, as CSV: the rows in rank order, areas in the user's units,
// soil loss and runoff in the units the board shows, the risk class in words. Formula-like text
// is neutralised by csvText.
import { csvText, type CsvColumn } from '../../../../shared/exports/csv';
import { haToAc, mmToIn, tPerHaToTonPerAc, tToShortTon } from '../../../../shared/erosion/units';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';

const round = (x: number | null, digits: number) => (x === null ? null : Number(x.toFixed(digits)));

export function boardCsv(rows: BoardRow[], units: Units, lossUnits: Units, showFarm: boolean): string {
  const us = lossUnits === 'ac';
  const columns: CsvColumn<BoardRow & { rank: number }>[] = [
    { header: 'rank', value: (r) => r.rank },
    ...(showFarm ? [{ header: 'farm', value: (r: BoardRow) => r.farmName ?? null }] : []),
    { header: 'field', value: (r) => r.name },
    { header: units === 'ac' ? 'area_ac' : 'area_ha', value: (r) => round(units === 'ac' ? haToAc(r.areaHa) : r.areaHa, 2) },
    { header: us ? 'soil_loss_us_t_per_ac_yr' : 'soil_loss_t_per_ha_yr', value: (r) => round(r.soilLossTPerHaYr === null ? null : us ? tPerHaToTonPerAc(r.soilLossTPerHaYr) : r.soilLossTPerHaYr, 3) },
    { header: us ? 'tolerance_us_t_per_ac_yr' : 'tolerance_t_per_ha_yr', value: (r) => round(r.toleranceTPerHaYr === null ? null : us ? tPerHaToTonPerAc(r.toleranceTPerHaYr) : r.toleranceTPerHaYr, 3) },
    { header: 'a_over_t', value: (r) => round(r.aOverT, 3) },
    { header: us ? 'soil_loss_us_tons_per_yr' : 'soil_loss_t_per_yr', value: (r) => round(r.tonnesPerYr === null ? null : us ? tToShortTon(r.tonnesPerYr) : r.tonnesPerYr, 1) },
    { header: us ? 'runoff_in' : 'runoff_mm', value: (r) => round(r.runoffMm === null ? null : us ? mmToIn(r.runoffMm) : r.runoffMm, us ? 2 : 1) },
    { header: 'risk_class', value: (r) => r.riskClass?.label ?? 'not assessed yet' },
    { header: 'problem_clay', value: (r) => r.problemClay },
    { header: 'why', value: (r) => r.reasons.join('; ') || null },
    { header: 'missing', value: (r) => r.gaps.map((g) => g.message).join(' ') || null },
  ];
  return csvText(columns, rows.map((r, i) => ({ ...r, rank: i + 1 })));
}
