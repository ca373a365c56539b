// Shows a refused outline (dashed) and the repaired one (filled) so the user can judge the
// repair before saving it. Ignored by the drawing tools.
import { useMemo } from 'react';
import { Polygon } from 'react-leaflet';
import { geometryToLatLngs } from '../../../lib/geo-leaflet';
import type { AreaGeometry } from '../../../../shared/schemas/geojson';
import { refusedStyle, repairedStyle } from './field-style';

export type ShapePreview = { drawn: AreaGeometry; repaired: AreaGeometry | null };

export function ShapePreviewLayers({ preview }: { preview: ShapePreview }) {
  const drawn = useMemo(() => geometryToLatLngs(preview.drawn), [preview.drawn]);
  const repaired = useMemo(() => (preview.repaired ? geometryToLatLngs(preview.repaired) : null), [preview.repaired]);
  return (
    <>
      {repaired ? <Polygon positions={repaired} pathOptions={repairedStyle} interactive={false} pmIgnore /> : null}
      <Polygon positions={drawn} pathOptions={refusedStyle} interactive={false} pmIgnore />
    </>
  );
}
