// A rainfall record (breakpoint data) as CSV → R, the mean annual sum of storm EI30 (RUSLE,
// AH-703 ch. 2; unit energy Brown & Foster 1987), by the engine's rFromBreakpointRecord.
// Columns: `time` (ISO date-time, e.g. 2026-06-03T14:30) and either `cumulative_mm` (rain since
// the start of the record) or `depth_mm` (rain in the interval that ends at that time).
import { parse } from 'csv-parse/sync';
import { rFromBreakpointRecord, type Breakpoint } from '../../shared/erosion';

export type RecordSummary = { r: number; years: number; from: string; to: string; breakpoints: number; storms: number; erosiveStorms: number };
export type RecordResult = { ok: true; summary: RecordSummary } | { ok: false; status: 400 | 415 | 422 | 503; error: string; message: string };

const bad = (status: 400 | 415 | 422, error: string, message: string): RecordResult => ({ ok: false, status, error, message });

export function rFromRainfallCsv(bytes: Buffer, yearsGiven?: number): RecordResult {
  if (bytes.length === 0) return bad(400, 'empty_file', 'The file is empty: upload a CSV with columns time and cumulative_mm (or depth_mm).');
  if (bytes.subarray(0, 1024).includes(0)) return bad(415, 'unsupported_file_type', 'The file is not text: upload the rainfall record as a CSV file.');
  let rows: Record<string, string>[];
  try {
    rows = parse(bytes.toString('utf8'), { columns: (h: string[]) => h.map((x) => x.trim().toLowerCase()), skip_empty_lines: true, bom: true, trim: true }) as Record<string, string>[];
  } catch (e) {
    return bad(400, 'invalid_csv', `The CSV could not be read: ${(e as Error).message}`);
  }
  if (rows.length < 2) return bad(422, 'csv_empty', 'The record needs at least two rows of rain.');
  const cols = Object.keys(rows[0]);
  const cumulative = cols.includes('cumulative_mm');
  if (!cols.includes('time') || (!cumulative && !cols.includes('depth_mm'))) {
    return bad(422, 'csv_header_invalid', `The header must name "time" and "cumulative_mm" or "depth_mm"; it has: ${cols.join(', ')}.`);
  }
  const t0 = Date.parse(rows[0].time);
  let total = 0;
  let lastTime = -Infinity;
  const record: Breakpoint[] = [];
  for (const [i, row] of rows.entries()) {
    const rowNo = i + 2;
    const t = Date.parse(row.time);
    if (!Number.isFinite(t)) return bad(422, 'csv_rows_invalid', `row ${rowNo}, column time: "${row.time}" is not a date-time like 2026-06-03T14:30.`);
    if (t <= lastTime) return bad(422, 'csv_rows_invalid', `row ${rowNo}, column time: times must increase (${row.time}).`);
    const v = Number(cumulative ? row.cumulative_mm : row.depth_mm);
    if (!Number.isFinite(v) || v < 0) return bad(422, 'csv_rows_invalid', `row ${rowNo}, column ${cumulative ? 'cumulative_mm' : 'depth_mm'}: "${cumulative ? row.cumulative_mm : row.depth_mm}" is not a rain depth in mm.`);
    total = cumulative ? v : total + (i === 0 ? 0 : v);
    if (cumulative && record.length && total < record[record.length - 1].cumulativeMm) return bad(422, 'csv_rows_invalid', `row ${rowNo}, column cumulative_mm: the total may not go down.`);
    record.push({ timeMin: (t - t0) / 60_000, cumulativeMm: total });
    lastTime = t;
  }
  const spanDays = (lastTime - t0) / 86_400_000;
  const years = yearsGiven ?? Math.max(1, Math.round(spanDays / 365.25));
  const r = rFromBreakpointRecord(record, years);
  if (!r.ok) return bad(422, 'cannot_compute_r', r.reason);
  return {
    ok: true,
    summary: { r: r.value.r, years, from: new Date(t0).toISOString(), to: new Date(lastTime).toISOString(), breakpoints: record.length, storms: r.value.storms.length, erosiveStorms: r.value.erosiveStorms },
  };
}
