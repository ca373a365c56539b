// The choropleth's key: every risk class by colour and name with its A/T range, and the grey
// "not assessed" fill.
import { RISK_CLASSES } from '../../../shared/erosion/risk-class';
import { NOT_ASSESSED_LABEL, RiskSwatchIcon } from './risk-badge';

const rangeText = (i: number) => {
  const lower = i === 0 ? 0 : RISK_CLASSES[i - 1].maxAOverT;
  const upper = RISK_CLASSES[i].maxAOverT;
  return upper === null ? `A/T ${lower} and over` : `A/T ${lower}–${upper}`;
};

export function RiskLegend({ counts }: { counts?: Map<string, number> }) {
  return (
    <ul className="flex flex-col gap-0.5 text-sm" aria-label="Map key: risk classes" data-testid="board-legend">
      {RISK_CLASSES.map((c, i) => (
        <li key={c.key} className="flex items-center gap-2">
          <RiskSwatchIcon colour={c.colour} />
          <span className="flex-1">{c.label}</span>
          <span className="num text-xs text-ink-soft">{rangeText(i)}</span>
          {counts ? <span className="num w-14 text-right text-xs text-ink-soft">{fieldCount(counts.get(c.key) ?? 0)}</span> : null}
        </li>
      ))}
      <li className="flex items-center gap-2">
        <RiskSwatchIcon colour={null} />
        <span className="flex-1">{NOT_ASSESSED_LABEL}: inputs missing</span>
        {counts ? <span className="num w-14 text-right text-xs text-ink-soft">{fieldCount(counts.get('not-assessed') ?? 0)}</span> : null}
      </li>
    </ul>
  );
}

const fieldCount = (n: number) => `${n} field${n === 1 ? '' : 's'}`;
