// Keeps the map's view on the farm: fits all fields once when they first arrive, and flies to a
// field when the list asks for it (focusRequest changes).
import { useEffect, useRef } from 'react';
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

export function MapViewControl({ fields, farmBbox, focus }: Props) {
  const map = useMap();
  const fitted = useRef(false);

  useEffect(() => {
    if (fitted.current) return;
    const bounds = geometriesBounds(fields.map((f) => f.geometry)) ?? (farmBbox ? bboxToBounds(farmBbox) : null);
    if (!bounds) return;
    map.fitBounds(bounds, { padding: PADDING, maxZoom: 17 });
    fitted.current = true;
  }, [map, fields, farmBbox]);

  const lastSeq = useRef<number | null>(null);
  useEffect(() => {
    if (!focus || focus.seq === lastSeq.current) return;
    lastSeq.current = focus.seq;
    const field = fields.find((f) => f.id === focus.fieldId);
    if (field) map.flyToBounds(geometryBounds(field.geometry), { padding: PADDING, maxZoom: 17, duration: 0.6 });
  }, [map, focus, fields]);

  return null;
}
