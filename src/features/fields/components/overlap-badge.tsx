// A warning that a field overlaps others — in words, not only colour.
import type { FieldProperties } from '../../../../shared/schemas/field';

export function OverlapBadge({ overlaps }: { overlaps: FieldProperties['overlaps'] }) {
  if (overlaps.length === 0) return null;
  const names = overlaps.map((o) => o.name).join(', ');
  return (
    <span
      data-testid="overlap-badge"
      title={`Overlaps ${names}`}
      className="inline-flex items-center gap-1 rounded border border-caution bg-caution-light px-1.5 py-0.5 text-xs font-semibold text-caution"
    >
      <span aria-hidden="true">▲</span> Overlaps {overlaps.length === 1 ? overlaps[0].name : `${overlaps.length} fields`}
    </span>
  );
}
