// Where a figure came from, said in plain words from its typed origin: a person reads the
// source, no code reads meaning out of the words.
import { describe, expect, it } from 'vitest';
import { originWords, sourceWords } from '../../../shared/schemas/provenance';

describe('origin in words', () => {
  it('names a published table and page', () => {
    expect(sourceWords({ title: 'AH-703', table: '4-3' })).toBe('AH-703, table 4-3');
    expect(originWords({ kind: 'published-table', source: { title: 'AH-537', table: '10', page: '31' } })).toBe('AH-537, table 10, p. 31');
  });

  it('says who typed a figure, where known', () => {
    expect(originWords({ kind: 'typed', typedBy: 'Dana Reyes' })).toBe('typed by Dana Reyes');
    expect(originWords({ kind: 'typed' })).toBe('typed');
  });

  it('calls a rule of thumb and an example value what they are', () => {
    expect(originWords({ kind: 'rule-of-thumb' })).toBe('rule of thumb');
    expect(originWords({ kind: 'default' })).toBe('example value — replace with your local figure');
    expect(originWords({ kind: 'default', source: { title: 'deep-soil T, common practice' } })).toBe('example value — replace with your local figure; deep-soil T, common practice');
  });
});
