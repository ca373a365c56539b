// The texture triangle (SVG, Fieldshed's own drawing): clay at the top, sand bottom left, silt
// bottom right, 10 % gridlines, the 12 USDA class regions outlined and named, and every lab
// sample of the field as a dot with its label. The class of the field's mean is shaded.
// One colour for the samples, shapes and words for everything else. Words are sized in CSS so a
// phone, where the drawing is scaled down, gets larger ones (in the drawing's own units).
import type { Separates, TextureClass } from '../../../../shared/erosion/texture';
import { fmt } from './format-soil';
import { TEXTURE_REGIONS } from './texture-regions';

export type TrianglePoint = { id: number; label: string; separates: Separates };

const SIDE = 440;
const H = (SIDE * Math.sqrt(3)) / 2;
const PAD_X = 70;
const PAD_TOP = 24;
const PAD_BOTTOM = 64;
const WIDTH = SIDE + 2 * PAD_X;
const HEIGHT = H + PAD_TOP + PAD_BOTTOM;
const INK = '#1f1b16';
const INK_SOFT = '#574d42';
const GRID = '#d9cfba';
const DOT = '#6d3a17';
const SHADE = '#f1e0cf';
const PAPER = '#f7f3ea';
const TICKS = [10, 20, 30, 40, 50, 60, 70, 80, 90];

/** Triangle position of a sample (fractions in %, any sum: scaled to 100). */
function xy({ sand, silt, clay }: Separates): [number, number] {
  const total = sand + silt + clay || 100;
  const si = (silt / total) * 100;
  const c = (clay / total) * 100;
  return [PAD_X + (SIDE * (si + c / 2)) / 100, PAD_TOP + H * (1 - c / 100)];
}

const pathOf = (poly: Separates[]) => `M${poly.map((p) => xy(p).map((v) => v.toFixed(1)).join(' ')).join('L')}Z`;

const line = (a: Separates, b: Separates) => {
  const [x1, y1] = xy(a);
  const [x2, y2] = xy(b);
  return { x1, y1, x2, y2 };
};

/** Class names of three words go on two lines. */
const nameLines = (name: string) => {
  const words = name.split(' ');
  return words.length === 3 ? [words.slice(0, 2).join(' '), words[2]] : [name];
};

function Grid() {
  return (
    <g stroke={GRID} strokeWidth={1}>
      {TICKS.map((v) => (
        <g key={v}>
          <line {...line({ sand: 100 - v, silt: 0, clay: v }, { sand: 0, silt: 100 - v, clay: v })} />
          <line {...line({ sand: v, silt: 0, clay: 100 - v }, { sand: v, silt: 100 - v, clay: 0 })} />
          <line {...line({ sand: 0, silt: v, clay: 100 - v }, { sand: 100 - v, silt: v, clay: 0 })} />
        </g>
      ))}
    </g>
  );
}

function Ticks() {
  return (
    <g fill={INK_SOFT} className="text-[11px] max-sm:text-[16px]">
      {TICKS.map((v) => {
        const [lx, ly] = xy({ sand: 100 - v, silt: 0, clay: v });
        const [rx, ry] = xy({ sand: 0, silt: v, clay: 100 - v });
        const [bx, by] = xy({ sand: v, silt: 100 - v, clay: 0 });
        return (
          <g key={v}>
            <text x={lx - 6} y={ly} textAnchor="end" dominantBaseline="central">{v}</text>
            <text x={rx + 6} y={ry} textAnchor="start" dominantBaseline="central">{v}</text>
            <text x={bx} y={by + 6} textAnchor="middle" dominantBaseline="hanging">{v}</text>
          </g>
        );
      })}
    </g>
  );
}

function AxisTitles() {
  const [lx, ly] = xy({ sand: 50, silt: 0, clay: 50 });
  const [rx, ry] = xy({ sand: 0, silt: 50, clay: 50 });
  const [bx, by] = xy({ sand: 50, silt: 50, clay: 0 });
  // Outward from each edge, past the tick labels; the arrows point the way the percentage grows.
  const out = 44;
  return (
    <g fill={INK} fontWeight={600} className="text-[12px] max-sm:text-[17px]">
      <text transform={`translate(${lx - out * 0.866} ${ly - out * 0.5}) rotate(-60)`} textAnchor="middle">Clay, % →</text>
      <text transform={`translate(${rx + out * 0.866} ${ry - out * 0.5}) rotate(60)`} textAnchor="middle">Silt, % →</text>
      <text x={bx} y={by + 40} textAnchor="middle">← Sand, %</text>
    </g>
  );
}

function Regions({ shaded }: { shaded: TextureClass | null }) {
  return (
    <g>
      {TEXTURE_REGIONS.map((r) => (
        <g key={r.name} data-texture-class={r.name}>
          {r.pieces.map((p, i) => (
            <path key={i} d={pathOf(p)} fill={r.name === shaded ? SHADE : 'none'} stroke="none" />
          ))}
        </g>
      ))}
    </g>
  );
}

function RegionOutlines() {
  return (
    <g fill="none" stroke={INK_SOFT} strokeWidth={1.4} strokeLinejoin="round">
      {TEXTURE_REGIONS.flatMap((r) => r.pieces.map((p, i) => <path key={`${r.name}-${i}`} d={pathOf(p)} />))}
    </g>
  );
}

function RegionNames({ shaded }: { shaded: TextureClass | null }) {
  return (
    <g textAnchor="middle">
      {TEXTURE_REGIONS.map((r) => {
        const [x, y] = xy(r.label.at);
        const lines = nameLines(r.name);
        const strong = r.name === shaded;
        return (
          <text
            key={r.name}
            transform={`translate(${x.toFixed(1)} ${y.toFixed(1)})${r.label.rotateDeg ? ` rotate(${r.label.rotateDeg})` : ''}`}
            fontWeight={strong ? 700 : 400}
            fill={strong ? INK : '#857a6c'}
            className={r.label.small ? 'text-[9.5px] max-sm:text-[12px]' : 'text-[11px] max-sm:text-[14px]'}
          >
            {/* Two lines sit either side of the point; one line on it. */}
            {lines.map((l, i) => (
              <tspan key={l} x={0} dy={lines.length === 1 ? '0.35em' : i === 0 ? '-0.2em' : '1.1em'}>
                {l}
              </tspan>
            ))}
          </text>
        );
      })}
    </g>
  );
}

/** Labels go right of their dot, or left when another dot sits close on the right. */
function Points({ points }: { points: TrianglePoint[] }) {
  const placed = points.map((p) => ({ p, at: xy(p.separates) }));
  return (
    <g>
      {placed.map(({ p, at: [x, y] }, i) => {
        // Toward the middle of the triangle, so words stay inside; away from a close earlier dot.
        const towardRight = x < PAD_X + SIDE / 2;
        const crowded = placed.some((o, j) => j < i && Math.abs(o.at[1] - y) < 14 && Math.abs(o.at[0] - x) < 110);
        const right = crowded ? !towardRight : towardRight;
        return (
          <g key={p.id} data-testid="texture-triangle-point">
            <circle cx={x} cy={y} r={5.5} fill={DOT} stroke={PAPER} strokeWidth={2} />
            <text
              x={right ? x + 9 : x - 9}
              y={y}
              textAnchor={right ? 'start' : 'end'}
              dominantBaseline="central"
              fill={INK}
              fontWeight={600}
              stroke={PAPER}
              strokeWidth={3}
              paintOrder="stroke"
              className="text-[11.5px] max-sm:text-[16px]"
            >
              {p.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function FieldMean({ mean }: { mean: Separates }) {
  const [x, y] = xy(mean);
  const d = 7;
  return (
    <path
      d={`M${x} ${y - d}L${x + d} ${y}L${x} ${y + d}L${x - d} ${y}Z`}
      fill="none"
      stroke={INK}
      strokeWidth={2}
      data-testid="texture-triangle-mean"
    />
  );
}

const describe = (p: TrianglePoint) =>
  `${p.label}: sand ${fmt(p.separates.sand, 0)} %, silt ${fmt(p.separates.silt, 0)} %, clay ${fmt(p.separates.clay, 0)} %`;

type Props = { points: TrianglePoint[]; mean?: Separates | null; meanClass?: TextureClass | null };

export function TextureTriangle({ points, mean = null, meanClass = null }: Props) {
  const summary = points.length ? points.map(describe).join('; ') : 'no lab samples yet';
  return (
    <figure className="flex flex-col gap-1" data-testid="texture-triangle">
      <svg
        role="img"
        aria-label={`Texture triangle with the field's lab samples: ${summary}.`}
        viewBox={`0 0 ${WIDTH} ${HEIGHT.toFixed(0)}`}
        className="num w-full max-w-2xl text-ink"
      >
        <Regions shaded={meanClass} />
        <Grid />
        <RegionOutlines />
        <path d={pathOf([{ sand: 0, silt: 0, clay: 100 }, { sand: 100, silt: 0, clay: 0 }, { sand: 0, silt: 100, clay: 0 }])} fill="none" stroke={INK} strokeWidth={1.6} />
        <RegionNames shaded={meanClass} />
        <Ticks />
        <AxisTitles />
        {mean ? <FieldMean mean={mean} /> : null}
        <Points points={points} />
      </svg>
      <figcaption className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-ink-soft">
        <span className="inline-flex items-center gap-1.5">
          <svg width="14" height="14" aria-hidden="true"><circle cx="7" cy="7" r="5" fill={DOT} /></svg>
          a lab sample, with its label
        </span>
        {mean ? (
          <span className="inline-flex items-center gap-1.5">
            <svg width="16" height="16" aria-hidden="true"><path d="M8 1L15 8L8 15L1 8Z" fill="none" stroke={INK} strokeWidth="2" /></svg>
            the field's mean{meanClass ? `, in the shaded class (${meanClass})` : ''}
          </span>
        ) : null}
      </figcaption>
    </figure>
  );
}
