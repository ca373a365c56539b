// The farm's soil map: upload (GeoJSON or a zipped shapefile of map units with attributes),
// what was read (units, warnings, refused features), the attributes with sample values, and the
// form that says which attribute gives texture, K, soil group, T and drainage. Farmer and
// advisor only: a landowner gets a short line instead (the server answers 403).
import { lazy, Suspense, useId, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { isApiError } from '../../../lib/api-client';
import { useDeleteSoilMap } from '../api/delete-soil-map';
import { useSoilMap } from '../api/get-soil-map';
import { SOIL_MAP_EXTENSIONS, useUploadSoilMap } from '../api/upload-soil-map';
import { SOIL_MAP_MAX_BYTES } from '../../../../shared/limits';
import { formatDay } from './format-soil';

// The mapping form (and the soil schemas it reads) loads once a farm has a soil map, not with the farm map.
const SoilMapMappingForm = lazy(() => import('./soil-map-mapping-form').then((m) => ({ default: m.SoilMapMappingForm })));

const MB = 1024 * 1024;

export type SoilMapPanelProps = { farmId: number; role: 'farmer' | 'advisor' | 'landowner' };

function checkMapFile(file: File): string | null {
  const lower = file.name.toLowerCase();
  if (!SOIL_MAP_EXTENSIONS.some((e) => lower.endsWith(e))) return `${file.name} is not a soil map Fieldshed can read. Use GeoJSON (.geojson, .json) or a zipped shapefile (.zip).`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > SOIL_MAP_MAX_BYTES) return `${file.name} is ${(file.size / MB).toFixed(1)} MB; the limit is ${SOIL_MAP_MAX_BYTES / MB} MB.`;
  return null;
}

type Refused = { index: number; reason: string }[];
const refusedOf = (error: unknown): Refused => {
  const r = isApiError(error) ? (error.details as { rejected?: unknown } | undefined)?.rejected : undefined;
  return Array.isArray(r) ? (r as Refused) : [];
};

function RefusedList({ refused }: { refused: Refused }) {
  if (!refused.length) return null;
  return (
    <ul className="mt-1 flex max-h-32 flex-col gap-0.5 overflow-auto">
      {refused.map((r) => (
        <li key={r.index}>{/^feature\b/i.test(r.reason) ? r.reason : `Feature ${r.index}: ${r.reason}`}</li>
      ))}
    </ul>
  );
}

export function SoilMapPanel({ farmId, role }: SoilMapPanelProps) {
  const canEdit = role !== 'landowner';
  const info = useSoilMap(farmId, canEdit);
  const upload = useUploadSoilMap(farmId);
  const remove = useDeleteSoilMap(farmId);
  const inputId = useId();
  const [fileError, setFileError] = useState<string | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);

  if (!canEdit) {
    return (
      <section data-testid="soil-map-panel" className="rounded-md border border-paper-edge bg-white/40 p-3 text-sm text-ink-soft">
        The farm's soil map is kept by the farmer and the advisor.
      </section>
    );
  }

  const send = (file: File | undefined) => {
    if (!file) return;
    setFileName(file.name);
    const problem = checkMapFile(file);
    setFileError(problem);
    upload.reset();
    if (!problem) upload.mutate(file);
  };
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    send(e.dataTransfer.files[0]);
  };

  const map = info.data?.map ?? null;

  return (
    <section aria-labelledby={`${inputId}-heading`} data-testid="soil-map-panel" className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3">
      <h2 id={`${inputId}-heading`} className="text-lg font-semibold">
        Farm soil map
      </h2>
      {info.isPending ? (
        <p className="text-sm text-ink-soft">Loading…</p>
      ) : info.isError ? (
        <Notice tone="error">{info.error.message}</Notice>
      ) : map ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="soil-map-facts">
          <dt className="text-ink-soft">File</dt>
          <dd className="min-w-0 break-words">{map.originalName}</dd>
          <dt className="text-ink-soft">Map units</dt>
          <dd className="num">{map.unitCount.toLocaleString('en-US')} outlines</dd>
          <dt className="text-ink-soft">Added</dt>
          <dd className="num">{formatDay(map.uploadedAt.slice(0, 10))}</dd>
        </dl>
      ) : (
        <p className="text-sm text-ink-soft" data-testid="soil-map-none">
          No soil map yet. A map of soil units (from a soil survey, say) gives each field area-weighted K and T and its mix of
          hydrologic soil groups.
        </p>
      )}
      {map?.warnings.length ? (
        <Notice tone="caution" title="Read with warnings">
          <ul className="list-inside list-disc">
            {map.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Notice>
      ) : null}

      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={`flex flex-col items-start gap-2 rounded-md border-2 border-dashed px-3 py-3 text-sm ${dragging ? 'border-clay bg-clay-light' : 'border-ink-faint bg-white/40'}`}
      >
        <p>
          {map ? 'Replace it: drop' : 'Drop'} GeoJSON or a zipped shapefile of map units here (up to{' '}
          <span className="num">{SOIL_MAP_MAX_BYTES / MB} MB</span>), or
        </p>
        <label
          htmlFor={inputId}
          className={`cursor-pointer rounded-md border border-clay-dark bg-clay px-3 py-1.5 font-medium text-paper hover:bg-clay-dark focus-within:outline focus-within:outline-3 focus-within:outline-clay ${upload.isPending ? 'pointer-events-none opacity-60' : ''}`}
        >
          Choose a soil map file
          <input
            id={inputId}
            type="file"
            accept={SOIL_MAP_EXTENSIONS.join(',')}
            className="sr-only"
            data-testid="soil-map-input"
            disabled={upload.isPending}
            onChange={(e) => {
              send(e.target.files?.[0]);
              e.target.value = '';
            }}
          />
        </label>
        {fileName && upload.isPending ? <p role="status">Reading {fileName}…</p> : null}
      </div>
      {fileError ? <Notice tone="error">{fileError}</Notice> : null}
      {upload.isError ? (
        <Notice tone="error" title="The soil map was not stored" testId="soil-map-error">
          <p>{upload.error.message}</p>
          <RefusedList refused={refusedOf(upload.error)} />
        </Notice>
      ) : null}
      {upload.data?.rejected.length ? (
        <Notice tone="caution" title={`${upload.data.rejected.length} ${upload.data.rejected.length === 1 ? 'feature was' : 'features were'} left out`}>
          <RefusedList refused={upload.data.rejected} />
        </Notice>
      ) : null}

      {map && info.data ? (
        <>
          <details className="text-sm" data-testid="soil-map-attributes">
            <summary className="cursor-pointer font-medium">
              Attributes in the map (<span className="num">{info.data.attributes.length}</span>)
            </summary>
            <div className="mt-1 overflow-x-auto">
              <table className="w-full border-collapse">
                <thead>
                  <tr className="border-b border-paper-edge text-left text-ink-soft">
                    <th scope="col" className="px-2 py-1 font-medium">Attribute</th>
                    <th scope="col" className="px-2 py-1 font-medium">Different values</th>
                    <th scope="col" className="px-2 py-1 font-medium">For example</th>
                  </tr>
                </thead>
                <tbody>
                  {info.data.attributes.map((a) => (
                    <tr key={a.name} className="border-b border-paper-edge last:border-b-0">
                      <td className="px-2 py-1 font-mono text-xs">{a.name}</td>
                      <td className="num px-2 py-1">{a.distinctValues.toLocaleString('en-US')}</td>
                      <td className="px-2 py-1">{a.sampleValues.join(', ') || <span className="text-ink-faint">(empty)</span>}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </details>
          <Suspense fallback={<Loading label="Opening the form…" />}>
            <SoilMapMappingForm key={map.id} farmId={farmId} info={info.data} />
          </Suspense>
          <div className="flex flex-wrap items-center gap-2 border-t border-paper-edge pt-2">
            {confirmDelete ? (
              <>
                <span className="text-sm">Remove the soil map from the farm?</span>
                <Button variant="danger" size="sm" disabled={remove.isPending} onClick={() => remove.mutate(undefined, { onSuccess: () => setConfirmDelete(false) })}>
                  {remove.isPending ? 'Removing…' : 'Yes, remove it'}
                </Button>
                <Button variant="secondary" size="sm" onClick={() => setConfirmDelete(false)}>
                  Keep it
                </Button>
              </>
            ) : (
              <Button variant="danger" size="sm" onClick={() => setConfirmDelete(true)} data-testid="soil-map-delete">
                Remove the soil map
              </Button>
            )}
            {remove.isError ? <Notice tone="error">{remove.error.message}</Notice> : null}
          </div>
        </>
      ) : null}
    </section>
  );
}
