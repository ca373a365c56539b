// The names of the map layers as people read them in the layer switcher and in job messages.
import type { LayerKind } from './render-layer';

export const LAYER_LABELS: Record<LayerKind, string> = {
  hillshade: 'Shaded relief',
  'slope-classes': 'Slope classes',
  ls: 'Slope length and steepness (LS)',
  'soil-loss': 'Soil loss hotspots',
  'concentrated-flow': 'Where water gathers',
};
