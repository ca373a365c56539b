// Each field's A across seasons, as small line charts side by side (one per field, each on its
// own scale with its top figure written), T drawn as a dashed line where it is known. Figures come from the assessments stored per season.
import type { Units } from '../../../../shared/schemas/auth';
import type { SoilLossHistory } from '../../../../shared/schemas/changes';
import { tPerHaToTonPerAc } from '../../../../shared/erosion/units';
import { formatFigure } from '../../../lib/format-figure';

const W = 180;
const H = 90;
const PAD = { l: 30, r: 8, t: 8, b: 18 };

type Props = { history: SoilLossHistory; units: Units };

export function SoilLossChart({ history, units }: Props) {
  const conv = (a: number) => (units === 'ac' ? tPerHaToTonPerAc(a) : a);
  const unit = units === 'ac' ? 'US t/ac/yr' : 't/ha/yr';
  const n = history.seasons.length;
  const x = (i: number) => PAD.l + (n <= 1 ? (W - PAD.l - PAD.r) / 2 : (i * (W - PAD.l - PAD.r)) / (n - 1));
  return (
    <div className="flex flex-col gap-1" data-testid="soil-loss-chart">
      <p className="text-sm text-ink-soft">A in {unit} per season (stored assessments); the dashed line is T where known.</p>
      <ul className="grid grid-cols-[repeat(auto-fill,minmax(180px,1fr))] gap-3">
        {history.fields.map((f) => {
          const pts = f.points.map((p) => ({ i: history.seasons.indexOf(p.season), a: p.soilLossTPerHaYr, t: p.aOverT && p.soilLossTPerHaYr ? p.soilLossTPerHaYr / p.aOverT : null }));
          const known = pts.filter((p): p is { i: number; a: number; t: number | null } => p.a != null);
          const t = known.find((p) => p.t != null)?.t ?? null;
          const max = Math.max(0.1, ...known.map((p) => conv(p.a)), t != null ? conv(t) : 0) * 1.1;
          const y = (v: number) => PAD.t + (1 - v / max) * (H - PAD.t - PAD.b);
          const line = known.map((p, k) => `${k ? 'L' : 'M'}${x(p.i).toFixed(1)},${y(conv(p.a)).toFixed(1)}`).join(' ');
          const words = known.map((p) => `${history.seasons[p.i]}: ${formatFigure(conv(p.a))}`).join(', ');
          return (
            <li key={f.fieldId} className="rounded border border-paper-edge bg-white/50 p-1.5">
              <p className="text-sm font-semibold">{f.fieldName}</p>
              <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-label={`A of ${f.fieldName} per season: ${words || 'not assessed'}`}>
                <line x1={PAD.l} x2={W - PAD.r} y1={y(0)} y2={y(0)} stroke="#857a6c" strokeWidth="0.8" />
                <text x={PAD.l - 3} y={y(max / 1.1) + 3} textAnchor="end" fontSize="8" fill="#574d42" className="num">
                  {formatFigure(max / 1.1)}
                </text>
                <text x={PAD.l - 3} y={y(0) + 3} textAnchor="end" fontSize="8" fill="#574d42">
                  0
                </text>
                {t != null ? <line x1={PAD.l} x2={W - PAD.r} y1={y(conv(t))} y2={y(conv(t))} stroke="#574d42" strokeDasharray="3,2" strokeWidth="0.8" /> : null}
                {line ? <path d={line} fill="none" stroke="#8e4f24" strokeWidth="1.6" /> : null}
                {known.map((p) => (
                  <circle key={p.i} cx={x(p.i)} cy={y(conv(p.a))} r="2.4" fill="#8e4f24" />
                ))}
                {history.seasons.map((s, i) => (
                  <text key={s} x={x(i)} y={H - 4} textAnchor="middle" fontSize="8" fill="#574d42">
                    {s}
                  </text>
                ))}
              </svg>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
