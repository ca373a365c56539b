// Outline: the field's name, area (hectares or acres by the user's setting), perimeter and
// centre, any overlaps, and the way back to the Farm map.
import { Link } from 'react-router-dom';
import { Notice } from '../../../components/ui/notice';
import { paths } from '../../../lib/paths';
import { formatArea, formatLength } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';

export const formatCentre = ([lng, lat]: [number, number]) =>
  `${Math.abs(lat).toFixed(5)}° ${lat >= 0 ? 'N' : 'S'}, ${Math.abs(lng).toFixed(5)}° ${lng >= 0 ? 'E' : 'W'}`;

export function OutlineTab({ field, units }: { field: FieldFeature; units: Units }) {
  const p = field.properties;
  return (
    <section className="flex flex-col gap-3" data-testid="outline-tab" aria-label="Outline">
      <dl className="grid max-w-md grid-cols-[auto_1fr] gap-x-6 gap-y-1.5 text-base">
        <dt className="text-ink-soft">Name</dt>
        <dd className="font-semibold" data-testid="outline-name">{p.name}</dd>
        <dt className="text-ink-soft">Area</dt>
        <dd className="num" data-testid="outline-area">
          {formatArea(p.areaHa, units)}
          <span className="text-sm text-ink-soft"> ({formatArea(p.areaHa, units === 'ha' ? 'ac' : 'ha')})</span>
        </dd>
        <dt className="text-ink-soft">Perimeter</dt>
        <dd className="num" data-testid="outline-perimeter">{formatLength(p.perimeterM, units)}</dd>
        {p.centroid ? (
          <>
            <dt className="text-ink-soft">Centre</dt>
            <dd className="num">{formatCentre(p.centroid)}</dd>
          </>
        ) : null}
      </dl>
      <p className="text-sm text-ink-soft">Areas and lengths are measured on the WGS84 ellipsoid.</p>
      {p.overlaps.length > 0 ? (
        <Notice tone="caution" title="Overlaps other fields">
          <ul className="list-inside list-disc">
            {p.overlaps.map((o) => (
              <li key={o.fieldId}>
                {o.name}: <span className="num">{formatArea(o.areaHa, units)}</span> shared
              </li>
            ))}
          </ul>
        </Notice>
      ) : null}
      <Link to={paths.farmMap.getHref(p.farmId)} className="self-start font-semibold text-clay-dark underline underline-offset-2" data-testid="outline-farm-map-link">
        Back to the Farm map, to redraw or rename the field
      </Link>
    </section>
  );
}
