// GET /api/config: what the installation offers the client.
import { z } from 'zod';

/** A web basemap: a Leaflet tile URL template ({z}/{x}/{y}, optional {s}) and the credit it requires. */
export const Basemap = z.object({
  /** Stable key, remembered as the user's choice: 'streets', 'topo' or 'imagery'. */
  key: z.string(),
  /** What the picker shows. */
  name: z.string(),
  url: z.string(),
  attribution: z.string(),
  /** The deepest zoom the service draws; Leaflet enlarges its tiles beyond it. */
  maxNativeZoom: z.number().int(),
});
export type Basemap = z.infer<typeof Basemap>;

export const ClientConfig = z.object({
  /** The default first; may be empty (then the map shows the farm's own relief only). */
  basemaps: z.array(Basemap),
  /** True while mail goes to the local fake mail server. */
  devMailbox: z.boolean(),
});
export type ClientConfig = z.infer<typeof ClientConfig>;
