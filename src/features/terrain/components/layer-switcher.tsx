// The map's layer switcher: a radio list of the farm's terrain layers and "None", whether the
// shaded relief stays underneath a coloured layer, and the active layer's legend in words.
// Sits on the map; clicks and scrolls stay inside it (they would add corners while drawing).
import { useEffect, useId, useRef } from 'react';
import L from 'leaflet';
import type { LayerKey, TerrainLayer } from '../api/get-layers';
import { LegendSwatch } from './legend-swatch';
import { FLOW_COLOUR, FLOW_LABEL } from './flow-points-layer';

export type ActiveLayer = LayerKey | 'none';

type Props = {
  layers: TerrainLayer[];
  active: ActiveLayer;
  onChange: (key: ActiveLayer) => void;
  reliefUnder: boolean;
  onReliefUnderChange: (on: boolean) => void;
  /** The selected field's name when its concentrated-flow dots are drawn. */
  flowFieldName: string | null;
  flowCellCount: number;
};

export function LayerSwitcher({ layers, active, onChange, reliefUnder, onReliefUnderChange, flowFieldName, flowCellCount }: Props) {
  const name = useId();
  const boxRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!boxRef.current) return;
    L.DomEvent.disableClickPropagation(boxRef.current);
    L.DomEvent.disableScrollPropagation(boxRef.current);
  }, []);
  const activeLayer = layers.find((l) => l.key === active) ?? null;
  const hasRelief = layers.some((l) => l.key === 'hillshade');

  // Below the place search on a phone, beside it on wider screens.
  return (
    <div className="absolute right-2 top-14 z-[1000] max-h-[calc(100%-4.5rem)] w-64 max-w-[calc(100%-4rem)] overflow-y-auto sm:top-2 sm:max-h-[calc(100%-1rem)]">
      <div ref={boxRef} data-testid="layer-switcher" className="rounded-md border border-paper-edge bg-paper/95 text-sm shadow">
        {/* Open on wide screens; folded on a phone, where it would cover the fields. */}
        <details open={typeof window === 'undefined' || window.innerWidth >= 640}>
          <summary className="cursor-pointer select-none px-3 py-2 font-semibold">Map layers</summary>
          <div className="flex flex-col gap-2 border-t border-paper-edge px-3 py-2">
            <fieldset className="flex flex-col gap-1">
              <legend className="sr-only">Terrain layer shown on the map</legend>
              {[...layers.map((l) => ({ key: l.key as ActiveLayer, label: l.label })), { key: 'none' as const, label: 'None' }].map((opt) => (
                <label key={opt.key} className="flex cursor-pointer items-center gap-2">
                  <input
                    type="radio"
                    name={name}
                    value={opt.key}
                    checked={active === opt.key}
                    onChange={() => onChange(opt.key)}
                    data-testid={`layer-option-${opt.key}`}
                    className="accent-clay"
                  />
                  <span>{opt.label}</span>
                </label>
              ))}
            </fieldset>
            {hasRelief && active !== 'hillshade' && active !== 'none' ? (
              <label className="flex cursor-pointer items-center gap-2 text-ink-soft">
                <input
                  type="checkbox"
                  checked={reliefUnder}
                  onChange={(e) => onReliefUnderChange(e.target.checked)}
                  className="accent-clay"
                  data-testid="relief-under"
                />
                Shaded relief underneath
              </label>
            ) : null}
            {activeLayer && activeLayer.legend.length > 0 ? (
              <div data-testid="layer-legend" className="border-t border-paper-edge pt-2">
                <p className="mb-1 font-medium">{activeLayer.label}</p>
                <ul className="flex flex-col gap-1">
                  {activeLayer.legend.map((entry) => (
                    <li key={entry.label} className="flex items-center gap-2">
                      <LegendSwatch colour={entry.colour} />
                      <span>{entry.label}</span>
                    </li>
                  ))}
                </ul>
              </div>
            ) : null}
            {flowFieldName && flowCellCount > 0 ? (
              <div data-testid="flow-legend" className="flex items-start gap-2 border-t border-paper-edge pt-2">
                <span className="mt-0.5">
                  <LegendSwatch colour={FLOW_COLOUR} shape="dot" />
                </span>
                <span>
                  {FLOW_LABEL}, in {flowFieldName}
                </span>
              </div>
            ) : null}
          </div>
        </details>
      </div>
    </div>
  );
}
