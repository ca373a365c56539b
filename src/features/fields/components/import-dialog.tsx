// Import field outlines from a file in two steps: choose the file, then look at what it holds
// (a small map, names, areas, warnings, a tick box per feature) and import the ticked ones.
// Errors stay inside the dialog, next to the file.
import { useId, useState } from 'react';
import type { Units } from '../../../../shared/schemas/auth';
import type { ImportOptions } from '../../../../shared/schemas/field-import';
import type { ImportResult } from '../../../../shared/schemas/field';
import { Button } from '../../../components/ui/button';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { Notice } from '../../../components/ui/notice';
import { useFields } from '../api/get-fields';
import { useImportFields } from '../api/import-fields';
import { usePreviewImport } from '../api/preview-import';
import { BOUNDARY_IMPORT_MAX_BYTES, BYTES_PER_MIB } from '../../../../shared/limits';
import { checkFile, ImportFilePicker } from './import-file-picker';
import { ImportPreviewStep } from './import-preview-step';

type Props = {
  farmId: number;
  units: Units;
  onClose: () => void;
};

function ImportedNotice({ result }: { result: ImportResult }) {
  const n = result.created.length;
  return (
    <Notice tone={result.rejected.length ? 'caution' : 'info'} testId="import-result">
      <p className="font-semibold">
        {n === 0 ? 'No new fields' : <>Imported <span className="num">{n}</span> {n === 1 ? 'field' : 'fields'}: {result.created.map((f) => f.properties.name).join(', ')}</>}.
      </p>
      {result.rejected.length ? (
        <ul className="mt-1 flex max-h-40 flex-col gap-1 overflow-auto" data-testid="import-rejected">
          {result.rejected.map((r) => (
            <li key={r.index}>{r.reason}</li>
          ))}
        </ul>
      ) : null}
    </Notice>
  );
}

export function ImportDialog({ farmId, units, onClose }: Props) {
  const titleId = useId();
  const preview = usePreviewImport(farmId);
  const importFields = useImportFields(farmId);
  const fields = useFields(farmId);
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  // Each file read starts a fresh preview step (its ticks and name choice).
  const [readCount, setReadCount] = useState(0);

  const choose = (chosen: File) => {
    setFile(chosen);
    const problem = checkFile(chosen);
    setFileError(problem);
    preview.reset();
    importFields.reset();
    if (!problem) {
      setReadCount((n) => n + 1);
      preview.mutate(chosen);
    }
  };
  const confirm = (options: ImportOptions) => file && importFields.mutate({ file, options });
  const result = importFields.data;

  return (
    <ModalDialog titleId={titleId} onClose={onClose} testId="import-dialog" className="flex max-h-[92vh] w-full max-w-2xl flex-col gap-3 overflow-auto p-4 sm:p-5">
      <h2 id={titleId} className="text-xl font-semibold">
        Import field outlines
      </h2>
      {result ? (
        <ImportedNotice result={result} />
      ) : (
        <>
          <p className="text-sm text-ink-soft">
            GeoJSON (.geojson, .json), a zipped shapefile with its .prj (.zip), or KML (.kml, .kmz). Up to{' '}
            <span className="num">{BOUNDARY_IMPORT_MAX_BYTES / BYTES_PER_MIB} MB</span>.
          </p>
          <ImportFilePicker fileName={file?.name ?? null} onFile={choose} />
          {fileError ? <Notice tone="error">{fileError}</Notice> : null}
          {preview.isPending ? <p role="status">Reading {file?.name}…</p> : null}
          {preview.error ? (
            <Notice tone="error" title="This file cannot be imported" testId="import-error">
              <p>{preview.error.message}</p>
            </Notice>
          ) : null}
          {preview.data ? (
            <ImportPreviewStep
              key={readCount}
              preview={preview.data}
              existing={fields.data?.features ?? []}
              units={units}
              pending={importFields.isPending}
              onConfirm={confirm}
            />
          ) : null}
          {importFields.error ? (
            <Notice tone="error" title="Nothing was imported" testId="import-error">
              <p>{importFields.error.message}</p>
            </Notice>
          ) : null}
        </>
      )}
      <div className="flex justify-end">
        <Button variant="secondary" onClick={onClose}>
          {result ? 'Done' : 'Cancel'}
        </Button>
      </div>
    </ModalDialog>
  );
}
