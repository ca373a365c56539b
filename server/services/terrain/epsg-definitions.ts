// proj4 definitions for the EPSG codes Fieldshed understands, built from the code itself
// (EPSG registry parameters of each family, written from memory as standard PROJ strings).

/** PROJ string for an EPSG code, or null when Fieldshed does not know it. */
export function proj4Definition(epsg: number): string | null {
  if (!Number.isInteger(epsg)) return null;
  // WGS 84 / UTM zone N (32601–32660) and S (32701–32760)
  if (epsg >= 32601 && epsg <= 32660) return `+proj=utm +zone=${epsg - 32600} +datum=WGS84 +units=m +no_defs`;
  if (epsg >= 32701 && epsg <= 32760) return `+proj=utm +zone=${epsg - 32700} +south +datum=WGS84 +units=m +no_defs`;
  // NAD83 / UTM zone 1N–23N (26901–26923)
  if (epsg >= 26901 && epsg <= 26923) return `+proj=utm +zone=${epsg - 26900} +datum=NAD83 +units=m +no_defs`;
  // ETRS89 / UTM zone 28N–38N (25828–25838)
  if (epsg >= 25828 && epsg <= 25838) {
    return `+proj=utm +zone=${epsg - 25800} +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +units=m +no_defs`;
  }
  switch (epsg) {
    case 4326:
      return '+proj=longlat +datum=WGS84 +no_defs';
    case 4269:
      return '+proj=longlat +datum=NAD83 +no_defs';
    case 4258:
      return '+proj=longlat +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +no_defs';
    case 3857:
      return '+proj=merc +a=6378137 +b=6378137 +lat_ts=0 +lon_0=0 +x_0=0 +y_0=0 +k=1 +units=m +nadgrids=@null +wktext +no_defs';
    case 5070: // NAD83 / Conus Albers
      return '+proj=aea +lat_0=23 +lon_0=-96 +lat_1=29.5 +lat_2=45.5 +x_0=0 +y_0=0 +datum=NAD83 +units=m +no_defs';
    case 3035: // ETRS89-extended / LAEA Europe
      return '+proj=laea +lat_0=52 +lon_0=10 +x_0=4321000 +y_0=3210000 +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +units=m +no_defs';
    case 27700: // OSGB 1936 / British National Grid
      return '+proj=tmerc +lat_0=49 +lon_0=-2 +k=0.9996012717 +x_0=400000 +y_0=-100000 +ellps=airy +towgs84=446.448,-125.157,542.06,0.15,0.247,0.842,-20.489 +units=m +no_defs';
    default:
      return null;
  }
}
