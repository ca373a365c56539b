// Finding a place on the map: typed coordinates (decimal degrees or degrees-minutes-seconds) are
// read right here with no service; anything else is looked up by name or address on the server.
// Choosing a match flies the map there and marks the spot. Sits at the map's top left.
import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import L from 'leaflet';
import { CircleMarker, Tooltip, useMap } from 'react-leaflet';
import { positionToLatLng } from '../../../lib/geo-leaflet';
import { parseCoordinates } from '../../../../shared/geo/parse-coordinates';
import type { Place } from '../../../../shared/schemas/places';
import { useSearchPlaces } from '../api/search-places';

/** Zoom for a typed position (a few fields across) and for a named place (a neighbourhood). */
const COORDINATE_ZOOM = 16;
const PLACE_ZOOM = 15;

type Found = { label: string; position: [number, number] };

function Results({ places, q, onChoose }: { places: Place[]; q: string; onChoose: (p: Place) => void }) {
  if (places.length === 0) {
    return (
      <p role="status" data-testid="place-search-message" className="px-3 py-2">
        No place matching “{q}” was found. Try another spelling, a nearby town, or type coordinates such as 42.3071, -91.7770.
      </p>
    );
  }
  return (
    <ul aria-label="Places found" className="max-h-64 overflow-y-auto py-1">
      {places.map((p, i) => (
        <li key={`${p.position.join(',')}:${i}`}>
          <button type="button" data-testid="place-result" onClick={() => onChoose(p)} className="w-full px-3 py-1.5 text-left hover:bg-paper-deep">
            <span className="font-medium">{p.name}</span>
            {p.detail ? <span className="block text-xs text-ink-soft">{p.detail}</span> : null}
          </button>
        </li>
      ))}
    </ul>
  );
}

export function PlaceSearch() {
  const map = useMap();
  const inputId = useId();
  const boxRef = useRef<HTMLDivElement>(null);
  const [text, setText] = useState('');
  const [submitted, setSubmitted] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [found, setFound] = useState<Found | null>(null);
  const search = useSearchPlaces(submitted);
  // Clicks, scrolls and keys in the box must not reach the map (they would pan it or add corners while drawing).
  useEffect(() => {
    if (!boxRef.current) return;
    L.DomEvent.disableClickPropagation(boxRef.current);
    L.DomEvent.disableScrollPropagation(boxRef.current);
  }, []);

  const goTo = (label: string, position: [number, number], zoom: number) => {
    setFound({ label, position });
    map.flyTo(positionToLatLng(position), zoom, { duration: 0.8 });
  };

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const q = text.trim();
    setProblem(null);
    if (!q) return;
    const typed = parseCoordinates(q);
    if (typed.ok) {
      setSubmitted(null);
      goTo(q, typed.position, COORDINATE_ZOOM);
    } else if (typed.reason !== 'not-coordinates') {
      setSubmitted(null);
      setProblem(typed.message);
    } else if (q.length < 2) {
      setProblem('Type at least 2 letters of a place name or an address.');
    } else setSubmitted(q);
  };

  const choose = (p: Place) => {
    setSubmitted(null);
    goTo(p.name, p.position, PLACE_ZOOM);
  };

  return (
    <>
      <div className="absolute left-12 right-2 top-2.5 z-[1001] sm:right-auto sm:w-80">
        <div ref={boxRef} data-testid="place-search" className="rounded-md border border-paper-edge bg-paper text-sm shadow">
          <form role="search" onSubmit={onSubmit} className="flex items-center gap-1 p-1">
            <label htmlFor={inputId} className="sr-only">
              Find a place: a name, an address or coordinates
            </label>
            <input
              id={inputId}
              type="search"
              data-testid="place-search-input"
              value={text}
              onChange={(e) => setText(e.target.value)}
              placeholder="Find a place or coordinates"
              autoComplete="off"
              className="min-w-0 flex-1 rounded border border-ink-faint bg-paper px-2 py-1"
            />
            <button type="submit" data-testid="place-search-submit" className="rounded bg-clay px-2.5 py-1 font-medium text-paper hover:opacity-90">
              Find
            </button>
          </form>
          {problem ? (
            <p role="alert" data-testid="place-search-message" className="border-t border-paper-edge px-3 py-2 text-alert">
              {problem}
            </p>
          ) : null}
          {submitted !== null ? (
            <div className="border-t border-paper-edge">
              {search.isPending ? (
                <p role="status" className="px-3 py-2 text-ink-soft">
                  Looking for “{submitted}”…
                </p>
              ) : search.isError ? (
                <p role="alert" data-testid="place-search-message" className="px-3 py-2 text-alert">
                  {search.error.message}
                </p>
              ) : (
                <Results places={search.data.places} q={submitted} onChoose={choose} />
              )}
            </div>
          ) : null}
        </div>
      </div>
      {found ? (
        <CircleMarker
          key={found.position.join(',')}
          center={positionToLatLng(found.position)}
          radius={7}
          pathOptions={{ color: '#1f1b16', weight: 2, fillColor: '#f7f3ea', fillOpacity: 0.9 }}
          interactive={false}
          pmIgnore
          snapIgnore
          className="fs-found-place"
        >
          <Tooltip permanent direction="right" offset={[8, 0]} className="fs-label">
            {found.label}
          </Tooltip>
        </CircleMarker>
      ) : null}
    </>
  );
}
