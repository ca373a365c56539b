// A small map of one field: its outline strong, the farm's other fields faint around it,
// filled with the field's risk colour when it has one, on the basemap the person picked.
import { useEffect, useMemo, useState } from 'react';
import { MapContainer, Polygon, useMap } from 'react-leaflet';
import { BasemapTiles, type BasemapReach } from '../../../components/map/basemap-tiles';
import type { Basemap } from '../../../../shared/schemas/config';
import '../../../lib/leaflet-setup';
import { geometryBounds, geometryToLatLngs } from '../../../lib/geo-leaflet';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { FIELD_COLOR, FIELD_SELECTED_COLOR } from '../../fields/components/field-style';

function Fit({ field }: { field: FieldFeature }) {
  const map = useMap();
  const shapeKey = JSON.stringify(field.geometry.coordinates);
  useEffect(() => {
    map.fitBounds(geometryBounds(field.geometry), { padding: [20, 20], maxZoom: 17 });
  }, [map, shapeKey]);
  return null;
}

type Props = { field: FieldFeature; others: FieldFeature[]; fillColour: string | null; basemap: Basemap | null };

export function FieldMiniMap({ field, others, fillColour, basemap }: Props) {
  const positions = useMemo(() => geometryToLatLngs(field.geometry), [field.geometry]);
  const [reach, setReach] = useState<BasemapReach>('loading');
  useEffect(() => setReach('loading'), [basemap?.key, basemap?.url]);
  return (
    <div className="print:hidden">
      <div className="h-64 w-full overflow-hidden rounded-md border border-paper-edge" data-testid="field-mini-map">
        <MapContainer className="fs-map h-full w-full" center={[20, 0]} zoom={2} zoomSnap={0.25} scrollWheelZoom={false}>
          {basemap ? <BasemapTiles basemap={basemap} onReach={setReach} /> : null}
          {others
            .filter((o) => o.id !== field.id)
            .map((o) => (
              <Polygon
                key={o.id}
                positions={geometryToLatLngs(o.geometry)}
                pathOptions={{ color: FIELD_COLOR, weight: 1, opacity: 0.5, fillOpacity: 0.05, interactive: false }}
              />
            ))}
          <Polygon
            positions={positions}
            pathOptions={{ color: FIELD_SELECTED_COLOR, weight: 3, fillColor: fillColour ?? FIELD_COLOR, fillOpacity: fillColour ? 0.8 : 0.3 }}
          />
          <Fit field={field} />
        </MapContainer>
      </div>
      {basemap && reach === 'unreachable' ? (
        <p role="status" className="mt-1 text-xs text-ink-soft" data-testid="basemap-unreachable">
          The basemap could not be reached; the outline is drawn on a plain background.
        </p>
      ) : null}
    </div>
  );
}
