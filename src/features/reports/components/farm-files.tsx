// A farm's fields to take elsewhere, for a season: every field with its area, the season's
// assessment and planned work, as GeoJSON, a zipped shapefile (for GIS programs) or CSV (for
// spreadsheets); and the season plan as PDF where there is one.
import type { ReactNode } from 'react';
import type { ExportFormat } from '../../../../shared/schemas/exports';
import { DownloadButton } from './download-button';

const FORMATS: { format: ExportFormat; label: string }[] = [
  { format: 'csv', label: 'Spreadsheet (CSV)' },
  { format: 'geojson', label: 'GeoJSON' },
  { format: 'shapefile', label: 'Shapefile (zip)' },
];

type Props = { farmId: number; season: string; planReport?: ReactNode };

export function FarmFiles({ farmId, season, planReport }: Props) {
  return (
    <section aria-labelledby="farm-files-heading" className="flex flex-col gap-2 print:hidden" data-testid="farm-files">
      <h2 id="farm-files-heading" className="font-serif text-lg font-semibold">
        Files for season {season}
      </h2>
      <p className="text-sm text-ink-soft">Every field with its area, risk figures and planned work.</p>
      <div className="flex flex-wrap gap-2">
        {FORMATS.map(({ format, label }) => (
          <DownloadButton
            key={format}
            url={`/api/farms/${farmId}/export?format=${format}&season=${encodeURIComponent(season)}`}
            label={label}
            making="the file"
            testId={`export-${format}`}
          />
        ))}
      </div>
      {planReport}
    </section>
  );
}
