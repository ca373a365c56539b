// Keeps the map's view on the farm: fits all fields once when they first arrive, and flies to a
// field when the list asks for it (focusRequest changes).
import { useEffect, useRef } from 'react';
import type L from 'leaflet';
import { useMap } from 'react-leaflet';
import { bboxToBounds, geometriesBounds, geometryBounds } from '../../../lib/geo-leaflet';
import type { FieldFeature } from '../../../../shared/schemas/field';

export type FocusRequest = { fieldId: number; seq: number } | null;

type Props = {
  fields: FieldFeature[];
  farmBbox: [number, number, number, number] | null;
  focus: FocusRequest;
};

const PADDING: [number, number] = [32, 32];
/** The map layers panel (w-64, 256 px; open when the window is 640 px wide or more) sits at the top right: the fields are fitted beside it, not under it. */
const LAYERS_PANEL_PX = 256 + 16;
const PANEL_OPEN_FROM_PX = 640;

/** Padding that keeps the fields clear of the layers panel on a wide map. */
function fitPadding(map: L.Map): L.FitBoundsOptions {
  // Only where the map itself has room for both; a narrow map keeps the plain padding.
  const wide = window.innerWidth >= PANEL_OPEN_FROM_PX && map.getSize().x >= 2 * LAYERS_PANEL_PX;
  return { paddingTopLeft: PADDING, paddingBottomRight: [wide ? PADDING[0] + LAYERS_PANEL_PX : PADDING[0], PADDING[1]] };
}

export function MapViewControl({ fields, farmBbox, focus }: Props) {
  const map = useMap();
  const fitted = useRef(false);

  useEffect(() => {
    if (fitted.current) return;
    const bounds = geometriesBounds(fields.map((f) => f.geometry)) ?? (farmBbox ? bboxToBounds(farmBbox) : null);
    if (!bounds) return;
    map.fitBounds(bounds, { ...fitPadding(map), maxZoom: 17 });
    fitted.current = true;
  }, [map, fields, farmBbox]);

  const lastSeq = useRef<number | null>(null);
  useEffect(() => {
    if (!focus || focus.seq === lastSeq.current) return;
    lastSeq.current = focus.seq;
    const field = fields.find((f) => f.id === focus.fieldId);
    if (field) map.flyToBounds(geometryBounds(field.geometry), { ...fitPadding(map), maxZoom: 17, duration: 0.6 });
  }, [map, focus, fields]);

  return null;
}
