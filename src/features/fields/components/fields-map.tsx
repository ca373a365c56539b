// The farm's map: its fields with labels, and for farmers the drawing tools. What lies under
// them (a web basemap, the farm's relief) comes in as children from the page.
import { lazy, Suspense } from 'react';
import type { ReactNode } from 'react';
import { MapContainer } from 'react-leaflet';
import '../../../lib/leaflet-setup';
import { useLatest } from '../../../lib/use-latest';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { AreaGeometry } from '../../../../shared/schemas/geojson';
import { FieldPolygon, type FieldLayerHandlers } from './field-polygon';
import { MapViewControl, type FocusRequest } from './map-view-control';
import { ShapePreviewLayers, type ShapePreview } from './shape-preview-layers';

// Loaded on first use: the drawing tools (geoman) load only for someone who may draw.
const DrawControls = lazy(() => import('./draw-controls').then((m) => ({ default: m.DrawControls })));

type Props = FieldLayerHandlers & {
  fields: FieldFeature[];
  farmBbox: [number, number, number, number] | null;
  selectedId: number | null;
  focus: FocusRequest;
  canEdit: boolean;
  /** Bumped to redraw every field from the cache (after a refused edit or removal). */
  layerEpoch: number;
  /** A refused outline and its repaired version, drawn until the user decides. */
  preview: ShapePreview | null;
  onCreate: (geometry: AreaGeometry) => void;
  onDrawError: (message: string) => void;
  children?: ReactNode;
};

export function FieldsMap(props: Props) {
  const { fields, farmBbox, selectedId, focus, canEdit, layerEpoch } = props;
  const handlers = useLatest<FieldLayerHandlers>({
    onSelect: props.onSelect,
    onEdited: props.onEdited,
    onRemoved: props.onRemoved,
  });

  return (
    <MapContainer
      className="fs-map h-full w-full"
      center={[20, 0]}
      zoom={2}
      minZoom={2}
      maxZoom={19}
      zoomSnap={0.25}
      preferCanvas={false}
    >
      {fields.map((field) => (
        <FieldPolygon
          key={`${field.id}:${field.properties.version}:${layerEpoch}`}
          field={field}
          selected={field.id === selectedId}
          handlers={handlers}
        />
      ))}
      {props.preview ? <ShapePreviewLayers preview={props.preview} /> : null}
      <MapViewControl fields={fields} farmBbox={farmBbox} focus={focus} />
      {canEdit ? (
        <Suspense fallback={null}>
          <DrawControls onCreate={props.onCreate} onDrawError={props.onDrawError} />
        </Suspense>
      ) : null}
      {props.children}
    </MapContainer>
  );
}
