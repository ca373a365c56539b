// The columns of a farm's export, the same in every format: a readable name for GeoJSON
// properties and CSV headers, and a name of at most 10 characters for the shapefile's .dbf (the
// dBase III field-name limit). Units are in the names; areas in hectares and acres both.
import { haToAc, tPerHaToTonPerAc } from '../../../shared/erosion/units';
import type { CsvCell } from '../../../shared/exports/csv';
import { actionSummary } from '../../../shared/exports/action-words';
import type { ExportField } from './export-records';

export type ExportColumn = { key: string; dbf: string; value: (f: ExportField, season: string) => CsvCell };

const round = (x: number | null | undefined, digits: number) => (x == null || !Number.isFinite(x) ? null : Number(x.toFixed(digits)));
const cost = (f: ExportField) => (f.actions.some((a) => a.cost != null) ? round(f.actions.reduce((s, a) => s + (a.cost ?? 0), 0), 2) : null);

export const EXPORT_COLUMNS: readonly ExportColumn[] = [
  { key: 'field_id', dbf: 'field_id', value: (f) => f.fieldId },
  { key: 'name', dbf: 'name', value: (f) => f.name },
  { key: 'season', dbf: 'season', value: (_f, season) => season },
  { key: 'area_ha', dbf: 'area_ha', value: (f) => round(f.areaHa, 4) },
  { key: 'area_ac', dbf: 'area_ac', value: (f) => round(haToAc(f.areaHa), 4) },
  { key: 'soil_loss_t_per_ha_yr', dbf: 'a_t_ha_yr', value: (f) => round(f.figures?.soilLossTPerHaYr, 3) },
  { key: 'soil_loss_us_t_per_ac_yr', dbf: 'a_tn_ac_yr', value: (f) => (f.figures?.soilLossTPerHaYr == null ? null : round(tPerHaToTonPerAc(f.figures.soilLossTPerHaYr), 3)) },
  { key: 'tolerance_t_per_ha_yr', dbf: 't_t_ha_yr', value: (f) => round(f.figures?.toleranceTPerHaYr, 3) },
  { key: 'a_over_t', dbf: 'a_over_t', value: (f) => round(f.figures?.aOverT, 3) },
  { key: 'soil_loss_t_per_yr', dbf: 'loss_t_yr', value: (f) => round(f.figures?.tonnesPerYr, 2) },
  { key: 'runoff_mm', dbf: 'runoff_mm', value: (f) => round(f.figures?.runoffMm, 1) },
  { key: 'risk_class', dbf: 'risk', value: (f) => f.figures?.riskClass?.label ?? null },
  { key: 'not_assessed_because', dbf: 'missing', value: (f) => (f.figures?.gaps.length ? f.figures.gaps.map((g) => g.message).join(' ') : null) },
  { key: 'planned_actions', dbf: 'actions', value: (f) => (f.actions.length ? f.actions.map(actionSummary).join('; ') : null) },
  { key: 'planned_cost', dbf: 'cost', value: cost },
];

/** The field's values by column key (GeoJSON properties) or by .dbf name (the shapefile). */
export function exportProperties(f: ExportField, season: string, by: 'key' | 'dbf'): Record<string, CsvCell> {
  return Object.fromEntries(EXPORT_COLUMNS.map((c) => [c[by], c.value(f, season)]));
}
