// Every upload and request size limit, shared by the client (checks before sending, with the
// limit in its messages) and the server (multer and body-parser limits, 413 answers).

export const BYTES_PER_KIB = 1024;
export const BYTES_PER_MIB = 1024 * 1024;

/** A field boundary file: GeoJSON, zipped shapefile, KML or KMZ. */
export const BOUNDARY_IMPORT_MAX_BYTES = 8 * BYTES_PER_MIB;
/** All entries of a zipped boundary file together, once unzipped. */
export const BOUNDARY_IMPORT_MAX_UNZIPPED_BYTES = 64 * BYTES_PER_MIB;
/** An elevation model (GeoTIFF). */
export const DEM_MAX_BYTES = 200 * BYTES_PER_MIB;
/** A soil profile photo (JPEG, PNG or WebP). */
export const PHOTO_MAX_BYTES = 10 * BYTES_PER_MIB;
/** A CSV of soil samples. */
export const SOIL_CSV_MAX_BYTES = 1 * BYTES_PER_MIB;
/** A soil map (GeoJSON or zipped shapefile of map units). */
export const SOIL_MAP_MAX_BYTES = 8 * BYTES_PER_MIB;
/** A rainfall record (CSV) for R. */
export const RAINFALL_RECORD_MAX_BYTES = 8 * BYTES_PER_MIB;
/** Any JSON request body. */
export const JSON_BODY_MAX_BYTES = 2 * BYTES_PER_MIB;

/** Corners of one field or map-unit outline, all rings together; more is a survey trace to simplify first. */
export const OUTLINE_MAX_VERTICES = 10_000;
/**
 * Fields nearer a pole than this are refused: the web map (Web Mercator) stops at about 85.05°,
 * and no farmland lies beyond about 71° N or 55° S.
 */
export const FIELD_MAX_ABS_LATITUDE_DEG = 85;
/** A farm's own slope classes (Handbook 18 lists six; a survey area seldom uses more than ten). */
export const SLOPE_CLASSES_MAX = 20;
/** Cells of an elevation model (width × height, from its header): a bigger grid is refused before it is decoded. */
export const DEM_MAX_CELLS = 25_000_000;
/** Background jobs one person may have waiting or running at once. */
export const JOBS_PER_USER_MAX = 3;
