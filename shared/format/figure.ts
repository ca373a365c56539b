// How every screen writes a figure with no kind of its own (quantities.ts has the kinds): enough
// digits to compare, not more than the inputs can carry: whole numbers from 100, three significant
// figures from 1, two below 1 (RUSLE figures are good to a few tens of per cent).
export function formatFigure(x: number): string {
  if (!Number.isFinite(x)) return '—';
  const a = Math.abs(x);
  if (a === 0) return '0';
  if (a >= 100) return x.toLocaleString('en-US', { maximumFractionDigits: 0 });
  if (a >= 10) return x.toLocaleString('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
  if (a >= 1) return x.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
  return x.toLocaleString('en-US', { maximumSignificantDigits: 2 });
}
