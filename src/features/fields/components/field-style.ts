// How fields are drawn on the map: earthy outlines, the selected one stronger.
import type { PathOptions } from 'leaflet';

export const FIELD_COLOR = '#8e4f24';
export const FIELD_SELECTED_COLOR = '#4a260d';

export const fieldStyle = (selected: boolean): PathOptions =>
  selected
    ? { color: FIELD_SELECTED_COLOR, weight: 4, fillColor: FIELD_COLOR, fillOpacity: 0.35, opacity: 1 }
    : { color: FIELD_COLOR, weight: 2, fillColor: FIELD_COLOR, fillOpacity: 0.12, opacity: 0.9 };

/** Outline style for shapes while they are being drawn. */
export const drawingStyle: PathOptions = { color: FIELD_SELECTED_COLOR, weight: 3, fillColor: FIELD_COLOR, fillOpacity: 0.2 };

/** A refused outline, as drawn. */
export const refusedStyle: PathOptions = { color: '#9a2d1c', weight: 2, dashArray: '6,5', fill: false };
/** The repaired outline the server offers. */
export const repairedStyle: PathOptions = { color: FIELD_SELECTED_COLOR, weight: 3, fillColor: FIELD_COLOR, fillOpacity: 0.45 };
