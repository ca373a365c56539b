// Lab results from a CSV file (drop or pick), one sample a row. A file with bad rows stores
// nothing: the bad rows are listed with their reasons, and the good ones can be stored on
// their own. An empty template with the columns can be saved to start from.
import { useId, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SOIL_CSV_COLUMNS } from '../../../../shared/schemas/soils';
import { rejectedRowsFromError, useImportSoilCsv, type CsvRejectedRow } from '../api/import-soil-csv';
import { SOIL_CSV_MAX_BYTES } from '../../../../shared/limits';

const KB = 1024;
const COLUMNS = [...SOIL_CSV_COLUMNS, 'described_to_cm'];

function checkCsv(file: File): string | null {
  if (!/\.(csv|txt|tsv)$/i.test(file.name)) return `${file.name} is not a CSV file. Save the lab sheet as .csv and try again.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > SOIL_CSV_MAX_BYTES) return `${file.name} is ${(file.size / KB).toFixed(0)} kB; the limit is ${SOIL_CSV_MAX_BYTES / KB} kB.`;
  return null;
}

/** Data rows in the file (non-empty lines after the header), to say how many good rows there are. */
async function dataRowCount(file: File): Promise<number> {
  const text = await file.text();
  return Math.max(text.split(/\r?\n/).filter((l) => l.trim() !== '').length - 1, 0);
}

function templateHref(): string {
  const example = ['pit 1 topsoil', '2026-10-15', '0', '20', '32', '44', '24', '3.1', '6.2', '6.6', '', '', '', '', '80'];
  return `data:text/csv;charset=utf-8,${encodeURIComponent(`${COLUMNS.join(',')}\n${example.join(',')}\n`)}`;
}

function RejectedRows({ rejected }: { rejected: CsvRejectedRow[] }) {
  return (
    <div>
      <p className="font-semibold">
        <span className="num">{rejected.length}</span> {rejected.length === 1 ? 'row' : 'rows'} cannot be used (the header is row 1):
      </p>
      <ul className="mt-1 flex max-h-48 flex-col gap-0.5 overflow-auto" data-testid="soil-csv-rejected">
        {rejected.map((r) => (
          <li key={r.row} data-testid="soil-csv-rejected-row">
            <span className="num font-medium">Row {r.row}</span>: {r.reason.replace(/^row \d+,\s*/i, '')}
          </li>
        ))}
      </ul>
    </div>
  );
}

export function SoilCsvUpload({ fieldId }: { fieldId: number }) {
  const inputId = useId();
  const upload = useImportSoilCsv(fieldId);
  const [file, setFile] = useState<File | null>(null);
  const [rowCount, setRowCount] = useState<number | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);

  const send = (f: File | undefined) => {
    if (!f) return;
    const problem = checkCsv(f);
    setFile(f);
    setFileError(problem);
    setRowCount(null);
    upload.reset();
    if (problem) return;
    void dataRowCount(f).then(setRowCount, () => setRowCount(null));
    upload.mutate({ file: f, acceptGoodRows: false });
  };

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    send(e.dataTransfer.files[0]);
  };

  const rejected = rejectedRowsFromError(upload.error);
  const goodRows = rowCount !== null ? rowCount - rejected.length : null;
  const result = upload.data;

  return (
    <section aria-labelledby={`${inputId}-heading`} className="flex flex-col gap-2" data-testid="soil-csv-upload">
      <h3 id={`${inputId}-heading`} className="text-base font-semibold">
        Lab results from a CSV file
      </h3>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        data-testid="soil-csv-dropzone"
        className={`flex flex-col items-start gap-2 rounded-md border-2 border-dashed px-3 py-3 text-sm ${
          dragging ? 'border-clay bg-clay-light' : 'border-ink-faint bg-white/40'
        }`}
      >
        <p>
          Drop a CSV here (one sample a row, up to <span className="num">1 MB</span>), or
        </p>
        <label
          htmlFor={inputId}
          className={`cursor-pointer rounded-md border border-clay-dark bg-clay px-3 py-1.5 font-medium text-paper hover:bg-clay-dark focus-within:outline focus-within:outline-3 focus-within:outline-clay ${
            upload.isPending ? 'pointer-events-none opacity-60' : ''
          }`}
        >
          Choose a CSV file
          <input
            id={inputId}
            type="file"
            accept=".csv,text/csv,.txt,.tsv"
            className="sr-only"
            data-testid="soil-csv-input"
            disabled={upload.isPending}
            onChange={(e) => {
              send(e.target.files?.[0]);
              e.target.value = '';
            }}
          />
        </label>
        <details className="text-ink-soft">
          <summary className="cursor-pointer">Columns the file may have</summary>
          <p className="num mt-1 break-words font-mono text-xs">{COLUMNS.join(', ')}</p>
          <p className="mt-1">
            Percentages of the fine earth; depths in cm; dates YYYY-MM-DD; bulk density in Mg/m³, CEC in cmolc/kg, ESP in %.
            Comma, semicolon or tab between values.{' '}
            <a href={templateHref()} download="fieldshed-soil-samples.csv" className="text-clay-dark underline">
              Save an example file
            </a>
          </p>
        </details>
        {file && upload.isPending ? <p role="status">Reading {file.name}…</p> : null}
      </div>

      {fileError ? <Notice tone="error">{fileError}</Notice> : null}
      {upload.isError ? (
        <Notice tone="error" title="Nothing was stored" testId="soil-csv-error">
          {/* With rejected rows, the list says it all; the server's message also speaks to API callers. */}
          {rejected.length ? <RejectedRows rejected={rejected} /> : <p>{upload.error.message}</p>}
          {rejected.length && file && goodRows !== 0 ? (
            <Button
              variant="secondary"
              size="sm"
              className="mt-2"
              data-testid="soil-csv-accept-good"
              disabled={upload.isPending}
              onClick={() => upload.mutate({ file, acceptGoodRows: true })}
            >
              Store the good rows only{goodRows ? ` (${goodRows})` : ''}
            </Button>
          ) : null}
        </Notice>
      ) : null}
      {result ? (
        <Notice tone={result.rejected.length ? 'caution' : 'info'} testId="soil-csv-result">
          <p className="font-semibold">
            Stored <span className="num">{result.created.length}</span> {result.created.length === 1 ? 'sample' : 'samples'} from {file?.name}.
          </p>
          {result.rejected.length ? <RejectedRows rejected={result.rejected} /> : null}
        </Notice>
      ) : null}
    </section>
  );
}
