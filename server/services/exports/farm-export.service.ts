// GET /api/farms/:farmId/export: a farm's fields with their areas, the season's assessment and
// planned actions, as GeoJSON (RFC 7946: WGS84 longitude, latitude; no crs member), a zipped
// shapefile with its .prj (WGS84 geographic), or CSV (one row per field, formula cells
// neutralised).
import type { Sequelize } from 'sequelize';
import { zip } from '@mapbox/shp-write';
import JSZip from 'jszip';
import type { FeatureCollection, MultiPolygon } from 'geojson';
import { csvText } from '../../../shared/exports/csv';
import { exportFileName } from '../../../shared/exports/file-names';
import type { ExportQuery } from '../../../shared/schemas/exports';
import type { DownloadFile } from '../../lib/download';
import type { PlanViewer } from '../plans/plan-read.service';
import { DBF_CODE_PAGE, dbfText } from './dbf-text';
import { EXPORT_COLUMNS, exportProperties } from './export-columns';
import { farmExportRecords, type ExportRecords } from './export-records';

/** The ESRI WKT of WGS84 geographic coordinates (EPSG:4326), as GIS programs write it in a .prj. */
const WGS84_PRJ =
  'GEOGCS["GCS_WGS_1984",DATUM["D_WGS_1984",SPHEROID["WGS_1984",6378137.0,298.257223563]],PRIMEM["Greenwich",0.0],UNIT["Degree",0.0174532925199433]]';

function featureCollection(r: ExportRecords, by: 'key' | 'dbf'): FeatureCollection<MultiPolygon> {
  return {
    type: 'FeatureCollection',
    features: r.fields.map((f) => ({ type: 'Feature', id: f.fieldId, geometry: f.geometry, properties: exportProperties(f, r.season, by) })),
  };
}

export async function farmExport(sequelize: Sequelize, viewer: PlanViewer, query: ExportQuery): Promise<DownloadFile> {
  const r = await farmExportRecords(sequelize, viewer, query.season);
  const name = (ext: string) => exportFileName(r.farmName, r.season, 'fields', ext);
  switch (query.format) {
    case 'geojson':
      return { body: Buffer.from(JSON.stringify(featureCollection(r, 'key'))), contentType: 'application/geo+json', fileName: name('geojson') };
    case 'csv': {
      const columns = EXPORT_COLUMNS.map((c) => ({ header: c.key, value: (f: ExportRecords['fields'][number]) => c.value(f, r.season) }));
      return { body: Buffer.from(csvText(columns, r.fields)), contentType: 'text/csv; charset=utf-8', fileName: name('csv') };
    }
    case 'shapefile': {
      const layer = exportFileName(r.farmName, r.season, 'fields', 'x').slice(0, -2);
      const fc = featureCollection(r, 'dbf');
      for (const f of fc.features) {
        const p = f.properties!;
        for (const k of Object.keys(p)) if (typeof p[k] === 'string') p[k] = dbfText(p[k]);
      }
      // Every field is a MultiPolygon, so shp-write writes one polygon layer under this name.
      const written = (await zip(fc as FeatureCollection, { outputType: 'nodebuffer', compression: 'STORE', prj: WGS84_PRJ, types: { polygon: layer, multipolygon: layer } })) as Buffer;
      // The .cpg names the .dbf's code page, which GIS programs and shpjs read.
      const zipped = await JSZip.loadAsync(written);
      zipped.file(`${layer}.cpg`, DBF_CODE_PAGE);
      return { body: await zipped.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' }), contentType: 'application/zip', fileName: name('zip') };
    }
  }
}
