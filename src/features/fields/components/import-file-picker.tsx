// The first step of an import: drop a file or choose one. Checks the name, emptiness and size
// before anything is sent.
import { useId, useState, type DragEvent } from 'react';
import { IMPORT_EXTENSIONS } from '../api/import-fields';
import { BOUNDARY_IMPORT_MAX_BYTES, BYTES_PER_MIB } from '../../../../shared/limits';

/** Why this file cannot be sent, in words for the user; null when it can. */
export function checkFile(file: File): string | null {
  const lower = file.name.toLowerCase();
  if (!IMPORT_EXTENSIONS.some((ext) => lower.endsWith(ext)))
    return `${file.name} is not a file Fieldshed can read. Use ${IMPORT_EXTENSIONS.join(', ')}.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > BOUNDARY_IMPORT_MAX_BYTES)
    return `${file.name} is ${(file.size / BYTES_PER_MIB).toFixed(1)} MB; the limit is ${(BOUNDARY_IMPORT_MAX_BYTES / BYTES_PER_MIB).toFixed(0)} MB.`;
  return null;
}

export function ImportFilePicker({ fileName, onFile }: { fileName: string | null; onFile: (file: File) => void }) {
  const inputId = useId();
  const [dragging, setDragging] = useState(false);
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    const file = e.dataTransfer.files[0];
    if (file) onFile(file);
  };
  return (
    <div
      data-testid="import-dropzone"
      onDragOver={(e) => {
        e.preventDefault();
        setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
      className={`flex items-center gap-2 rounded-md border-2 border-dashed text-center ${
        fileName ? 'flex-row flex-wrap justify-between px-3 py-2' : 'flex-col px-4 py-4'
      } ${
        dragging ? 'border-clay bg-clay-light' : 'border-ink-faint bg-white/40'
      }`}
    >
      {fileName ? (
        <p className="min-w-0 truncate text-sm">
          File: <span className="font-medium">{fileName}</span>
        </p>
      ) : (
        <p>Drop a file here, or</p>
      )}
      <label
        htmlFor={inputId}
        className={`cursor-pointer rounded-md border font-medium focus-within:outline focus-within:outline-3 focus-within:outline-clay ${
          fileName ? 'border-ink-faint bg-paper px-2.5 py-1 text-sm text-ink hover:bg-paper-deep' : 'border-clay-dark bg-clay px-4 py-2 text-paper hover:bg-clay-dark'
        }`}
      >
        {fileName ? 'Choose another file' : 'Choose a file'}
        <input
          id={inputId}
          type="file"
          data-testid="import-file-input"
          accept={IMPORT_EXTENSIONS.join(',')}
          className="sr-only"
          onChange={(e) => {
            const file = e.target.files?.[0];
            e.target.value = '';
            if (file) onFile(file);
          }}
        />
      </label>
    </div>
  );
}
