// CSV for spreadsheets: RFC 4180 quoting, and text cells a spreadsheet would run as a formula
// neutralised with a leading apostrophe (OWASP, "CSV Injection": cells starting with =, +, -, @,
// tab or carriage return).
import { describe, expect, it } from 'vitest';
import { csvText, neutraliseCell } from '../../../shared/exports/csv';
import { exportFileName, fileSlug } from '../../../shared/exports/file-names';

describe('neutraliseCell', () => {
  it.each(['=1+2', '+1', '-1+cmd', '@SUM(A1)', '\t=1', '\r=1'])('writes %j as text with a leading apostrophe (OWASP CSV Injection)', (cell) => {
    expect(neutraliseCell(cell)).toBe(`'${cell}`);
  });

  it('leaves plain text, numbers (negative ones too), yes/no and empty cells as they are', () => {
    expect(neutraliseCell('Long Slope')).toBe('Long Slope');
    expect(neutraliseCell(-2.5)).toBe(-2.5);
    expect(neutraliseCell(true)).toBe('yes');
    expect(neutraliseCell(null)).toBe('');
    expect(neutraliseCell(Number.NaN)).toBe('');
  });
});

describe('csvText', () => {
  it('quotes commas, quotes and line breaks as RFC 4180 §2 has it, ends lines with CRLF and starts with a byte order mark', () => {
    const text = csvText([{ header: 'name', value: (r: { n: string }) => r.n }], [{ n: 'a, "b"' }, { n: 'line\nbreak' }]);
    expect(text).toBe('\ufeffname\r\n"a, ""b"""\r\n"line\nbreak"\r\n');
  });

  it('neutralises a formula in a header and in a cell', () => {
    const text = csvText([{ header: '=x', value: () => '@y' }], [{}]);
    expect(text).toBe("\ufeff'=x\r\n'@y\r\n");
  });
});

describe('file names', () => {
  it('writes the farm, the season and what the file holds in plain lower-case words', () => {
    expect(exportFileName('Alder Run Farm', '2027', 'fields', 'csv')).toBe('alder-run-farm-2027-fields.csv');
    expect(fileSlug('Ferme de l’Écluse (nord)')).toBe('ferme-de-l-ecluse-nord');
    expect(fileSlug('***')).toBe('farm');
  });
});
