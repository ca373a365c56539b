// Import field outlines from a file: drop it or pick it. Shows how many fields were created
// and why each rejected item was refused; errors stay inside the dialog, next to the file.
import { useId, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import type { ImportResult } from '../../../../shared/schemas/field';
import { IMPORT_EXTENSIONS, useImportFields } from '../api/import-fields';
import { BOUNDARY_IMPORT_MAX_BYTES, BYTES_PER_MIB } from '../../../../shared/limits';

type Rejected = ImportResult['rejected'];

function checkFile(file: File): string | null {
  const lower = file.name.toLowerCase();
  if (!IMPORT_EXTENSIONS.some((ext) => lower.endsWith(ext)))
    return `${file.name} is not a file Fieldshed can read. Use ${IMPORT_EXTENSIONS.join(', ')}.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > BOUNDARY_IMPORT_MAX_BYTES)
    return `${file.name} is ${(file.size / BYTES_PER_MIB).toFixed(1)} MB; the limit is ${(BOUNDARY_IMPORT_MAX_BYTES / BYTES_PER_MIB).toFixed(0)} MB.`;
  return null;
}

function rejectedFromError(error: unknown): Rejected {
  if (!isApiError(error)) return [];
  const r = (error.details as { rejected?: unknown } | undefined)?.rejected;
  return Array.isArray(r) ? (r as Rejected) : [];
}

function RejectedList({ rejected }: { rejected: Rejected }) {
  if (rejected.length === 0) return null;
  return (
    <div>
      <p className="font-semibold">
        Not imported: <span className="num">{rejected.length}</span> {rejected.length === 1 ? 'item' : 'items'}
      </p>
      <ul className="mt-1 flex max-h-40 flex-col gap-1 overflow-auto" data-testid="import-rejected">
        {rejected.map((r) => (
          <li key={r.index}>
            {/^feature\b/i.test(r.reason) ? r.reason : `Item ${r.index}: ${r.reason}`}
          </li>
        ))}
      </ul>
    </div>
  );
}

export function ImportDialog({ farmId, onClose }: { farmId: number; onClose: () => void }) {
  const titleId = useId();
  const inputId = useId();
  const importFields = useImportFields(farmId);
  const [fileError, setFileError] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const [fileName, setFileName] = useState<string | null>(null);

  const send = (file: File | undefined) => {
    if (!file) return;
    setFileName(file.name);
    const problem = checkFile(file);
    setFileError(problem);
    importFields.reset();
    if (!problem) importFields.mutate(file);
  };

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    send(e.dataTransfer.files[0]);
  };

  const result = importFields.data;
  const error = importFields.error;

  return (
    <ModalDialog titleId={titleId} onClose={onClose} testId="import-dialog" className="flex w-full max-w-lg flex-col gap-4 p-5">
        <h2 id={titleId} className="text-xl font-semibold">
          Import field outlines
        </h2>
        <p className="text-sm text-ink-soft">
          GeoJSON (.geojson, .json), a zipped shapefile with its .prj (.zip), or KML (.kml, .kmz). Up to{' '}
          <span className="num">{BOUNDARY_IMPORT_MAX_BYTES / BYTES_PER_MIB} MB</span>.
        </p>
        <div
          data-testid="import-dropzone"
          onDragOver={(e) => {
            e.preventDefault();
            setDragging(true);
          }}
          onDragLeave={() => setDragging(false)}
          onDrop={onDrop}
          className={`flex flex-col items-center gap-2 rounded-md border-2 border-dashed px-4 py-6 text-center ${
            dragging ? 'border-clay bg-clay-light' : 'border-ink-faint bg-white/40'
          }`}
        >
          <p>Drop a file here, or</p>
          <label
            htmlFor={inputId}
            className="cursor-pointer rounded-md border border-clay-dark bg-clay px-4 py-2 font-medium text-paper hover:bg-clay-dark focus-within:outline focus-within:outline-3 focus-within:outline-clay"
          >
            Choose a file
            <input
              id={inputId}
              type="file"
              data-testid="import-file-input"
              accept={IMPORT_EXTENSIONS.join(',')}
              className="sr-only"
              onChange={(e) => {
                send(e.target.files?.[0]);
                e.target.value = '';
              }}
            />
          </label>
          {fileName ? <p className="text-sm text-ink-soft">File: {fileName}</p> : null}
        </div>

        {fileError ? <Notice tone="error">{fileError}</Notice> : null}
        {importFields.isPending ? <p role="status">Reading {fileName}…</p> : null}
        {error ? (
          <Notice tone="error" title="Nothing was imported" testId="import-error">
            <p>{error.message}</p>
            <RejectedList rejected={rejectedFromError(error)} />
          </Notice>
        ) : null}
        {result ? (
          <Notice tone={result.rejected.length ? 'caution' : 'info'} testId="import-result">
            <p className="font-semibold">
              Created <span className="num">{result.created.length}</span> {result.created.length === 1 ? 'field' : 'fields'}
              {result.created.length ? `: ${result.created.map((f) => f.properties.name).join(', ')}` : ''}.
            </p>
            <RejectedList rejected={result.rejected} />
          </Notice>
        ) : null}

        <div className="flex justify-end">
          <Button variant="secondary" onClick={onClose}>
            {result ? 'Done' : 'Close'}
          </Button>
        </div>
    </ModalDialog>
  );
}
