// A colour swatch for a legend row. Classes drawn without colour get an empty box with a
// thin diagonal, so "no colour" reads as a choice, not a missing picture. Always used
// beside a text label.
export const NO_COLOUR = 'none';

export function LegendSwatch({ colour, shape = 'box' }: { colour: string; shape?: 'box' | 'dot' }) {
  if (shape === 'dot')
    return (
      <svg aria-hidden="true" width="14" height="14" viewBox="0 0 14 14" className="shrink-0">
        <circle cx="7" cy="7" r="3.5" fill={colour} />
      </svg>
    );
  if (colour === NO_COLOUR)
    return (
      <svg aria-hidden="true" width="18" height="14" viewBox="0 0 18 14" className="shrink-0">
        <rect x="0.5" y="0.5" width="17" height="13" rx="2" fill="#ffffff" fillOpacity="0.6" stroke="#857a6c" />
        <line x1="2" y1="12" x2="16" y2="2" stroke="#857a6c" strokeWidth="1" />
      </svg>
    );
  return (
    <svg aria-hidden="true" width="18" height="14" viewBox="0 0 18 14" className="shrink-0">
      <rect x="0.5" y="0.5" width="17" height="13" rx="2" fill={colour} stroke="#574d42" strokeOpacity="0.5" />
    </svg>
  );
}
