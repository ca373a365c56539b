// One field on the map: its outline, a small permanent name label, click to select.
// Its event handlers are created once per field and call the latest callbacks through a ref,
// so edits and removals never reach a stale handler.
import { memo, useMemo, type RefObject } from 'react';
import type { Layer } from 'leaflet';
import { Polygon, Tooltip } from 'react-leaflet';
import { geometryToLatLngs } from '../../../lib/geo-leaflet';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { fieldStyle } from './field-style';

export type FieldLayerHandlers = {
  onSelect: (fieldId: number) => void;
  /** geoman finished editing this layer (edit mode switched off) and the outline changed. */
  onEdited: (fieldId: number, layer: Layer) => void;
  /** geoman's removal tool took this layer off the map. */
  onRemoved: (fieldId: number) => void;
};

type Props = { field: FieldFeature; selected: boolean; handlers: RefObject<FieldLayerHandlers> };

export const FieldPolygon = memo(function FieldPolygon({ field, selected, handlers }: Props) {
  const fieldId = field.id;
  // Keyed on the coordinates, not the object: a refetch with the same outline must not
  // reset a layer that geoman may be editing.
  const shapeKey = JSON.stringify(field.geometry.coordinates);
  const positions = useMemo(() => geometryToLatLngs(field.geometry), [shapeKey]);
  const eventHandlers = useMemo(
    () => ({
      click: () => handlers.current.onSelect(fieldId),
      'pm:update': (e: { layer: Layer }) => handlers.current.onEdited(fieldId, e.layer),
      'pm:remove': () => handlers.current.onRemoved(fieldId),
    }),
    [fieldId, handlers],
  );

  return (
    <Polygon positions={positions} pathOptions={fieldStyle(selected)} eventHandlers={eventHandlers}>
      <Tooltip
        key={selected ? 'selected' : 'plain'}
        permanent
        direction="center"
        className={selected ? 'fs-label fs-label-selected' : 'fs-label'}
      >
        {field.properties.name}
      </Tooltip>
    </Polygon>
  );
});
