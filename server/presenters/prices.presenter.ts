// A farm's price list as the API answers it: its own prices, or the example list while it has none.
import { EXAMPLE_PRICES } from '../../shared/erosion';
import { PRICE_KEYS, type PriceList } from '../../shared/schemas/treatments';
import type { FarmPrices } from '../models';

export function presentPrices(row: (FarmPrices & { editor?: { name: string } | null }) | null): PriceList {
  if (!row) {
    return { currency: EXAMPLE_PRICES.currency, prices: { ...EXAMPLE_PRICES.prices }, examples: true, exampleKeys: [...PRICE_KEYS], version: 0, updatedBy: null, updatedAt: null };
  }
  // An item still at its example figure (in the example currency) is still an example to replace.
  const exampleKeys = row.currency === EXAMPLE_PRICES.currency ? PRICE_KEYS.filter((k) => row.prices[k] === EXAMPLE_PRICES.prices[k]) : [];
  return {
    currency: row.currency,
    prices: row.prices,
    examples: exampleKeys.length === PRICE_KEYS.length,
    exampleKeys,
    version: row.version,
    updatedBy: row.editor?.name ?? null,
    updatedAt: row.updatedAt ? row.updatedAt.toISOString() : null,
  };
}
