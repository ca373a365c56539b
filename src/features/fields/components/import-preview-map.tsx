// The small map of an import preview: the farm's fields in grey, each feature of the file with
// its number (filled when ticked, dashed when not), a repaired outline over its dashed original.
// Loaded on demand with Leaflet, like the farm map.
import { Fragment, useEffect, useMemo } from 'react';
import { MapContainer, Polygon, Tooltip, useMap } from 'react-leaflet';
import type { PathOptions } from 'leaflet';
import '../../../lib/leaflet-setup';
import { geometriesBounds, geometryBounds, geometryToLatLngs } from '../../../lib/geo-leaflet';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { PreviewFeature } from '../../../../shared/schemas/field-import';
import type { AreaGeometry } from '../../../../shared/schemas/geojson';
import { FIELD_COLOR, FIELD_SELECTED_COLOR, refusedStyle } from './field-style';
import { BasemapTiles } from '../../../components/map/basemap-tiles';
import { useBasemap } from '../../config/use-basemap';

const existingStyle: PathOptions = { color: '#6b6459', weight: 1, fillColor: '#6b6459', fillOpacity: 0.12, dashArray: '2,3' };
const tickedStyle = (focused: boolean): PathOptions => ({ color: FIELD_SELECTED_COLOR, weight: focused ? 4 : 2, fillColor: FIELD_COLOR, fillOpacity: 0.4 });
const untickedStyle = (focused: boolean): PathOptions => ({ color: FIELD_SELECTED_COLOR, weight: focused ? 4 : 2, dashArray: '5,4', fillOpacity: 0.05 });

type Props = {
  features: PreviewFeature[];
  ticked: ReadonlySet<number>;
  /** The feature the list last asked to show; the map fits it. */
  focusIndex: number | null;
  existing: FieldFeature[];
};

function FitView({ geometries, focus }: { geometries: AreaGeometry[]; focus: AreaGeometry | null }) {
  const map = useMap();
  useEffect(() => {
    const bounds = focus ? geometryBounds(focus) : geometriesBounds(geometries);
    if (bounds) map.fitBounds(bounds, { padding: [16, 16], maxZoom: 17 });
  }, [map, geometries, focus]);
  return null;
}

function Outline({ geometry, style, label }: { geometry: AreaGeometry; style: PathOptions; label?: string }) {
  const positions = useMemo(() => geometryToLatLngs(geometry), [geometry]);
  return (
    <Polygon positions={positions} pathOptions={style} interactive={false} pmIgnore>
      {label ? <Tooltip permanent direction="center" className="fs-label">{label}</Tooltip> : null}
    </Polygon>
  );
}

export default function ImportPreviewMap({ features, ticked, focusIndex, existing }: Props) {
  const { basemap } = useBasemap();
  const shown = useMemo(() => features.filter((f): f is PreviewFeature & { geometry: AreaGeometry } => f.geometry !== null), [features]);
  const geometries = useMemo(() => shown.map((f) => f.geometry), [shown]);
  const focus = shown.find((f) => f.index === focusIndex)?.geometry ?? null;
  return (
    <MapContainer className="fs-map h-full w-full" center={[20, 0]} zoom={2} zoomSnap={0.25} attributionControl={basemap !== null}>
      {basemap ? <BasemapTiles basemap={basemap} /> : null}
      {existing.map((field) => (
        <Outline key={`field-${field.id}`} geometry={field.geometry} style={existingStyle} />
      ))}
      {shown.map((f) => (
        <Fragment key={f.index}>
          {f.original ? <Outline geometry={f.original} style={refusedStyle} /> : null}
          <Outline
            geometry={f.geometry}
            style={ticked.has(f.index) ? tickedStyle(f.index === focusIndex) : untickedStyle(f.index === focusIndex)}
            label={String(f.index)}
          />
        </Fragment>
      ))}
      <FitView geometries={geometries} focus={focus} />
    </MapContainer>
  );
}
