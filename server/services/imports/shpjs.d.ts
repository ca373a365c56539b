// Types for the parts of shpjs 6 (no bundled types) that the importer uses.
declare module 'shpjs' {
  import type { Geometry } from 'geojson';
  type Bytes = ArrayBuffer | ArrayBufferView | DataView;
  /** Geometries of a .shp, one per record (null for null shapes); reprojected to WGS84 when `prj` is WKT proj4 reads. */
  export function parseShp(shp: Bytes, prj?: string | Bytes): (Geometry | null)[];
  /** Attribute rows of a .dbf, in record order; `cpg` names the text encoding. */
  export function parseDbf(dbf: Bytes, cpg?: string | Bytes): Record<string, unknown>[];
}
