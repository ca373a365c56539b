// Fields filled with their risk class colour (ColorBrewer YlOrBr) and labelled in words; fields
// without a class are grey, dashed and labelled "not assessed". The picked field is outlined in
// ink and the map flies to it. The board's choropleth and the landowner's before/after maps.
import { useEffect, useMemo, useRef } from 'react';
import { MapContainer, Polygon, TileLayer, Tooltip, useMap } from 'react-leaflet';
import type { PathOptions } from 'leaflet';
import '../../lib/leaflet-setup';
import { geometriesBounds, geometryBounds, geometryToLatLngs } from '../../lib/geo-leaflet';
import type { FieldFeature } from '../../../shared/schemas/field';
import type { RiskClass } from '../../../shared/erosion/risk-class';
import { NOT_ASSESSED_FILL, NOT_ASSESSED_LABEL } from './risk-badge';

const INK = '#1f1b16';
const EDGE = '#574d42';
const PADDING: [number, number] = [24, 24];

const styleFor = (riskClass: RiskClass | null, selected: boolean): PathOptions => ({
  color: selected ? INK : EDGE,
  weight: selected ? 4 : 1.5,
  opacity: 1,
  dashArray: riskClass ? undefined : '5,4',
  fillColor: riskClass?.colour ?? NOT_ASSESSED_FILL,
  fillOpacity: riskClass ? 0.85 : 0.55,
});

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
  // Fly only when the pick changes, not when the classes are read again.
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

function RiskPolygon({ field, riskClass, selected, onSelect }: { field: FieldFeature; riskClass: RiskClass | null; selected: boolean; onSelect?: (id: number) => void }) {
  const positions = useMemo(() => geometryToLatLngs(field.geometry), [field.geometry]);
  const handlers = useMemo(() => ({ click: () => onSelect?.(field.id) }), [onSelect, field.id]);
  // The class's name before its colon ("Severe"), so labels fit on small fields; the key
  // beside the map gives the whole name and the A/T range.
  const classText = riskClass ? riskClass.label.split(':')[0] : NOT_ASSESSED_LABEL.toLowerCase();
  return (
    <Polygon positions={positions} pathOptions={styleFor(riskClass, selected)} eventHandlers={handlers}>
      <Tooltip key={selected ? 'selected' : 'plain'} permanent direction="center" className={selected ? 'fs-label fs-label-selected' : 'fs-label'}>
        <span className="block text-center">{field.properties.name}</span>
        <span className="block text-center font-normal">{classText}</span>
      </Tooltip>
    </Polygon>
  );
}

type Props = {
  /** Only these fields are drawn. */
  fields: FieldFeature[];
  /** Each field's class (null or missing: not assessed). */
  classes: Map<number, RiskClass | null>;
  selectedId?: number | null;
  onSelect?: (fieldId: number) => void;
  tileUrl?: string | null;
  tileAttribution?: string | null;
  testId?: string;
  label?: string;
};

export function RiskMap({ fields, classes, selectedId = null, onSelect, tileUrl, tileAttribution, testId, label }: Props) {
  return (
    <div className="h-full min-h-[320px] w-full" data-testid={testId} aria-label={label} role={label ? 'region' : undefined}>
      <MapContainer className="fs-map h-full w-full" center={[20, 0]} zoom={2} minZoom={2} maxZoom={19} zoomSnap={0.25}>
        {tileUrl ? <TileLayer url={tileUrl} attribution={tileAttribution ?? ''} maxZoom={19} /> : null}
        {fields.map((f) => (
          <RiskPolygon key={`${f.id}:${f.properties.version}`} field={f} riskClass={classes.get(f.id) ?? null} selected={f.id === selectedId} onSelect={onSelect} />
        ))}
        <FitAndFocus fields={fields} selectedId={selectedId} />
      </MapContainer>
    </div>
  );
}
