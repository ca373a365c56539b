// The drawing toolbar (geoman) for farmers: draw, edit and remove field outlines. Loaded on demand
// (fields-map.tsx), so only someone who may draw fetches geoman.
// Added from inside the map with useMap() in an effect and removed in its cleanup, so it
// survives StrictMode's double effects. `pm:create` is registered once; the drawn layer is
// removed at once and the shape goes to onCreate — the query cache then draws the field.
import { useEffect } from 'react';
import type { Layer } from 'leaflet';
import { useMap } from 'react-leaflet';
import { L } from '../../../lib/leaflet-setup';
import '@geoman-io/leaflet-geoman-free';
import '@geoman-io/leaflet-geoman-free/dist/leaflet-geoman.css';
import { layerToGeometry } from '../../../lib/geo-leaflet';
import { useLatest } from '../../../lib/use-latest';
import type { AreaGeometry } from '../../../../shared/schemas/geojson';
import { drawingStyle } from './field-style';

type Props = {
  onCreate: (geometry: AreaGeometry) => void;
  onDrawError: (message: string) => void;
};

const toolTitles = {
  drawRectButton: 'Draw a rectangular field',
  drawPolyButton: 'Draw a field outline point by point',
  editButton: 'Move the corners of field outlines',
  deleteButton: 'Delete a field by clicking it',
};

export function DrawControls({ onCreate, onDrawError }: Props) {
  const map = useMap();
  const latest = useLatest({ onCreate, onDrawError });

  useEffect(() => {
    // This component (and geoman with it) loads after the map and its fields were made, so they
    // have no geoman handle yet: give the map and every layer on it theirs (later layers get it
    // as they are made).
    L.PM.reInitLayer(map as unknown as Layer); // it handles a map too, though its types name only layers
    map.eachLayer((layer) => L.PM.reInitLayer(layer));
    map.pm.setGlobalOptions({
      pathOptions: drawingStyle,
      templineStyle: { color: drawingStyle.color },
      hintlineStyle: { color: drawingStyle.color, dashArray: '5,5' },
      allowSelfIntersection: true,
      snappable: true,
    });
    map.pm.addControls({
      position: 'topleft',
      drawMarker: false,
      drawCircleMarker: false,
      drawPolyline: false,
      drawRectangle: true,
      drawPolygon: true,
      drawCircle: false,
      drawText: false,
      editMode: true,
      dragMode: false,
      cutPolygon: false,
      removalMode: true,
      rotateMode: false,
    });
    // The toolbar's buttons are links with an icon only: name each in words, for screen readers
    // and for the tooltip alike.
    map.pm.setLang('en', { buttonTitles: toolTitles }, 'en');
    for (const button of map.getContainer().querySelectorAll<HTMLElement>('.leaflet-pm-toolbar .button-container[title]')) {
      button.querySelector('a')?.setAttribute('aria-label', button.title);
    }

    const handleCreate = (e: { layer: Layer }) => {
      const geometry = layerToGeometry(e.layer);
      // The plugin's own copy goes at once; the saved field is drawn from the cache.
      e.layer.remove();
      if (geometry) latest.current.onCreate(geometry);
      else latest.current.onDrawError('Only areas can be fields: draw a polygon or a rectangle.');
    };
    map.on('pm:create', handleCreate);

    return () => {
      map.off('pm:create', handleCreate);
      if (map.pm.globalDrawModeEnabled()) map.pm.disableDraw();
      if (map.pm.globalEditModeEnabled()) map.pm.disableGlobalEditMode();
      if (map.pm.globalRemovalModeEnabled()) map.pm.disableGlobalRemovalMode();
      map.pm.removeControls();
    };
  }, [map, latest]);

  return null;
}
