// GET /api/config: what the installation offers the client.

/** A web basemap: a Leaflet tile URL template ({z}/{x}/{y}, optional {s}) and the credit it requires. */
export type Basemap = {
  /** Stable key, remembered as the person's choice: 'streets', 'topo' or 'imagery'. */
  key: string;
  /** What the picker shows. */
  name: string;
  url: string;
  attribution: string;
  /** The deepest zoom the service draws; Leaflet enlarges its tiles beyond it. */
  maxNativeZoom: number;
};

export type ClientConfig = {
  /** The default first; may be empty (then the map shows the farm's own relief only). */
  basemaps: Basemap[];
  /** True while mail goes to the local fake mail server. */
  devMailbox: boolean;
};
