// A small horizontal bar chart of a field's slope-class shares: each class by name and
// range, its bar, and its share in %. Bars take the slope-class map layer's colours when
// they are known, so chart and map read alike; classes without colour get an outline.
import type { SlopeClassShare } from '../api/get-field-terrain';
import type { LegendEntry } from '../api/get-layers';
import { NO_COLOUR } from './legend-swatch';

const ROW_H = 24;
const LABEL_W = 176;
const BAR_W = 110;
const VALUE_W = 46;
const WIDTH = LABEL_W + BAR_W + VALUE_W;
const FALLBACK_FILL = '#8e4f24';

export const slopeRange = (c: Pick<SlopeClassShare, 'minPct' | 'maxPct'>) =>
  c.maxPct === null ? `over ${c.minPct} %` : `${c.minPct}–${c.maxPct} %`;

const pctText = (share: number) => {
  const pct = share * 100;
  if (pct > 0 && pct < 0.5) return '< 1 %';
  return `${pct.toFixed(0)} %`;
};

export function SlopeClassChart({ classes, legend }: { classes: SlopeClassShare[]; legend?: LegendEntry[] }) {
  const colours = legend && legend.length === classes.length ? legend.map((l) => l.colour) : null;
  const height = classes.length * ROW_H;
  return (
    <figure className="flex flex-col gap-1" data-testid="slope-class-chart">
      <figcaption className="text-sm font-medium">Share of the field in each slope class</figcaption>
      <svg
        role="img"
        aria-label={classes.map((c) => `${c.name} (${slopeRange(c)}): ${pctText(c.share)}`).join('; ')}
        viewBox={`0 0 ${WIDTH} ${height}`}
        className="num w-full max-w-sm text-ink"
        style={{ fontSize: 12 }}
      >
        {classes.map((c, i) => {
          const y = i * ROW_H;
          const colour = colours?.[i] ?? FALLBACK_FILL;
          const w = Math.max(c.share * BAR_W, c.share > 0 ? 1 : 0);
          return (
            <g key={c.name} transform={`translate(0 ${y})`}>
              <text x={0} y={ROW_H / 2} dominantBaseline="central" fill="currentColor">
                {c.name}
                <tspan fill="#574d42"> {slopeRange(c)}</tspan>
              </text>
              <rect x={LABEL_W} y={4} width={BAR_W} height={ROW_H - 8} fill="#ede5d3" rx={2} />
              {colour === NO_COLOUR ? (
                <rect x={LABEL_W + 0.5} y={4.5} width={Math.max(w - 1, 0)} height={ROW_H - 9} fill="#ffffff" stroke="#574d42" rx={2} />
              ) : (
                <rect x={LABEL_W} y={4} width={w} height={ROW_H - 8} fill={colour} stroke="#574d42" strokeOpacity={0.4} rx={2} />
              )}
              <text x={WIDTH} y={ROW_H / 2} dominantBaseline="central" textAnchor="end" fill="currentColor" fontWeight={600}>
                {pctText(c.share)}
              </text>
            </g>
          );
        })}
      </svg>
    </figure>
  );
}
