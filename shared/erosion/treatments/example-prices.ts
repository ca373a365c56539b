// Example prices (US dollars) for every price-list item, from data/reference/example-prices.json:
// figures in ranges met on US farms, each an example value to replace with the local figure.
import pricesJson from '../../../data/reference/example-prices.json';
import { PRICE_KEYS, type PriceKey, type Prices } from '../../schemas/treatments';

type PriceRow = { key: PriceKey; price: number; rangeMet: [number, number]; source: string; flag: 'practice' };
const table = pricesJson as unknown as { currency: string; source: string; rows: PriceRow[] };

function pricesFrom(rows: PriceRow[]): Prices {
  const byKey = new Map(rows.map((r) => [r.key, r.price]));
  const missing = PRICE_KEYS.filter((k) => !byKey.has(k));
  if (missing.length > 0) throw new Error(`example-prices.json has no price for: ${missing.join(', ')}`);
  return Object.fromEntries(PRICE_KEYS.map((k) => [k, byKey.get(k)!])) as Prices;
}

/** The example price list: currency, one price per item, and where the figures come from. */
export const EXAMPLE_PRICES: { currency: string; prices: Prices; source: string } = Object.freeze({
  currency: table.currency,
  prices: Object.freeze(pricesFrom(table.rows)),
  source: table.source,
});

/** Each example price with the range met on farms, for screens that show the range beside the figure. */
export const EXAMPLE_PRICE_ROWS: readonly PriceRow[] = table.rows;
