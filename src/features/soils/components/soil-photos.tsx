// Profile photos of the field: upload (JPEG, PNG or WebP; the server checks the content and
// the size and its answer is shown), a grid of thumbnails, and the full picture with its
// caption on a click. Farmer and advisor add and delete.
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import type { SoilPhoto, SoilSample } from '../../../../shared/schemas/soils';
import { useDeleteSoilPhoto } from '../api/delete-soil-photo';
import { useSoilPhotos } from '../api/get-soil-photos';
import { PHOTO_TYPES, useUploadSoilPhoto } from '../api/upload-soil-photo';
import { PHOTO_MAX_BYTES } from '../../../../shared/limits';
import { fmt, formatDay } from './format-soil';

const MB = 1024 * 1024;

function uploadMessage(error: unknown): string {
  if (isApiError(error, 413)) return `${(error as Error).message} A photo may be up to ${PHOTO_MAX_BYTES / MB} MB; send a smaller copy.`;
  return error instanceof Error ? error.message : 'The photo was not stored.';
}

function PhotoViewer({ photo, canEdit, fieldId, onClose, sampleLabel }: { photo: SoilPhoto; canEdit: boolean; fieldId: number; onClose: () => void; sampleLabel: string | null }) {
  const titleId = useId();
  const remove = useDeleteSoilPhoto(fieldId);
  const [confirm, setConfirm] = useState(false);
  return (
    <ModalDialog
      titleId={titleId}
      onClose={onClose}
      testId="soil-photo-viewer"
      backdrop="bg-ink/60"
      className="flex max-h-full w-full max-w-4xl flex-col gap-3 overflow-auto p-4"
    >
        <div className="flex items-start justify-between gap-2">
          <h2 id={titleId} className="text-lg font-semibold">
            {photo.caption || 'Soil profile photo'}
          </h2>
          <Button variant="secondary" size="sm" onClick={onClose}>
            Close
          </Button>
        </div>
        <img src={photo.url} alt={photo.caption || 'Soil profile photo'} width={photo.width} height={photo.height} className="h-auto max-h-[70vh] w-full object-contain" />
        <p className="num text-sm text-ink-soft">
          {fmt(photo.width, 0)} × {fmt(photo.height, 0)} pixels · {fmt(photo.byteSize / MB, 1)} MB · added {formatDay(photo.createdAt.slice(0, 10))}
          {sampleLabel ? ` · with sample ${sampleLabel}` : ''}
        </p>
        {canEdit ? (
          <div className="flex flex-wrap items-center gap-2">
            {confirm ? (
              <>
                <span className="text-sm">Delete this photo for good?</span>
                <Button variant="danger" size="sm" disabled={remove.isPending} onClick={() => remove.mutate(photo.id, { onSuccess: onClose })} data-testid="soil-photo-delete-confirm">
                  {remove.isPending ? 'Deleting…' : 'Yes, delete the photo'}
                </Button>
                <Button variant="secondary" size="sm" onClick={() => setConfirm(false)}>
                  Keep it
                </Button>
              </>
            ) : (
              <Button variant="danger" size="sm" onClick={() => setConfirm(true)} data-testid="soil-photo-delete">
                Delete photo
              </Button>
            )}
            {remove.isError ? <Notice tone="error">{remove.error.message}</Notice> : null}
          </div>
        ) : null}
    </ModalDialog>
  );
}

function PhotoUploadForm({ fieldId, samples }: { fieldId: number; samples: SoilSample[] }) {
  const inputId = useId();
  const upload = useUploadSoilPhoto(fieldId);
  const [caption, setCaption] = useState('');
  const [sampleId, setSampleId] = useState('');
  const [fileError, setFileError] = useState<string | null>(null);

  const send = (file: File | undefined) => {
    if (!file) return;
    upload.reset();
    // Only the size is checked here (it saves sending a big file over a field connection);
    // the server checks what the file really is.
    if (file.size > PHOTO_MAX_BYTES) {
      setFileError(`${file.name} is ${fmt(file.size / MB, 1)} MB; a photo may be up to ${PHOTO_MAX_BYTES / MB} MB. Send a smaller copy.`);
      return;
    }
    setFileError(null);
    upload.mutate(
      { file, caption: caption.trim() || undefined, sampleId: sampleId ? Number(sampleId) : null },
      { onSuccess: () => setCaption('') },
    );
  };

  return (
    <div className="flex flex-col gap-2 rounded-md border border-dashed border-ink-faint bg-white/40 p-3 text-sm">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex min-w-48 flex-1 flex-col gap-1 font-medium">
          Caption, optional
          <input
            value={caption}
            maxLength={200}
            onChange={(e) => setCaption(e.target.value)}
            placeholder="e.g. pit by the ditch, gray from 15 cm"
            data-testid="soil-photo-caption"
            className="rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base font-normal"
          />
        </label>
        {samples.length ? (
          <label className="flex flex-col gap-1 font-medium">
            With sample, optional
            <select value={sampleId} onChange={(e) => setSampleId(e.target.value)} className="rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base font-normal">
              <option value="">none</option>
              {samples.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label ?? `Sample ${s.id}`}
                </option>
              ))}
            </select>
          </label>
        ) : null}
        <label
          htmlFor={inputId}
          className={`cursor-pointer rounded-md border border-clay-dark bg-clay px-3 py-2 font-medium text-paper hover:bg-clay-dark focus-within:outline focus-within:outline-3 focus-within:outline-clay ${
            upload.isPending ? 'pointer-events-none opacity-60' : ''
          }`}
        >
          {upload.isPending ? 'Sending…' : 'Add a photo'}
          <input
            id={inputId}
            type="file"
            accept={PHOTO_TYPES.join(',')}
            className="sr-only"
            data-testid="soil-photo-input"
            disabled={upload.isPending}
            onChange={(e) => {
              send(e.target.files?.[0]);
              e.target.value = '';
            }}
          />
        </label>
      </div>
      <p className="text-ink-soft">
        JPEG, PNG or WebP, up to <span className="num">{PHOTO_MAX_BYTES / MB} MB</span>. A tape measure in the picture helps read the depths.
      </p>
      {fileError ? <Notice tone="error" testId="soil-photo-error">{fileError}</Notice> : null}
      {upload.isError ? (
        <Notice tone="error" title="The photo was not stored" testId="soil-photo-error">
          {uploadMessage(upload.error)}
        </Notice>
      ) : null}
    </div>
  );
}

export function SoilPhotos({ fieldId, canEdit, samples }: { fieldId: number; canEdit: boolean; samples: SoilSample[] }) {
  const photos = useSoilPhotos(fieldId);
  const [openId, setOpenId] = useState<number | null>(null);
  const open = photos.data?.find((p) => p.id === openId) ?? null;
  const labelOf = (id: number | null) => (id === null ? null : samples.find((s) => s.id === id)?.label ?? `Sample ${id}`);

  return (
    <section aria-labelledby="soil-photos-heading" className="flex flex-col gap-2" data-testid="soil-photos">
      <h3 id="soil-photos-heading" className="text-base font-semibold">
        Profile photos
      </h3>
      {canEdit ? <PhotoUploadForm fieldId={fieldId} samples={samples} /> : null}
      {photos.isPending ? (
        <p className="text-sm text-ink-soft">Loading…</p>
      ) : photos.isError ? (
        <Notice tone="error">{photos.error.message}</Notice>
      ) : photos.data.length === 0 ? (
        <p className="text-sm text-ink-soft">No photos of this field's soil yet.</p>
      ) : (
        <ul className="grid grid-cols-[repeat(auto-fill,minmax(9rem,1fr))] gap-3">
          {photos.data.map((p) => (
            <li key={p.id} data-testid="soil-photo">
              <button
                type="button"
                onClick={() => setOpenId(p.id)}
                className="flex w-full flex-col gap-1 rounded-md border border-paper-edge bg-white/60 p-1.5 text-left hover:border-clay"
              >
                <img
                  src={p.thumbnailUrl}
                  alt={p.caption || 'Soil profile photo'}
                  width={p.thumbnailWidth}
                  height={p.thumbnailHeight}
                  loading="lazy"
                  className="aspect-[4/3] w-full rounded object-cover"
                />
                <span className="line-clamp-2 text-sm">{p.caption || <span className="text-ink-soft">no caption</span>}</span>
                {p.sampleId !== null ? <span className="text-xs text-ink-soft">sample {labelOf(p.sampleId)}</span> : null}
              </button>
            </li>
          ))}
        </ul>
      )}
      {open ? <PhotoViewer photo={open} canEdit={canEdit} fieldId={fieldId} onClose={() => setOpenId(null)} sampleLabel={labelOf(open.sampleId)} /> : null}
    </section>
  );
}
