// Assessment inputs with a unit, in each reader's units. Conversions: AH-703 app. A
// (1 US R unit = 17.02 MJ·mm/(ha·h·yr); 1 US t/ac = 2.2417 t/ha), 25.4 mm to the inch,
// 0.3048 m to the foot (international definitions).
import { describe, expect, it } from 'vitest';
import { formatInputQuantity } from '../../../shared/format/input-quantity';

describe('assessment inputs in the reader’s units', () => {
  it('writes R in SI for hectare readers and in US units for acre readers (2,750 / 17.02 = 161.6)', () => {
    expect(formatInputQuantity({ kind: 'erosivity', rSi: 2750 }, 'ha')).toBe('2,750 MJ·mm/(ha·h·yr)');
    expect(formatInputQuantity({ kind: 'erosivity', rSi: 2750 }, 'ac')).toBe('162 (US units)');
  });
  it('writes rain in mm or inches (890 mm = 35.0 in; 105 mm = 4.1 in)', () => {
    expect(formatInputQuantity({ kind: 'annual-rain', mmPerYr: 890 }, 'ha')).toBe('from 890 mm/yr of rain');
    expect(formatInputQuantity({ kind: 'annual-rain', mmPerYr: 890 }, 'ac')).toBe('from 35.0 in/yr of rain');
    expect(formatInputQuantity({ kind: 'storm', mm: 105 }, 'ac')).toBe('4.1 in');
  });
  it('writes slope length in metres or feet (90 m = 295 ft)', () => {
    expect(formatInputQuantity({ kind: 'length', m: 90 }, 'ha')).toBe('90 m');
    expect(formatInputQuantity({ kind: 'length', m: 90 }, 'ac')).toBe('295 ft');
  });
  it('writes T in t/ha/yr or whole US t/ac/yr (5 t/ac/yr = 11.2 t/ha/yr, NSSH part 618)', () => {
    expect(formatInputQuantity({ kind: 'tolerance', tonPerAcYr: 5 }, 'ha')).toBe('11.2 t/ha/yr');
    expect(formatInputQuantity({ kind: 'tolerance', tonPerAcYr: 5 }, 'ac')).toBe('5 t/ac/yr');
  });
});
