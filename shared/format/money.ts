// How money is written: in the farm's currency (the price list's three-letter code), whole units
// for sums of 100 and more, cents below.
const formatters = new Map<string, Intl.NumberFormat>();

function formatter(currency: string, digits: number): Intl.NumberFormat {
  const key = `${currency}:${digits}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits });
    formatters.set(key, f);
  }
  return f;
}

/** "$1,240", "€12.50", "CA$310". */
export function formatMoney(amount: number, currency: string): string {
  if (!Number.isFinite(amount)) return '—';
  return formatter(currency, Math.abs(amount) >= 100 || Number.isInteger(amount) ? 0 : 2).format(amount);
}

/** The currency's own sign, e.g. "$" for USD, "€" for EUR; the code itself when it has none. */
export function currencySign(currency: string): string {
  return formatter(currency, 0).formatToParts(0).find((p) => p.type === 'currency')?.value ?? currency;
}
