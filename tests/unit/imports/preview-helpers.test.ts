// The pure parts of the import preview: the "same field" rule, overlap warnings, the proposed
// name attribute and attribute values as shown. The 2 % share is Fieldshed's own rule (see
// server/services/imports/field-matches.ts), not a published figure.
import { describe, expect, it } from 'vitest';
import { isSameField, matchWarnings } from '../../../server/services/imports/field-matches';
import { plainAttributes } from '../../../server/services/imports/feature-attributes';
import { proposeNameAttribute } from '../../../server/services/imports/pick-name';

const row = (symmetricDifferenceM2: number, overlapM2: number) => ({
  fieldId: 7, name: 'North Ridge', fieldAreaM2: 100_000, outlineAreaM2: 100_000, overlapM2, symmetricDifferenceM2,
});

describe('matching an imported outline with the farm’s fields', () => {
  it('calls it the same field when the symmetric difference is at most 2 % of the larger area', () => {
    expect(isSameField(row(0, 100_000))).toBe(true);
    expect(isSameField(row(2_000, 99_000))).toBe(true);
    expect(isSameField(row(2_001, 98_999))).toBe(false);
    // Half of a field is not the field.
    expect(isSameField({ ...row(50_000, 50_000), outlineAreaM2: 50_000 })).toBe(false);
  });

  it('warns of an overlap in hectares, and ignores edge slivers of 1 m² or less', () => {
    expect(matchWarnings([row(60_000, 25_000)])).toEqual([{ kind: 'overlaps_field', fieldId: 7, name: 'North Ridge', overlapHa: 2.5 }]);
    expect(matchWarnings([row(199_999, 1)])).toEqual([]);
    expect(matchWarnings([row(10, 99_995)])).toEqual([{ kind: 'same_as_field', fieldId: 7, name: 'North Ridge' }]);
  });
});

describe('the attribute proposed for names', () => {
  it('takes the first name-like key that holds a name in some feature, in any case', () => {
    expect(proposeNameAttribute(['PLOT', 'FIELD_NAME'], [{ PLOT: 'A1', FIELD_NAME: 'Mill Hill' }])).toBe('FIELD_NAME');
    expect(proposeNameAttribute(['FieldName', 'Label'], [{ FieldName: '', Label: 'x' }, { FieldName: 'Hay Ground', Label: 'y' }])).toBe('FieldName');
    expect(proposeNameAttribute(['LABEL', 'NAME'], [{ LABEL: 'L', NAME: '  ' }])).toBe('LABEL');
    expect(proposeNameAttribute(['CROP'], [{ CROP: 'corn' }])).toBeNull();
  });

  it('shows attribute values as plain text, numbers or true/false', () => {
    expect(plainAttributes({ a: 'x', b: 2, c: Number.NaN, d: true, e: null, f: new Date('2026-05-01T00:00:00Z'), g: { x: 1 } }))
      .toEqual({ a: 'x', b: 2, c: null, d: true, e: null, f: '2026-05-01', g: '{"x":1}' });
  });
});
