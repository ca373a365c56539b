// The farm's fields beside the map: name, area in the user's units, overlap warnings.
// A row click selects the field and brings it into view.
import { formatArea } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { OverlapBadge } from './overlap-badge';

type Props = {
  fields: FieldFeature[];
  units: Units;
  selectedId: number | null;
  onSelect: (fieldId: number) => void;
};

export function FieldList({ fields, units, selectedId, onSelect }: Props) {
  const totalHa = fields.reduce((sum, f) => sum + f.properties.areaHa, 0);
  const sorted = [...fields].sort((a, b) => a.properties.name.localeCompare(b.properties.name, undefined, { numeric: true }));

  return (
    <section aria-labelledby="field-list-heading" className="flex flex-col gap-2">
      <div className="flex items-baseline justify-between gap-2">
        <h2 id="field-list-heading" className="text-lg font-semibold">
          Fields <span className="num text-base font-normal text-ink-soft">({fields.length})</span>
        </h2>
        <span className="num text-sm text-ink-soft" data-testid="fields-total-area">
          {formatArea(totalHa, units)} in all
        </span>
      </div>
      {fields.length === 0 ? (
        <p className="text-sm text-ink-soft">No fields yet.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-paper-edge rounded-md border border-paper-edge bg-white/40">
          {sorted.map((field) => {
            const selected = field.id === selectedId;
            return (
              <li key={field.id}>
                <button
                  type="button"
                  data-testid="field-row"
                  data-field-id={field.id}
                  aria-pressed={selected}
                  onClick={() => onSelect(field.id)}
                  className={`flex w-full flex-wrap items-center gap-x-2 gap-y-1 px-3 py-2 text-left ${
                    selected ? 'bg-clay-light' : 'hover:bg-paper-deep'
                  }`}
                >
                  <span className={`min-w-0 flex-1 truncate ${selected ? 'font-semibold text-clay-dark' : ''}`}>
                    {field.properties.name}
                  </span>
                  <span className="num text-sm text-ink-soft">{formatArea(field.properties.areaHa, units)}</span>
                  {field.properties.overlaps.length > 0 ? (
                    <span className="basis-full">
                      <OverlapBadge overlaps={field.properties.overlaps} />
                    </span>
                  ) : null}
                </button>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
