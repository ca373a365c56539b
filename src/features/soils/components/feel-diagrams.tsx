// Plain drawings for the feel test: a hand squeezing a ball of soil, a ribbon pushed out
// between thumb and finger with a length scale, and a wet pinch rubbed between two fingers.
const INK = '#1f1b16';
const SOFT = '#574d42';
const SKIN = '#ede5d3';
const SOIL = '#8e4f24';
const SOIL_LIGHT = '#b9825a';

export function BallDiagram({ crumbles = false }: { crumbles?: boolean }) {
  return (
    <svg viewBox="0 0 160 110" className="h-28 w-40" role="img" aria-label={crumbles ? 'Soil that falls apart in the hand' : 'A ball of moist soil held in the palm'}>
      {/* an open palm */}
      <path d="M20 78 Q30 96 80 98 Q130 96 140 78 Q128 86 80 86 Q32 86 20 78Z" fill={SKIN} stroke={SOFT} strokeWidth="2" />
      <path d="M134 80 Q150 62 146 50" fill="none" stroke={SOFT} strokeWidth="2" strokeLinecap="round" />
      {crumbles ? (
        <g fill={SOIL_LIGHT} stroke={SOIL} strokeWidth="1">
          <circle cx="62" cy="80" r="4" />
          <circle cx="74" cy="82" r="3" />
          <circle cx="86" cy="79" r="4.5" />
          <circle cx="98" cy="82" r="3" />
          <circle cx="80" cy="74" r="3.5" />
          <circle cx="68" cy="73" r="2.5" />
          <circle cx="93" cy="72" r="2.5" />
        </g>
      ) : (
        <g>
          <circle cx="80" cy="58" r="24" fill={SOIL_LIGHT} stroke={SOIL} strokeWidth="2" />
          <path d="M68 48 Q74 42 82 42" fill="none" stroke={SKIN} strokeWidth="3" strokeLinecap="round" />
        </g>
      )}
      {!crumbles ? (
        <g stroke={INK} strokeWidth="1.5" fill="none" strokeLinecap="round">
          <path d="M40 40 L50 48" />
          <path d="M120 40 L110 48" />
          <path d="M80 16 L80 28" />
        </g>
      ) : null}
    </svg>
  );
}

export function RibbonDiagram({ lengthCm = 4 }: { lengthCm?: number }) {
  // 1 cm = 14 px on the drawing; the ribbon hangs out past the thumb tip.
  const px = Math.min(lengthCm, 8) * 14;
  const x0 = 52;
  return (
    <svg viewBox="0 0 200 110" className="h-28 w-52" role="img" aria-label={`A ribbon of soil about ${lengthCm} cm long pushed out between thumb and finger`}>
      {/* finger below, thumb above */}
      <path d="M4 70 Q30 64 56 70 Q62 76 56 82 Q30 88 4 84Z" fill={SKIN} stroke={SOFT} strokeWidth="2" />
      <path d="M4 40 Q30 36 54 46 Q60 52 52 56 Q30 56 4 54Z" fill={SKIN} stroke={SOFT} strokeWidth="2" />
      {/* the ribbon */}
      <path d={`M${x0 - 8} 60 L${x0 + px} 62 Q${x0 + px + 6} 68 ${x0 + px - 2} 72 L${x0 - 8} 66Z`} fill={SOIL_LIGHT} stroke={SOIL} strokeWidth="1.5" />
      {/* a scale in cm */}
      <g stroke={INK} strokeWidth="1">
        <line x1={x0} y1="96" x2={x0 + 8 * 14} y2="96" />
        {[0, 2.5, 5, 8].map((cm) => (
          <line key={cm} x1={x0 + cm * 14} y1="92" x2={x0 + cm * 14} y2="100" />
        ))}
      </g>
      <g fill={SOFT} style={{ fontSize: 9 }} textAnchor="middle">
        <text x={x0} y="108">0</text>
        <text x={x0 + 2.5 * 14} y="108">2.5</text>
        <text x={x0 + 5 * 14} y="108">5 cm</text>
      </g>
    </svg>
  );
}

export function PinchDiagram() {
  return (
    <svg viewBox="0 0 160 110" className="h-28 w-40" role="img" aria-label="A wet pinch of soil rubbed between thumb and finger">
      <path d="M10 30 Q60 20 92 42 Q100 52 90 58 Q60 52 10 56Z" fill={SKIN} stroke={SOFT} strokeWidth="2" />
      <path d="M10 92 Q60 96 92 70 Q100 62 90 60 Q60 70 10 70Z" fill={SKIN} stroke={SOFT} strokeWidth="2" />
      <ellipse cx="90" cy="59" rx="9" ry="4" fill={SOIL_LIGHT} stroke={SOIL} strokeWidth="1.5" />
      {/* water drop */}
      <path d="M128 22 Q134 34 128 38 Q122 34 128 22Z" fill="#ffffff" stroke={SOFT} strokeWidth="1.5" />
      {/* rubbing arrows */}
      <g stroke={INK} strokeWidth="1.5" fill="none" strokeLinecap="round">
        <path d="M112 50 Q122 59 112 68" />
        <path d="M112 50 l5 0 M112 50 l1 5" />
        <path d="M112 68 l5 0 M112 68 l1 -5" />
      </g>
    </svg>
  );
}
