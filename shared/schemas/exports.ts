// GET /api/farms/:farmId/export: which file, for which season (the farm's newest when none is named).
import { z } from 'zod';
import { SeasonLabel } from './season';

export const EXPORT_FORMATS = ['geojson', 'shapefile', 'csv'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export const ExportQuery = z.object({
  format: z.enum(EXPORT_FORMATS, { error: "format must be 'geojson', 'shapefile' or 'csv'" }),
  season: SeasonLabel.optional(),
});
export type ExportQuery = z.infer<typeof ExportQuery>;
