import { describe, expect, it } from 'vitest';
import { pickName } from '../../../server/services/imports/pick-name';

describe('field name from feature properties', () => {
  it('takes name, Name or NAME whatever the case', () => {
    expect(pickName({ NAME: 'North Ridge' })).toBe('North Ridge');
    expect(pickName({ Name: 'Mill Hill' })).toBe('Mill Hill');
  });

  it('prefers name over field, field_name, label, title and id, in that order', () => {
    expect(pickName({ id: 4, title: 'T', label: 'L', FIELD_NAME: 'FN', field: 'F', name: 'N' })).toBe('N');
    expect(pickName({ id: 4, title: 'T', label: 'L', FIELD_NAME: 'FN', field: 'F' })).toBe('F');
    expect(pickName({ id: 4, title: 'T', label: 'L', FIELD_NAME: 'FN' })).toBe('FN');
    expect(pickName({ id: 4, title: 'T', label: 'L' })).toBe('L');
    expect(pickName({ id: 4, title: 'T' })).toBe('T');
    expect(pickName({ id: 4 })).toBe('4');
  });

  it('skips empty strings and non-text values for the next name-like key', () => {
    expect(pickName({ name: '  ', label: { x: 1 }, title: 'Hay Ground' })).toBe('Hay Ground');
    expect(pickName({ name: null, id: Number.NaN })).toBeNull();
  });

  it('collapses white space and keeps at most 120 characters', () => {
    expect(pickName({ name: ' Creek\n  Bottom ' })).toBe('Creek Bottom');
    expect(pickName({ name: 'x'.repeat(200) })).toHaveLength(120);
  });

  it('gives null without properties or name-like keys', () => {
    expect(pickName(null)).toBeNull();
    expect(pickName({ crop: 'corn', areaHa: 19 })).toBeNull();
  });
});
