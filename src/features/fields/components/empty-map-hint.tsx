// Shown on the map of a farm without fields: without a basemap there is nothing to aim at, so
// offer the device's location, and point to the import.
import { useEffect, useRef, useState } from 'react';
import L from 'leaflet';
import { useMap } from 'react-leaflet';

export function EmptyMapHint({ canEdit, hasBasemap }: { canEdit: boolean; hasBasemap: boolean }) {
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
    <div className="absolute inset-x-0 bottom-8 z-[1000] flex justify-center px-4">
      <div ref={boxRef} className="max-w-md rounded-md border border-paper-edge bg-paper px-4 py-3 text-sm shadow" data-testid="empty-map-hint">
        <p className="font-semibold">No fields on this farm yet.</p>
        {canEdit ? (
          <p className="mt-1">
            Import outlines from a file to place the farm on the map
            {hasBasemap ? ', or zoom to the farm and draw the first field.' : '. Without a basemap, you can also go to where you stand and draw there.'}
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
