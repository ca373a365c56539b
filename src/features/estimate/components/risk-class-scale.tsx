// A/T's risk class: its colour (ColorBrewer YlOrBr, 5 classes) always beside its name, and the
// whole five-step scale with the current step marked.
import { RISK_CLASSES, type RiskClass } from '../../../../shared/erosion';

export function RiskSwatch({ colour, size = 16 }: { colour: string; size?: number }) {
  return (
    <svg aria-hidden="true" width={size} height={size} viewBox="0 0 16 16" className="shrink-0">
      <rect x="0.5" y="0.5" width="15" height="15" rx="3" fill={colour} stroke="#574d42" strokeOpacity="0.6" />
    </svg>
  );
}

const limitText = (c: RiskClass, i: number) => {
  const lower = i === 0 ? 0 : RISK_CLASSES[i - 1].maxAOverT;
  return c.maxAOverT === null ? `A/T ${lower} and over` : `A/T ${lower}–${c.maxAOverT}`;
};

export function RiskClassScale({ current }: { current: RiskClass }) {
  return (
    <ol className="flex flex-col gap-0.5 text-sm" aria-label="Risk classes by A/T" data-testid="risk-scale">
      {RISK_CLASSES.map((c, i) => {
        const here = c.key === current.key;
        return (
          <li
            key={c.key}
            aria-current={here ? 'true' : undefined}
            className={`flex items-center gap-2 rounded px-1.5 py-0.5 ${here ? 'bg-paper-deep font-semibold text-ink ring-1 ring-ink-faint' : 'text-ink-soft'}`}
          >
            <RiskSwatch colour={c.colour} size={14} />
            <span className="flex-1">{c.label}</span>
            <span className="num text-xs">{limitText(c, i)}</span>
          </li>
        );
      })}
    </ol>
  );
}
