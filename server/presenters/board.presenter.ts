// The priority board as the API shows it: stored figures with the field's live name and area,
// ranked by A/T (NSSH part 618: rank by A/T), then by tonnes lost; fields that cannot be
// assessed yet come last, by name. Pure.
import type { Board, BoardRow, StoredBoardFigures } from '../../shared/schemas/assessment';
import type { Units } from '../../shared/schemas/auth';
import { boardReasonWords } from '../../shared/format/board-reasons';
import type { BoardRecord } from '../models/assessment.queries';

function rankRows(rows: BoardRow[]): BoardRow[] {
  return [...rows].sort((x, y) => {
    if (x.aOverT == null || y.aOverT == null) return x.aOverT == null ? (y.aOverT == null ? x.name.localeCompare(y.name) : 1) : -1;
    return y.aOverT - x.aOverT || (y.tonnesPerYr ?? 0) - (x.tonnesPerYr ?? 0);
  });
}

/** A board row, its reasons in the reader's units; the farm's name only on the advisor's board across farms. */
function presentBoardRow(r: BoardRecord & { boardRow: StoredBoardFigures }, withFarmName: boolean, units: Units): BoardRow {
  return {
    fieldId: r.fieldId,
    farmId: r.farmId,
    ...(withFarmName ? { farmName: r.farmName } : {}),
    name: r.name,
    areaHa: r.areaM2 / 10_000,
    ...r.boardRow,
    reasons: r.boardRow.reasons.map((reason) => boardReasonWords(reason, units)),
  };
}

export function presentBoard(season: string, records: (BoardRecord & { boardRow: StoredBoardFigures })[], withFarmName: boolean, units: Units): Board {
  return { season, rows: rankRows(records.map((r) => presentBoardRow(r, withFarmName, units))) };
}
