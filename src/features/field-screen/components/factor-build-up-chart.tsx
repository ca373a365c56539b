// How A builds up (Recharts): the loss of the bare unit plot (R × K: 22.1 m long, 9 % slope,
// tilled fallow; AH-703 ch. 1), then times LS for this field's slope, times C for its cover,
// times P for its practice, which is A; T is drawn across as the line not to pass.
import { Bar, BarChart, CartesianGrid, Cell, LabelList, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { tPerHaToTonPerAc } from '../../../../shared/erosion/units';
import type { EstimateSuccess, Provenance } from '../../../../shared/schemas/estimate';
import type { Units } from '../../../../shared/schemas/auth';
import { formatFigure } from '../../../lib/format-figure';

const STEP_FILL = '#d9cfba';
const T_COLOUR = '#1f1b16';

type Step = { step: string; value: number; factor: string };

/** A round axis end (1, 2 or 5 × a power of ten per step) and its ticks. */
function niceAxis(top: number): { max: number; ticks: number[] } {
  if (!(top > 0)) return { max: 1, ticks: [0, 1] };
  const raw = top / 4;
  const pow = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * pow).find((s) => s >= raw) ?? 10 * pow;
  const n = Math.ceil(top / step);
  return { max: n * step, ticks: Array.from({ length: n + 1 }, (_, i) => i * step) };
}

export function FactorBuildUpChart({ estimate, riskColour, units }: { estimate: EstimateSuccess; riskColour: string; units: Units }) {
  const f = estimate.factors;
  const conv = (tPerHa: number) => (units === 'ac' ? tPerHaToTonPerAc(tPerHa) : tPerHa);
  const unit = units === 'ac' ? 'US t/ac/yr' : 't/ha/yr';
  // AH-703 eq. 1-1: A = R·K·LS·C·P (SI R and K give t/ha/yr).
  const unitPlot = f.r.value * f.k.value;
  // A figure typed for the field says so here too; its note is in the factor table.
  const shown = (name: 'R' | 'K' | 'C' | 'P', p: Provenance) => `${name} ${formatFigure(p.value)}${p.override ? ' (override)' : ''}`;
  const steps: Step[] = [
    { step: 'Bare unit plot: R × K', value: conv(unitPlot), factor: `${shown('R', f.r)} × ${shown('K', f.k)}` },
    { step: '× LS, this slope', value: conv(unitPlot * f.ls.value), factor: `LS ${formatFigure(f.ls.value)}` },
    { step: '× C, this cover', value: conv(unitPlot * f.ls.value * f.c.value), factor: shown('C', f.c) },
    { step: '× P, this practice = A', value: conv(unitPlot * f.ls.value * f.c.value * f.p.value), factor: shown('P', f.p) },
  ];
  const t = conv(f.t.value);
  const { max, ticks } = niceAxis(Math.max(t, ...steps.map((s) => s.value)) * 1.05);

  return (
    <figure className="flex flex-col gap-1" data-testid="factor-chart">
      <figcaption className="font-serif text-lg font-semibold">How the estimate builds up</figcaption>
      <p className="text-sm text-ink-soft">
        Yearly loss in {unit}: a bare, tilled standard plot under this rain and soil, then each factor of the field in turn. The
        line is T, <span className="num">{formatFigure(t)} {unit}</span>.
      </p>
      <div className="num h-56 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={steps} layout="vertical" margin={{ top: 18, right: 72, bottom: 4, left: 8 }}>
            <CartesianGrid horizontal={false} stroke="#d9cfba" />
            <XAxis type="number" domain={[0, max]} ticks={ticks} tickFormatter={(v: number) => formatFigure(v)} tick={{ fill: '#574d42', fontSize: 12 }} stroke="#857a6c" />
            <YAxis type="category" dataKey="step" width={160} tick={{ fill: '#1f1b16', fontSize: 12 }} stroke="#857a6c" />
            <Tooltip
              formatter={(value) => [`${formatFigure(Number(value))} ${unit}`, 'Yearly loss']}
              labelFormatter={(label, payload) => {
                const s = payload?.[0]?.payload as Step | undefined;
                return s ? `${String(label)} (${s.factor})` : String(label);
              }}
              contentStyle={{ background: '#f7f3ea', border: '1px solid #857a6c', borderRadius: 6, color: '#1f1b16' }}
            />
            <ReferenceLine
              x={t}
              stroke={T_COLOUR}
              strokeDasharray="5 4"
              strokeWidth={2}
              label={{ value: 'T', position: 'top', fill: T_COLOUR, fontSize: 12, fontWeight: 600 }}
            />
            <Bar dataKey="value" isAnimationActive={false} stroke="#574d42" strokeOpacity={0.5}>
              {steps.map((s, i) => (
                <Cell key={s.step} fill={i === steps.length - 1 ? riskColour : STEP_FILL} />
              ))}
              <LabelList dataKey="value" position="right" formatter={(v: unknown) => formatFigure(Number(v))} style={{ fill: '#1f1b16', fontSize: 12 }} />
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
