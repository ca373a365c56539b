// Leaflet and the geoman drawing plugin, loaded together. geoman's bundle reads the global `L`,
// so the global is set here before the plugin module is evaluated (see the import order in
// features/fields/components/draw-controls.tsx).
import L from 'leaflet';
import 'leaflet/dist/leaflet.css';

declare global {
  interface Window {
    L: typeof L;
  }
}

window.L = L;

export { L };
