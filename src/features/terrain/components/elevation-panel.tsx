// The side panel's "Elevation model" section: what model the farm has (name, EPSG, size in
// cells, cell size), a GeoTIFF upload for farmers (drop or pick), and the terrain job's
// progress, polled until it is done or failed. When it is done the layers and every field's
// figures are fetched again.
import { useEffect, useId, useRef, useState, type DragEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Notice } from '../../../components/ui/notice';
import { useElevation, type ElevationModel } from '../api/get-elevation';
import { isJobActive, useJob } from '../api/get-job';
import { refreshTerrain } from '../api/refresh-terrain';
import { DEM_EXTENSIONS, useUploadDem } from '../api/upload-dem';
import { DEM_MAX_BYTES } from '../../../../shared/limits';
import { JobProgress } from './job-progress';

const MB = 1024 * 1024;

function checkDemFile(file: File): string | null {
  const lower = file.name.toLowerCase();
  if (!DEM_EXTENSIONS.some((ext) => lower.endsWith(ext)))
    return `${file.name} is not a GeoTIFF. Use a .tif or .tiff elevation model.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > DEM_MAX_BYTES)
    return `${file.name} is ${(file.size / MB).toFixed(0)} MB; the limit is ${(DEM_MAX_BYTES / MB).toFixed(0)} MB.`;
  return null;
}

const fmtInt = (n: number) => n.toLocaleString('en-US');
const fmtCell = (m: number) => `${m.toLocaleString('en-US', { maximumFractionDigits: m < 10 ? 2 : 1 })} m`;
const fmtDate = (iso: string) =>
  new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

function ModelFacts({ model }: { model: ElevationModel }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="elevation-model">
      <dt className="text-ink-soft">File</dt>
      <dd className="min-w-0 break-words" data-testid="elevation-model-name">{model.originalName}</dd>
      <dt className="text-ink-soft">Coordinate system</dt>
      <dd className="num">EPSG:{model.epsg}</dd>
      <dt className="text-ink-soft">Size</dt>
      <dd className="num">
        {fmtInt(model.width)} × {fmtInt(model.height)} cells
      </dd>
      <dt className="text-ink-soft">Cell size</dt>
      <dd className="num">{fmtCell(model.cellSizeM)}</dd>
      <dt className="text-ink-soft">Added</dt>
      <dd className="num">{fmtDate(model.createdAt)}</dd>
    </dl>
  );
}

export function ElevationPanel({ farmId, canEdit }: { farmId: number; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const elevation = useElevation(farmId);
  const upload = useUploadDem(farmId);
  const inputId = useId();
  const [fileError, setFileError] = useState<string | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const [uploadedJobId, setUploadedJobId] = useState<string | null>(null);

  const latest = elevation.data?.latestJob ?? null;
  // The job to follow: the one this user just started, or one the server is still working on.
  const jobId = uploadedJobId ?? (latest && isJobActive(latest.state) ? latest.id : null);
  const job = useJob(jobId);
  const shownJob = job.data ?? (latest && latest.id === jobId ? latest : null);

  // Once per job: when it ends, fetch what it made (or the failure) again.
  const handled = useRef(new Set<string>());
  useEffect(() => {
    const j = job.data;
    if (!j || isJobActive(j.state) || handled.current.has(j.id)) return;
    handled.current.add(j.id);
    void refreshTerrain(queryClient, farmId);
  }, [job.data, queryClient, farmId]);

  const send = (file: File | undefined) => {
    if (!file) return;
    setFileName(file.name);
    const problem = checkDemFile(file);
    setFileError(problem);
    upload.reset();
    if (problem) return;
    upload.mutate(file, { onSuccess: (accepted) => setUploadedJobId(accepted.jobId) });
  };

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    send(e.dataTransfer.files[0]);
  };

  const model = elevation.data?.model ?? null;
  const working = upload.isPending || isJobActive(shownJob?.state);
  // A failure is shown beside the upload: this session's job, or the farm's last one.
  const failed = shownJob?.state === 'failed' ? shownJob : !jobId && latest?.state === 'failed' ? latest : null;

  return (
    <section
      aria-labelledby="elevation-heading"
      data-testid="elevation-panel"
      className="flex flex-col gap-2 rounded-md border border-paper-edge bg-white/40 p-3"
    >
      <h2 id="elevation-heading" className="text-lg font-semibold">
        Elevation model
      </h2>
      {elevation.isPending ? (
        <p className="text-sm text-ink-soft">Loading…</p>
      ) : elevation.isError ? (
        <Notice tone="error">{elevation.error.message}</Notice>
      ) : model ? (
        <ModelFacts model={model} />
      ) : (
        <p className="text-sm text-ink-soft" data-testid="elevation-none">
          No elevation model yet. Without one, each field needs its slope % and slope length typed in.
        </p>
      )}

      {shownJob && (isJobActive(shownJob.state) || shownJob.state === 'done') ? (
        <JobProgress job={shownJob} label="Working out the terrain" />
      ) : null}

      {canEdit ? (
        <div
          data-testid="dem-dropzone"
          onDragOver={(e) => {
            e.preventDefault();
            setDragging(true);
          }}
          onDragLeave={() => setDragging(false)}
          onDrop={onDrop}
          className={`flex flex-col items-start gap-2 rounded-md border-2 border-dashed px-3 py-3 text-sm ${
            dragging ? 'border-clay bg-clay-light' : 'border-ink-faint bg-white/40'
          }`}
        >
          <p>
            {model ? 'Replace it: drop' : 'Drop'} a GeoTIFF elevation model here (any projected coordinate system with
            an EPSG code, up to <span className="num">{DEM_MAX_BYTES / MB} MB</span>), or
          </p>
          <label
            htmlFor={inputId}
            aria-disabled={working}
            className={`cursor-pointer rounded-md border border-clay-dark bg-clay px-3 py-1.5 font-medium text-paper hover:bg-clay-dark focus-within:outline focus-within:outline-3 focus-within:outline-clay ${
              working ? 'pointer-events-none opacity-60' : ''
            }`}
          >
            Choose a GeoTIFF
            <input
              id={inputId}
              type="file"
              data-testid="dem-file-input"
              accept={`${DEM_EXTENSIONS.join(',')},image/tiff`}
              className="sr-only"
              disabled={working}
              onChange={(e) => {
                send(e.target.files?.[0]);
                e.target.value = '';
              }}
            />
          </label>
          {fileName && upload.isPending ? (
            <p role="status" className="text-ink-soft">
              Sending {fileName}…
            </p>
          ) : null}
        </div>
      ) : null}

      {fileError ? (
        <Notice tone="error" testId="dem-upload-error">
          {fileError}
        </Notice>
      ) : null}
      {upload.isError ? (
        <Notice tone="error" title="The elevation model was not accepted" testId="dem-upload-error">
          {upload.error.message}
        </Notice>
      ) : null}
      {failed ? (
        <Notice tone="error" title="Working out the terrain failed" testId="terrain-job-failed">
          {failed.message || 'No reason was given: try the upload again.'}
        </Notice>
      ) : null}
      {job.isError ? <Notice tone="error">Progress is not available: {job.error.message}</Notice> : null}
    </section>
  );
}
