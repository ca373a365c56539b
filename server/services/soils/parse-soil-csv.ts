// A soil sample CSV (one lab sample per row; columns in SOIL_CSV_COLUMNS) → checked sample
// payloads, or a reason per bad row naming the row number (the header is row 1) and the column.
import { parse } from 'csv-parse/sync';
import { SOIL_CSV_COLUMNS, SoilSampleCreate } from '../../../shared/schemas/soils';
import { decodeText, looksBinary } from '../imports/decode-text';

/** Columns read beside the documented ones. */
/** Columns read beyond SOIL_CSV_COLUMNS (none at present). */
export const SOIL_CSV_OPTIONAL_COLUMNS = [] as const;
/** Most data rows one file may hold. */
export const MAX_CSV_ROWS = 5000;

type Column = (typeof SOIL_CSV_COLUMNS)[number] | (typeof SOIL_CSV_OPTIONAL_COLUMNS)[number];
const ALL_COLUMNS: readonly Column[] = [...SOIL_CSV_COLUMNS, ...SOIL_CSV_OPTIONAL_COLUMNS];

/** CSV column → payload key. */
const KEY_OF: Record<Column, string> = {
  label: 'label',
  sampled_on: 'sampledOn',
  depth_top_cm: 'depthTopCm',
  depth_bottom_cm: 'depthBottomCm',
  sand_pct: 'sandPct',
  silt_pct: 'siltPct',
  clay_pct: 'clayPct',
  organic_matter_pct: 'organicMatterPct',
  ph: 'ph',
  buffer_ph: 'bufferPh',
  buffer_method: 'bufferMethod',
  depth_to_gray_cm: 'depthToGrayCm',
  bulk_density: 'bulkDensity',
  cec: 'cecCmolPerKg',
  esp: 'espPct',
  described_to_cm: 'describedToCm',
};
const COLUMN_OF = Object.fromEntries(Object.entries(KEY_OF).map(([c, k]) => [k, c])) as Record<string, Column>;
const TEXT_COLUMNS = new Set<Column>(['label', 'sampled_on', 'buffer_method']);

export type CsvRow = { row: number; input: SoilSampleCreate };
export type CsvParse =
  | { ok: true; rows: CsvRow[]; rejected: { row: number; reason: string }[] }
  | { ok: false; status: 400 | 413 | 415 | 422; error: string; message: string };

/** "12.5" → 12.5; "12,5" (decimal comma, in ; or tab separated files) → 12.5; "" → null. */
function numberOf(text: string): number | null | 'bad' {
  const t = text.trim();
  if (t === '') return null;
  const n = Number(/^-?\d+,\d+$/.test(t) ? t.replace(',', '.') : t);
  return Number.isFinite(n) ? n : 'bad';
}

/** The separator of the header row: the most frequent of comma, semicolon and tab. */
function delimiterOf(text: string): string {
  const first = text.split(/\r?\n/, 1)[0] ?? '';
  const counts = [',', ';', '\t'].map((d) => ({ d, n: first.split(d).length - 1 }));
  return counts.sort((a, b) => b.n - a.n)[0].n > 0 ? counts[0].d : ',';
}

function normaliseHeader(h: string): string {
  return h.trim().toLowerCase().replace(/[\s-]+/g, '_');
}

export function parseSoilCsv(bytes: Uint8Array): CsvParse {
  if (bytes.length === 0) return { ok: false, status: 400, error: 'empty_file', message: 'The file is empty (0 bytes): upload a CSV with a header row and one row per sample.' };
  if (looksBinary(bytes)) return { ok: false, status: 415, error: 'unsupported_file_type', message: 'The file is not text: upload the soil samples as a CSV file (comma, semicolon or tab separated).' };
  let records: { record: string[]; info: { lines: number } }[];
  try {
    const text = decodeText(bytes);
    records = parse(text, { delimiter: delimiterOf(text), relax_column_count: true, skip_empty_lines: true, info: true, bom: true }) as unknown as typeof records;
  } catch (e) {
    const lines = (e as { lines?: number }).lines;
    return { ok: false, status: 400, error: 'invalid_csv', message: `The CSV could not be read${lines ? ` near row ${lines}` : ''}: ${(e as Error).message}` };
  }
  if (records.length === 0) return { ok: false, status: 422, error: 'csv_empty', message: 'The CSV holds no rows: the first row names the columns, then one row per sample.' };
  const header = records[0].record.map(normaliseHeader);
  const unknown = header.filter((h) => h !== '' && !ALL_COLUMNS.includes(h as Column));
  const twice = header.find((h, i) => h !== '' && header.indexOf(h) !== i);
  if (unknown.length || twice || !header.some((h) => ALL_COLUMNS.includes(h as Column))) {
    const what = unknown.length ? `names columns Fieldshed does not know (${unknown.join(', ')})` : twice ? `names the column ${twice} twice` : 'names none of the soil sample columns';
    return { ok: false, status: 422, error: 'csv_header_invalid', message: `The first row ${what}. The columns are: ${ALL_COLUMNS.join(', ')} (any subset, in any order).` };
  }
  const dataRows = records.slice(1);
  if (dataRows.length > MAX_CSV_ROWS) return { ok: false, status: 413, error: 'too_many_rows', message: `The CSV holds ${dataRows.length} rows; at most ${MAX_CSV_ROWS} can be uploaded at once.` };

  const rows: CsvRow[] = [];
  const rejected: { row: number; reason: string }[] = [];
  for (const { record, info } of dataRows) {
    const row = info.lines;
    if (record.every((v) => v.trim() === '')) continue;
    if (record.length > header.length) {
      rejected.push({ row, reason: `row ${row}: it has ${record.length} values but the header names ${header.length} columns` });
      continue;
    }
    const input: Record<string, unknown> = { kind: 'lab' };
    let bad: string | null = null;
    for (let i = 0; i < header.length && !bad; i++) {
      if (header[i] === '') continue;
      const text = record[i] ?? '';
      const c = header[i] as Column;
      if (TEXT_COLUMNS.has(c)) {
        input[KEY_OF[c]] = text.trim() === '' ? null : text.trim();
        continue;
      }
      const n = numberOf(text);
      if (n === 'bad') bad = `row ${row}, column ${c}: "${text.trim().slice(0, 40)}" is not a number`;
      else input[KEY_OF[c]] = n;
    }
    if (bad) {
      rejected.push({ row, reason: bad });
      continue;
    }
    const checked = SoilSampleCreate.safeParse(input);
    if (!checked.success) {
      const issue = checked.error.issues[0];
      const key = String(issue.path[0] ?? '');
      const column = key === 'sandPct' && /add up to/.test(issue.message) ? 'sand_pct, silt_pct, clay_pct' : (COLUMN_OF[key] ?? key);
      // The schema's messages name the payload key; in a CSV the column name is what the person sees.
      const message = issue.message.replace(/\b(sandPct|siltPct|clayPct|depthTopCm|depthBottomCm|organicMatterPct|bufferPh|bufferMethod|ph|depthToGrayCm|describedToCm|bulkDensity|cecCmolPerKg|espPct|sampledOn|label)\b/g, (k) => COLUMN_OF[k] ?? k);
      rejected.push({ row, reason: `row ${row}, column ${column}: ${message}` });
      continue;
    }
    rows.push({ row, input: checked.data });
  }
  if (rows.length === 0 && rejected.length === 0) {
    return { ok: false, status: 422, error: 'csv_empty', message: 'The CSV has a header row but no samples below it.' };
  }
  return { ok: true, rows, rejected };
}
