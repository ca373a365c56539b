// Soil saved against money spent (Recharts): the tonnes a year the best plan saves at budgets
// from nothing to a little past what every field's best option costs, as the server worked them
// out, with the plan in view among them (the marked point) and the budget typed as a dashed line.
import { CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { tToShortTon } from '../../../../shared/erosion/units';
import type { Units } from '../../../../shared/schemas/auth';
import type { BudgetPlan } from '../../../../shared/schemas/treatments';
import { formatFigure } from '../../../lib/format-figure';
import { formatMoney } from '../../../lib/money';

const INK = '#1f1b16';
const INK_SOFT = '#574d42';
const EDGE = '#d9cfba';
const CLAY = '#8e4f24';

export function SoilMoneyChart({ plan, units }: { plan: BudgetPlan; units: Units }) {
  const conv = (t: number) => (units === 'ac' ? tToShortTon(t) : t);
  const unit = units === 'ac' ? 'US tons/yr' : 't/yr';
  const data = [...plan.curve, { budget: plan.spent, tonnesSavedPerYr: plan.tonnesSavedPerYr }]
    .sort((a, b) => a.budget - b.budget)
    .map((p) => ({ budget: p.budget, saved: conv(p.tonnesSavedPerYr) }));
  if (plan.curve.length < 2) return null;
  const money = (v: number) => formatMoney(v, plan.currency);
  const maxBudget = data[data.length - 1].budget;

  return (
    <figure className="flex flex-col gap-1" data-testid="budget-chart">
      <figcaption className="font-serif text-lg font-semibold">Soil saved for the money</figcaption>
      <p className="text-sm text-ink-soft">
        The most soil a plan saves, in {unit}, worked out for {plan.curve.length} budgets up to {money(maxBudget)}; the marked point is
        this plan. Where the line flattens, more money buys little more.
      </p>
      <div className="num h-64 w-full sm:h-72">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 10, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke={EDGE} />
            <XAxis
              type="number"
              dataKey="budget"
              domain={[0, maxBudget]}
              tickFormatter={money}
              tick={{ fill: INK_SOFT, fontSize: 12 }}
              stroke="#857a6c"
              height={44}
              label={{ value: `money spent (${plan.currency})`, position: 'insideBottomRight', offset: -4, fill: INK_SOFT, fontSize: 12 }}
            />
            <YAxis
              type="number"
              dataKey="saved"
              tickFormatter={(v: number) => formatFigure(v)}
              tick={{ fill: INK_SOFT, fontSize: 12 }}
              stroke="#857a6c"
              width={56}
              label={{ value: `soil saved (${unit})`, angle: -90, position: 'insideLeft', offset: 4, fill: INK_SOFT, fontSize: 12, style: { textAnchor: 'middle' } }}
            />
            <Tooltip
              formatter={(value) => [`${formatFigure(Number(value))} ${unit}`, 'Soil saved']}
              labelFormatter={(label) => `Budget ${money(Number(label))}`}
              contentStyle={{ background: '#f7f3ea', border: '1px solid #857a6c', borderRadius: 6, color: INK }}
            />
            <ReferenceLine x={Math.min(plan.budget, maxBudget)} stroke={INK_SOFT} strokeDasharray="4 3" label={{ value: 'your budget', position: 'insideTopLeft', fill: INK_SOFT, fontSize: 12 }} />
            <Line type="linear" dataKey="saved" stroke={CLAY} strokeWidth={2} dot={{ r: 2.5, fill: CLAY }} isAnimationActive={false} />
            <ReferenceDot x={plan.spent} y={conv(plan.tonnesSavedPerYr)} r={5} fill={CLAY} stroke={INK} />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
