// Keeps the map's view on the farm: fits all fields once when they first arrive, and flies to a
// field when the list asks for it (focusRequest changes).
import { useEffect, useRef } from 'react';
import { useMap } from 'react-leaflet';
import type L from 'leaflet';
import { bboxToBounds, geometriesBounds, geometryBounds } from '../../../lib/geo-leaflet';
import type { FieldFeature } from '../../../../shared/schemas/field';

export type FocusRequest = { fieldId: number; seq: number } | null;

type Props = {
  fields: FieldFeature[];
  farmBbox: [number, number, number, number] | null;
  focus: FocusRequest;
};

const PADDING: [number, number] = [32, 32];
/** The layers panel (16 rem wide) sits open on the map's right edge on wide screens: fit the fields beside it, not under it. */
const LAYERS_PANEL_PX = 16 * 16 + 8;

function fitPadding(map: L.Map): L.FitBoundsOptions {
  const panelOpen = window.innerWidth >= 640 && map.getSize().x > 2.5 * LAYERS_PANEL_PX;
  return { paddingTopLeft: PADDING, paddingBottomRight: [PADDING[0] + (panelOpen ? LAYERS_PANEL_PX : 0), PADDING[1]], maxZoom: 17 };
}

export function MapViewControl({ fields, farmBbox, focus }: Props) {
  const map = useMap();
  const fitted = useRef(false);

  useEffect(() => {
    if (fitted.current) return;
    const bounds = geometriesBounds(fields.map((f) => f.geometry)) ?? (farmBbox ? bboxToBounds(farmBbox) : null);
    if (!bounds) return;
    map.fitBounds(bounds, fitPadding(map));
    fitted.current = true;
  }, [map, fields, farmBbox]);

  const lastSeq = useRef<number | null>(null);
  useEffect(() => {
    if (!focus || focus.seq === lastSeq.current) return;
    lastSeq.current = focus.seq;
    const field = fields.find((f) => f.id === focus.fieldId);
    if (field) map.flyToBounds(geometryBounds(field.geometry), { ...fitPadding(map), duration: 0.6 });
  }, [map, focus, fields]);

  return null;
}
