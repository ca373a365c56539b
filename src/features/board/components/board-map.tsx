// The board as a choropleth: each field filled with its risk class colour (ColorBrewer YlOrBr)
// and labelled in words; fields not assessed are grey, dashed and labelled so. The picked
// field is outlined in ink and the map flies to it.
import { useEffect, useMemo, useRef } from 'react';
import { MapContainer, Polygon, TileLayer, Tooltip, useMap } from 'react-leaflet';
import type { PathOptions } from 'leaflet';
import '../../../lib/leaflet-setup';
import { geometriesBounds, geometryBounds, geometryToLatLngs } from '../../../lib/geo-leaflet';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import { NOT_ASSESSED_FILL, NOT_ASSESSED_LABEL } from './risk-badge';

const INK = '#1f1b16';
const EDGE = '#574d42';
const PADDING: [number, number] = [24, 24];

const styleFor = (row: BoardRow | undefined, selected: boolean): PathOptions => {
  const assessed = Boolean(row?.riskClass);
  return {
    color: selected ? INK : EDGE,
    weight: selected ? 4 : 1.5,
    opacity: 1,
    dashArray: assessed ? undefined : '5,4',
    fillColor: row?.riskClass?.colour ?? NOT_ASSESSED_FILL,
    fillOpacity: assessed ? 0.85 : 0.55,
  };
};

function FitAndFocus({ fields, selectedId }: { fields: FieldFeature[]; selectedId: number | null }) {
  const map = useMap();
  const fitted = useRef(false);
  useEffect(() => {
    if (fitted.current) return;
    const bounds = geometriesBounds(fields.map((f) => f.geometry));
    if (!bounds) return;
    map.fitBounds(bounds, { padding: PADDING, maxZoom: 17 });
    fitted.current = true;
  }, [map, fields]);
  // Fly only when the pick changes, not when the board is read again.
  const flownTo = useRef<number | null>(null);
  useEffect(() => {
    if (selectedId === flownTo.current) return;
    const field = fields.find((f) => f.id === selectedId);
    if (!field) return;
    flownTo.current = selectedId;
    map.flyToBounds(geometryBounds(field.geometry), { padding: [60, 60], maxZoom: 16, duration: 0.5 });
  }, [map, fields, selectedId]);
  return null;
}

function BoardPolygon({ field, row, selected, onSelect }: { field: FieldFeature; row: BoardRow | undefined; selected: boolean; onSelect: (id: number) => void }) {
  const positions = useMemo(() => geometryToLatLngs(field.geometry), [field.geometry]);
  const handlers = useMemo(() => ({ click: () => onSelect(field.id) }), [onSelect, field.id]);
  // The class's name before its colon ("Severe"), so labels fit on small fields; the key
  // beside the map gives the whole name and the A/T range.
  const classText = row?.riskClass ? row.riskClass.label.split(':')[0] : NOT_ASSESSED_LABEL.toLowerCase();
  return (
    <Polygon positions={positions} pathOptions={styleFor(row, selected)} eventHandlers={handlers}>
      <Tooltip key={selected ? 'selected' : 'plain'} permanent direction="center" className={selected ? 'fs-label fs-label-selected' : 'fs-label'}>
        <span className="block text-center">{field.properties.name}</span>
        <span className="block text-center font-normal">{classText}</span>
      </Tooltip>
    </Polygon>
  );
}

type Props = {
  fields: FieldFeature[];
  rows: BoardRow[];
  selectedId: number | null;
  onSelect: (fieldId: number) => void;
  tileUrl?: string | null;
  tileAttribution?: string | null;
};

export function BoardMap({ fields, rows, selectedId, onSelect, tileUrl, tileAttribution }: Props) {
  const byId = useMemo(() => new Map(rows.map((r) => [r.fieldId, r])), [rows]);
  // Only fields on the board are drawn (a landowner's board holds their own fields only).
  const shown = useMemo(() => fields.filter((f) => byId.has(f.id)), [fields, byId]);
  return (
    <div className="h-full min-h-[320px] w-full" data-testid="board-map">
      <MapContainer className="fs-map h-full w-full" center={[20, 0]} zoom={2} minZoom={2} maxZoom={19} zoomSnap={0.25}>
        {tileUrl ? <TileLayer url={tileUrl} attribution={tileAttribution ?? ''} maxZoom={19} /> : null}
        {shown.map((f) => (
          <BoardPolygon key={`${f.id}:${f.properties.version}`} field={f} row={byId.get(f.id)} selected={f.id === selectedId} onSelect={onSelect} />
        ))}
        <FitAndFocus fields={shown} selectedId={selectedId} />
      </MapContainer>
    </div>
  );
}
