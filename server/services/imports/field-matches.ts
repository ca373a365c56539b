// Reads how an imported outline meets the farm's fields: the same field again, or an overlap.
import type { ImportWarning } from '../../../shared/schemas/field-import';
import type { FieldMatchRow } from '../../models/field-match.queries';
import { M2_PER_HA } from '../../../shared/erosion/units';

/**
 * The rule for "the same field": the area inside one outline but not the other (their symmetric
 * difference) is at most this share of the larger outline's area. 2 % absorbs the rounding of
 * re-exported files and a slightly moved corner, while two neighbouring fields, or a field and
 * a half of it, stay apart.
 */
export const SAME_FIELD_MAX_SHARE = 0.02;

/** Shared areas below this are edge slivers, not overlaps (as in the farm's field list). */
export const MIN_OVERLAP_M2 = 1;

export function isSameField(row: FieldMatchRow): boolean {
  return row.symmetricDifferenceM2 <= SAME_FIELD_MAX_SHARE * Math.max(row.fieldAreaM2, row.outlineAreaM2);
}

/** `same_as_field` for each field it repeats, `overlaps_field` for each other one it overlaps. */
export function matchWarnings(rows: FieldMatchRow[]): ImportWarning[] {
  return rows.flatMap((row): ImportWarning[] => {
    if (isSameField(row)) return [{ kind: 'same_as_field', fieldId: row.fieldId, name: row.name }];
    if (row.overlapM2 > MIN_OVERLAP_M2) {
      return [{ kind: 'overlaps_field', fieldId: row.fieldId, name: row.name, overlapHa: row.overlapM2 / M2_PER_HA }];
    }
    return [];
  });
}
