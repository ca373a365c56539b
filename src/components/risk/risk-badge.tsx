// A field's risk class: the YlOrBr colour always beside its name; "not assessed" (grey,
// hatched) when the assessment is waiting for inputs.
import type { RiskClass } from '../../../shared/erosion/risk-class';

export const NOT_ASSESSED_LABEL = 'Not assessed';
export const NOT_ASSESSED_FILL = '#cfc8bb';

export function RiskSwatchIcon({ colour, size = 14 }: { colour: string | null; size?: number }) {
  return (
    <svg aria-hidden="true" width={size} height={size} viewBox="0 0 16 16" className="shrink-0">
      {colour ? (
        <rect x="0.5" y="0.5" width="15" height="15" rx="3" fill={colour} stroke="#574d42" strokeOpacity="0.6" />
      ) : (
        <>
          <rect x="0.5" y="0.5" width="15" height="15" rx="3" fill={NOT_ASSESSED_FILL} stroke="#574d42" strokeOpacity="0.6" />
          <path d="M0 12 L12 0 M4 16 L16 4 M0 6 L6 0 M10 16 L16 10" stroke="#574d42" strokeWidth="1.2" strokeOpacity="0.7" />
        </>
      )}
    </svg>
  );
}

export function RiskBadge({ riskClass, size = 'sm' }: { riskClass: RiskClass | null; size?: 'sm' | 'md' }) {
  return (
    <span
      data-testid="risk-badge"
      data-risk={riskClass?.key ?? 'not-assessed'}
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded border border-ink-faint bg-paper font-semibold ${
        size === 'md' ? 'px-2 py-0.5 text-base' : 'px-1.5 py-0.5 text-xs'
      }`}
    >
      <RiskSwatchIcon colour={riskClass?.colour ?? null} size={size === 'md' ? 16 : 12} />
      {riskClass?.label ?? NOT_ASSESSED_LABEL}
    </span>
  );
}
