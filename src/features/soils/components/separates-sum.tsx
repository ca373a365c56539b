// The live check beside sand, silt and clay: their sum, whether it is close enough to 100 % to
// be renormalised, and the texture class it gives.
import { tryClassifyTexture } from '../../../../shared/erosion/texture';
import { SEPARATES_TOLERANCE_PCT } from '../../../../shared/schemas/soils';
import { fmt } from './format-soil';

const given = (v: number | undefined): v is number => typeof v === 'number' && Number.isFinite(v);

export function SeparatesSum({ sand, silt, clay }: { sand?: number; silt?: number; clay?: number }) {
  const parts = [sand, silt, clay].filter(given);
  if (parts.length === 0) {
    return <p className="text-sm text-ink-soft" data-testid="separates-sum">Sand + silt + clay: give all three, or none.</p>;
  }
  const sum = parts.reduce((s, v) => s + v, 0);
  const lo = 100 - SEPARATES_TOLERANCE_PCT;
  const hi = 100 + SEPARATES_TOLERANCE_PCT;
  const complete = parts.length === 3;
  const near = complete && Math.abs(sum - 100) <= SEPARATES_TOLERANCE_PCT;
  const r = complete && near ? tryClassifyTexture({ sand: sand!, silt: silt!, clay: clay! }, { toleranceSumPct: SEPARATES_TOLERANCE_PCT }) : null;
  return (
    <p
      className={`num rounded-md border px-3 py-1.5 text-sm ${near ? 'border-ink-faint bg-paper-deep text-ink' : 'border-caution bg-caution-light text-caution'}`}
      data-testid="separates-sum"
      aria-live="polite"
    >
      Sand + silt + clay = <strong>{fmt(sum, Number.isInteger(sum) ? 0 : 1)} %</strong>
      {!complete
        ? ` — ${3 - parts.length} still to give`
        : near
          ? `${sum === 100 ? '' : ` — within ${lo}–${hi} %, scaled to 100 %`}${r?.ok ? ` · texture class ${r.value.textureClass}` : ''}`
          : ` — must be ${lo}–${hi} %; check the numbers`}
    </p>
  );
}
