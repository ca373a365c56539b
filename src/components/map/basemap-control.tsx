// The farm map's base: the picked web basemap drawn under everything, a small picker at the
// bottom left (the installation's bases and "Farm relief only"), and a calm note when the tile
// service cannot be reached — the farm's own relief and fields still show, so work goes on.
import { useEffect, useId, useRef, useState } from 'react';
import L from 'leaflet';
import type { Basemap } from '../../../shared/schemas/config';
import { BasemapTiles, type BasemapReach } from './basemap-tiles';

type Props = {
  basemaps: Basemap[];
  basemap: Basemap | null;
  chosenKey: string;
  onChoose: (key: string) => void;
  /** The key that means "no web basemap". */
  noneKey: string;
};

export function BasemapControl({ basemaps, basemap, chosenKey, onChoose, noneKey }: Props) {
  const id = useId();
  const boxRef = useRef<HTMLDivElement>(null);
  const [reach, setReach] = useState<BasemapReach>('loading');
  const [attempt, setAttempt] = useState(0);
  // Clicks and scrolls on the control must not reach the map (they would add corners while drawing).
  useEffect(() => {
    if (!boxRef.current) return;
    L.DomEvent.disableClickPropagation(boxRef.current);
    L.DomEvent.disableScrollPropagation(boxRef.current);
  }, []);
  useEffect(() => setReach('loading'), [basemap?.key, basemap?.url]);

  return (
    <>
      {basemap ? <BasemapTiles basemap={basemap} attempt={attempt} onReach={setReach} /> : null}
      {basemaps.length > 0 ? (
        <div className="absolute bottom-6 left-2 z-[1000] max-w-[calc(100%-1rem)] sm:max-w-xs">
          <div ref={boxRef} data-testid="basemap-control" className="flex flex-col gap-1 rounded-md border border-paper-edge bg-paper/95 px-2 py-1.5 text-sm shadow">
            <div className="flex items-center gap-2">
              <label htmlFor={id} className="font-medium">
                Basemap
              </label>
              <select
                id={id}
                data-testid="basemap-picker"
                value={chosenKey}
                onChange={(e) => onChoose(e.target.value)}
                className="min-w-0 flex-1 rounded border border-ink-faint bg-paper px-1.5 py-0.5"
              >
                {basemaps.map((b) => (
                  <option key={b.key} value={b.key}>
                    {b.name}
                  </option>
                ))}
                <option value={noneKey}>Farm relief only</option>
              </select>
            </div>
            {basemap && reach === 'unreachable' ? (
              <div role="status" data-testid="basemap-unreachable" className="flex max-w-xs items-start gap-2 text-ink-soft">
                <p className="flex-1">
                  “{basemap.name}” could not be reached; the farm's own relief and fields are shown.
                </p>
                <button type="button" className="shrink-0 text-xs underline" onClick={() => setAttempt((n) => n + 1)}>
                  Try again
                </button>
              </div>
            ) : null}
          </div>
        </div>
      ) : null}
    </>
  );
}
