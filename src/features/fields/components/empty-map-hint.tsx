// Shown on the map of a farm without fields: point to the place search and the import, and offer
// the device's location (standing in the field).
import { useEffect, useRef, useState } from 'react';
import L from 'leaflet';
import { useMap } from 'react-leaflet';

export function EmptyMapHint({ canEdit }: { canEdit: boolean }) {
  const map = useMap();
  const [locating, setLocating] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const boxRef = useRef<HTMLDivElement>(null);
  // Clicks on the hint must not reach the map (they would add corners while drawing).
  useEffect(() => {
    if (!boxRef.current) return;
    L.DomEvent.disableClickPropagation(boxRef.current);
    L.DomEvent.disableScrollPropagation(boxRef.current);
  }, []);
  const canLocate = typeof navigator !== 'undefined' && 'geolocation' in navigator;

  const locate = () => {
    setLocating(true);
    setProblem(null);
    navigator.geolocation.getCurrentPosition(
      (pos) => {
        setLocating(false);
        map.setView([pos.coords.latitude, pos.coords.longitude], 16);
      },
      (err) => {
        setLocating(false);
        setProblem(`Your location is not available (${err.message || 'permission refused'}).`);
      },
      { enableHighAccuracy: true, timeout: 15_000 },
    );
  };

  return (
    <div className="pointer-events-none absolute inset-x-0 bottom-20 z-[1000] flex justify-center px-4 sm:bottom-8">
      <div ref={boxRef} className="pointer-events-auto max-w-md rounded-md border border-paper-edge bg-paper px-4 py-3 text-sm shadow" data-testid="empty-map-hint">
        <p className="font-semibold">No fields on this farm yet.</p>
        {canEdit ? (
          <p className="mt-1">
            Find the farm with the search box at the top (a place name, an address or coordinates) and draw the
            first field, or import outlines from a file.
          </p>
        ) : (
          <p className="mt-1">The farmer has not added any fields yet.</p>
        )}
        {canEdit && canLocate ? (
          <button
            type="button"
            onClick={locate}
            disabled={locating}
            className="mt-2 rounded border border-ink-faint bg-paper px-2.5 py-1 font-medium hover:bg-paper-deep"
          >
            {locating ? 'Finding where you are…' : 'Go to my location'}
          </button>
        ) : null}
        {problem ? (
          <p role="alert" className="mt-1 text-alert">
            {problem}
          </p>
        ) : null}
      </div>
    </div>
  );
}
