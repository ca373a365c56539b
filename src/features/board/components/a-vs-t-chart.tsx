// A against T for each field on the board (Recharts): A's bar in the field's risk colour, T's
// bar in grey beside it, on a log scale so a field losing 50 × T and one at half of T both
// read. Units follow the user's setting.
import { Bar, BarChart, CartesianGrid, Cell, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { tPerHaToTonPerAc } from '../../../../shared/erosion/units';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';
import { formatFigure } from '../../../lib/format-figure';

const T_FILL = '#857a6c';
const ROW_H = 34;

type Datum = { name: string; a: number; t: number; colour: string; label: string };

export function AVsTChart({ rows, units, showFarm = false }: { rows: BoardRow[]; units: Units; showFarm?: boolean }) {
  const conv = (x: number) => (units === 'ac' ? tPerHaToTonPerAc(x) : x);
  const unit = units === 'ac' ? 'US t/ac/yr' : 't/ha/yr';
  const data: Datum[] = rows
    .filter((r) => r.soilLossTPerHaYr !== null && r.toleranceTPerHaYr !== null && r.riskClass)
    .map((r) => ({
      name: showFarm && r.farmName ? `${r.name} (${r.farmName})` : r.name,
      a: conv(r.soilLossTPerHaYr!),
      t: conv(r.toleranceTPerHaYr!),
      colour: r.riskClass!.colour,
      label: r.riskClass!.label,
    }));
  const left = rows.length - data.length;

  if (data.length === 0)
    return <p className="text-sm text-ink-soft">No field is assessed yet, so there is nothing to chart.</p>;

  const values = data.flatMap((d) => [d.a, d.t]).filter((v) => v > 0);
  const min = Math.max(Math.min(...values) / 2, 0.001);
  const max = Math.max(...values) * 1.5;
  const lo = 10 ** Math.floor(Math.log10(min));
  const hi = 10 ** Math.ceil(Math.log10(max));
  const ticks: number[] = [];
  for (let v = lo; v <= hi * 1.0001; v *= 10) ticks.push(v);

  return (
    <figure className="flex flex-col gap-1" data-testid="board-chart">
      <figcaption className="font-serif text-lg font-semibold">Soil lost against what the soil can stand</figcaption>
      <p className="text-sm text-ink-soft">
        A, the estimated yearly loss, beside T, the tolerated loss, in {unit}. Log scale: each grid line is ten times the
        one before.{left > 0 ? ` ${left} field${left === 1 ? ' is' : 's are'} not assessed and not shown.` : ''}
      </p>
      <div style={{ height: data.length * ROW_H + 70 }} className="num w-full">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} layout="vertical" margin={{ top: 4, right: 24, bottom: 4, left: 8 }} barGap={1}>
            <CartesianGrid horizontal={false} stroke="#d9cfba" />
            <XAxis
              type="number"
              scale="log"
              domain={[lo, hi]}
              ticks={ticks}
              allowDataOverflow
              tickFormatter={(v: number) => formatFigure(v)}
              tick={{ fill: '#574d42', fontSize: 12 }}
              stroke="#857a6c"
              label={{ value: unit, position: 'insideBottomRight', offset: -2, fill: '#574d42', fontSize: 12 }}
              height={40}
            />
            <YAxis type="category" dataKey="name" width={showFarm ? 240 : 110} tick={{ fill: '#1f1b16', fontSize: 12 }} stroke="#857a6c" />
            <Tooltip
              formatter={(value, name) => [`${formatFigure(Number(value))} ${unit}`, name === 'a' ? 'A, estimated loss' : 'T, tolerated loss']}
              labelFormatter={(label, payload) => {
                const d = payload?.[0]?.payload as Datum | undefined;
                return d ? `${String(label)}: ${d.label}` : String(label);
              }}
              contentStyle={{ background: '#f7f3ea', border: '1px solid #857a6c', borderRadius: 6, color: '#1f1b16' }}
            />
            <Legend
              formatter={(value) => (value === 'a' ? 'A, estimated loss (colour: risk class)' : 'T, tolerated loss')}
              wrapperStyle={{ fontSize: 12, color: '#1f1b16' }}
            />
            <Bar dataKey="a" name="a" fill="#d95f0e" stroke="#574d42" strokeOpacity={0.5} isAnimationActive={false}>
              {data.map((d) => (
                <Cell key={d.name} fill={d.colour} />
              ))}
            </Bar>
            <Bar dataKey="t" name="t" fill={T_FILL} isAnimationActive={false} barSize={6} />
          </BarChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
