// The selected field's concentrated-flow cells (where water from a large upslope area gathers:
// candidates for a grassed waterway) as small dark-blue dots on a canvas above the outlines.
// Not clickable, ignored by the drawing tools.
import { useMemo } from 'react';
import L from 'leaflet';
import { CircleMarker } from 'react-leaflet';
import { pointsToLatLngs } from '../../../lib/geo-leaflet';

export const FLOW_PANE = 'fs-flow';
export const FLOW_COLOUR = '#08306b';
export const FLOW_LABEL = 'Where water gathers (grassed waterway candidate)';

export function FlowPointsLayer({ points }: { points: [number, number][] }) {
  const positions = useMemo(() => pointsToLatLngs(points), [points]);
  const renderer = useMemo(() => L.canvas({ pane: FLOW_PANE, pmIgnore: true }), []);
  const style = useMemo(
    () => ({ renderer, color: '#f7f3ea', weight: 0.75, fillColor: FLOW_COLOUR, fillOpacity: 0.95, opacity: 0.9 }),
    [renderer],
  );
  return (
    <>
      {positions.map((p, i) => (
        <CircleMarker
          key={i}
          center={p}
          radius={2.5}
          pathOptions={style}
          interactive={false}
          pmIgnore
          snapIgnore
        />
      ))}
    </>
  );
}
