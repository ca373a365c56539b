// What a soil check made standing in the field can carry besides the answers: a photo of the
// profile (the phone's back camera opens, or a picture from the gallery) and the GPS position
// with the accuracy the phone gives. Both optional; the position is asked for only on a tap.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import type { FieldPosition } from '../../../../shared/schemas/soils';
import { PHOTO_MAX_BYTES } from '../../../../shared/limits';
import { PHOTO_TYPES } from '../api/upload-soil-photo';
import { fmt } from './format-soil';

const MB = 1024 * 1024;

export type FieldExtras = { photo: File | null; position: FieldPosition | null };

/** Why the phone gave no position, in words (GeolocationPositionError codes 1–3). */
const POSITION_FAILURES: Record<number, string> = {
  1: 'This browser is not allowed to tell your position. Allow it in the site settings, or save the check without it.',
  2: 'The phone could not find its position here. Try again in the open, or save the check without it.',
  3: 'The phone took too long to find its position. Try again, or save the check without it.',
};

function PositionInput({ position, onChange }: { position: FieldPosition | null; onChange: (p: FieldPosition | null) => void }) {
  const [state, setState] = useState<{ kind: 'idle' | 'finding' } | { kind: 'failed'; reason: string }>({ kind: 'idle' });
  const find = () => {
    if (!('geolocation' in navigator)) return setState({ kind: 'failed', reason: 'This browser cannot tell your position.' });
    setState({ kind: 'finding' });
    navigator.geolocation.getCurrentPosition(
      (p) => {
        onChange({ lng: p.coords.longitude, lat: p.coords.latitude, accuracyM: p.coords.accuracy });
        setState({ kind: 'idle' });
      },
      (e) => setState({ kind: 'failed', reason: POSITION_FAILURES[e.code] ?? e.message }),
      { enableHighAccuracy: true, timeout: 30_000, maximumAge: 60_000 },
    );
  };
  return (
    <div className="flex flex-col gap-1">
      <span className="text-sm font-medium">Where you are standing (optional)</span>
      {position ? (
        <p className="num text-sm" data-testid="check-position">
          {fmt(position.lat, 5)}°, {fmt(position.lng, 5)}° · within about {fmt(position.accuracyM, 0)} m
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" onClick={find} disabled={state.kind === 'finding'} data-testid="check-find-position">
          {state.kind === 'finding' ? 'Finding your position…' : position ? 'Find it again' : 'Use my position'}
        </Button>
        {position ? (
          <Button variant="quiet" onClick={() => onChange(null)}>
            Leave the position out
          </Button>
        ) : null}
      </div>
      {state.kind === 'failed' ? <p className="text-sm text-alert">{state.reason}</p> : null}
    </div>
  );
}

function PhotoInput({ photo, onChange }: { photo: File | null; onChange: (f: File | null) => void }) {
  const tooBig = photo !== null && photo.size > PHOTO_MAX_BYTES;
  return (
    <div className="flex flex-col gap-1">
      <label className="flex flex-col gap-1 text-sm font-medium">
        A photo of the profile (optional)
        <input
          type="file"
          accept={PHOTO_TYPES.join(',')}
          capture="environment"
          data-testid="check-photo"
          onChange={(e) => onChange(e.target.files?.[0] ?? null)}
          className="text-sm file:mr-2 file:rounded-md file:border file:border-ink-faint file:bg-paper file:px-3 file:py-2"
        />
      </label>
      {photo ? (
        <p className="num text-sm text-ink-soft">
          {photo.name}, {photo.size < MB / 10 ? `${fmt(photo.size / 1024, 0)} kB` : `${fmt(photo.size / MB, 1)} MB`}
        </p>
      ) : null}
      {tooBig ? <p className="text-sm text-alert">A photo may be up to {PHOTO_MAX_BYTES / MB} MB; take a smaller one.</p> : null}
    </div>
  );
}

export function FieldExtrasInputs({ value, onChange }: { value: FieldExtras; onChange: (v: FieldExtras) => void }) {
  return (
    <div className="flex flex-col gap-3 rounded-md border border-paper-edge p-3">
      <PhotoInput photo={value.photo} onChange={(photo) => onChange({ ...value, photo })} />
      <PositionInput position={value.position} onChange={(position) => onChange({ ...value, position })} />
    </div>
  );
}

export const photoTooBig = (v: FieldExtras) => v.photo !== null && v.photo.size > PHOTO_MAX_BYTES;
