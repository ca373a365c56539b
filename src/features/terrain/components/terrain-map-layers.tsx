// Everything terrain draws on the farm map: the active layer as an image overlay in its own
// pane under the field outlines (the shaded relief is on by default: it is the offline map
// base, and over a web basemap it shades it), the selected field's concentrated-flow dots above
// them, and the layer switcher.
import { useMemo, useState } from 'react';
import { ImageOverlay, Pane } from 'react-leaflet';
import { useElevation } from '../api/get-elevation';
import { useFieldTerrain } from '../api/get-field-terrain';
import { useLayers, type LayerKey, type TerrainLayer } from '../api/get-layers';
import { FLOW_PANE, FlowPointsLayer } from './flow-points-layer';
import { LayerSwitcher, type ActiveLayer } from './layer-switcher';

// Panes between the tile pane (200) and the outlines' overlay pane (400); the dots above them.
const RELIEF_PANE = 'fs-terrain-relief';
const THEME_PANE = 'fs-terrain-theme';
/** A coloured layer lets the relief and outlines show through. */
const THEME_OPACITY = 0.72;
/** Over a web basemap the relief darkens it (multiplied) without hiding roads and names. */
const RELIEF_OVER_BASEMAP_OPACITY = 0.55;
/** The switcher lists the base first, then the themes from overview to detail. */
const LAYER_ORDER: LayerKey[] = ['hillshade', 'slope-classes', 'ls', 'soil-loss', 'concentrated-flow'];
const rank = (key: LayerKey) => {
  const i = LAYER_ORDER.indexOf(key);
  return i === -1 ? LAYER_ORDER.length : i;
};

type Props = {
  farmId: number;
  selectedField: { id: number; version: number; name: string } | null;
  /** True when a web basemap is drawn underneath. */
  overBasemap?: boolean;
};

export function TerrainMapLayers({ farmId, selectedField, overBasemap = false }: Props) {
  const layers = useLayers(farmId);
  const elevation = useElevation(farmId);
  const terrain = useFieldTerrain(selectedField);
  const [chosen, setChosen] = useState<ActiveLayer | null>(null);
  const [reliefUnder, setReliefUnder] = useState(true);

  const list = useMemo(() => [...(layers.data ?? [])].sort((a, b) => rank(a.key) - rank(b.key)), [layers.data]);
  const relief = list.find((l) => l.key === 'hillshade') ?? null;
  // Until the user picks, the shaded relief is the base; a picked layer that is gone falls back too.
  const active: ActiveLayer =
    chosen && (chosen === 'none' || list.some((l) => l.key === chosen)) ? chosen : relief ? 'hillshade' : 'none';
  const activeLayer = list.find((l) => l.key === active) ?? null;
  // The images keep their address across models: the model id makes a new one load.
  const version = elevation.data?.model?.id ?? 0;
  const src = (layer: TerrainLayer) => `${layer.url}${layer.url.includes('?') ? '&' : '?'}model=${version}`;

  const flowPoints = terrain.data?.concentratedFlow.points ?? [];
  const showRelief = relief && (active === 'hillshade' || (active !== 'none' && reliefUnder));

  return (
    <>
      {/* Overlays go inside their panes: a pane's children render once the pane exists. */}
      <Pane name={RELIEF_PANE} style={{ zIndex: 350, mixBlendMode: 'multiply' }}>
        {showRelief ? (
          <ImageOverlay
            key={`relief:${src(relief)}`}
            url={src(relief)}
            bounds={relief.bounds}
            opacity={overBasemap ? RELIEF_OVER_BASEMAP_OPACITY : 1}
            interactive={false}
            pmIgnore
            snapIgnore
            alt="Shaded relief of the farm"
          />
        ) : null}
      </Pane>
      <Pane name={THEME_PANE} style={{ zIndex: 360 }}>
        {activeLayer && activeLayer.key !== 'hillshade' ? (
          <ImageOverlay
            key={`theme:${src(activeLayer)}`}
            url={src(activeLayer)}
            bounds={activeLayer.bounds}
            opacity={THEME_OPACITY}
            interactive={false}
            pmIgnore
            snapIgnore
            alt={activeLayer.label}
          />
        ) : null}
      </Pane>
      <Pane name={FLOW_PANE} style={{ zIndex: 450, pointerEvents: 'none' }}>
        {flowPoints.length > 0 ? <FlowPointsLayer key={selectedField?.id} points={flowPoints} /> : null}
      </Pane>
      {list.length > 0 ? (
        <LayerSwitcher
          layers={list}
          active={active}
          onChange={setChosen}
          reliefUnder={reliefUnder}
          onReliefUnderChange={setReliefUnder}
          flowFieldName={selectedField?.name ?? null}
          flowCellCount={flowPoints.length}
        />
      ) : null}
    </>
  );
}
