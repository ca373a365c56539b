// How each kind of figure is written: digits suited to the quantity, thousands separators, the
// unit always, and the reader's unit system. Conversions by AH-703 app. A (1 US t/ac = 2.2417 t/ha)
// and the definitions of the units (25.4 mm to the inch, 0.3048 m to the foot).
import { describe, expect, it } from 'vitest';
import { formatFigure } from '../../../shared/format/figure';
import { formatContent, formatCount, formatDepth, formatFactor, formatRate, formatRateRange, formatShare, formatSlope } from '../../../shared/format/quantities';
import { boardReasonWords } from '../../../shared/format/board-reasons';

describe('figures by kind', () => {
  it('writes a plain figure with three significant figures at most, two below 1, whole from 100 with separators', () => {
    expect(formatFigure(1466.3499)).toBe('1,466');
    expect(formatFigure(43.2871)).toBe('43.3');
    expect(formatFigure(5.8631)).toBe('5.86');
    expect(formatFigure(0.0745123)).toBe('0.075');
    expect(formatFigure(Number.NaN)).toBe('—');
  });
  it('writes slopes to 0.1 % below 20 % and whole per cent above', () => {
    expect(formatSlope(12.498867301083864)).toBe('12.5 %');
    expect(formatSlope(23.4)).toBe('23 %');
  });
  it('writes shares in whole per cent, a trace as under 1 %, and lab contents to 0.1 %', () => {
    expect(formatShare(54.04)).toBe('54 %');
    expect(formatShare(0.2)).toBe('< 1 %');
    expect(formatContent(2.9000000000000004)).toBe('2.9 %');
  });
  it('writes RUSLE factors with two significant figures', () => {
    expect(formatFactor(0.4368)).toBe('0.44');
    expect(formatFactor(3.4551)).toBe('3.5');
    expect(formatFactor(0.0094)).toBe('0.0094');
    expect(formatFactor(0.4)).toBe('0.40');
  });
  it('writes rates per hectare, or per acre in US tons for acre users (AH-703 app. A: 2.2417)', () => {
    expect(formatRate(10.1734, 'ha')).toBe('10 t/ha');
    expect(formatRate(2.2417, 'ac')).toBe('1.0 US t/ac');
    expect(formatRate(0.42, 'ha')).toBe('0.4 t/ha');
    expect(formatRateRange(10, 50, 'ac')).toBe('4.5–22 US t/ac');
  });
  it('writes depths in whole cm, or inches to 0.1 (25.4 mm to the inch)', () => {
    expect(formatDepth(15, 'ha')).toBe('15 cm');
    expect(formatDepth(15, 'ac')).toBe('5.9 in');
  });
  it('writes counts whole with separators', () => {
    expect(formatCount(12478)).toBe('12,478');
  });
});

describe('board reasons in the reader’s units', () => {
  it('writes runoff against the design storm in mm, or in inches for acre users', () => {
    expect(boardReasonWords({ kind: 'much-runoff', runoffMm: 65.54, stormMm: 105 }, 'ha')).toBe('much runoff (66 of 105 mm in the design storm)');
    // 65.54 mm = 2.58 in, 105 mm = 4.13 in
    expect(boardReasonWords({ kind: 'much-runoff', runoffMm: 65.54, stormMm: 105 }, 'ac')).toBe('much runoff (2.6 of 4.1 in in the design storm)');
  });
  it('writes K in the reader’s units (AH-703 app. A: 1 US unit = 0.1317 SI)', () => {
    expect(boardReasonWords({ kind: 'erodible-soil', kUs: 0.405 }, 'ac')).toBe('erodible soil (K 0.41, US units)');
    expect(boardReasonWords({ kind: 'erodible-soil', kUs: 0.405 }, 'ha')).toBe('erodible soil (K 0.053, SI units)');
  });
  it('writes factors and the wet-ground depth with the digits they carry', () => {
    expect(boardReasonWords({ kind: 'steep-slope', ls: 3.4551 }, 'ha')).toBe('steep or long slope (LS 3.5)');
    expect(boardReasonWords({ kind: 'wet-ground', depthToGrayCm: 15, drainageClass: 'poorly drained' }, 'ac')).toBe(
      'gray (redoximorphic) colours at 5.9 in: poorly drained, a seasonal water table that amendments will not fix',
    );
    expect(boardReasonWords({ kind: 'concentrated-flow', cells: 388, flowAreaHa: 0.97 }, 'ac')).toBe('water gathers on about 2.40 ac of the field: a grassed waterway candidate');
  });
});
