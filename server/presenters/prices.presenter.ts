// A farm's price list as the API answers it: its own prices and amendment products, or the
// example ones while it has none.
import { EXAMPLE_LIME_PRODUCT, EXAMPLE_PRICES, GYPSUM_EXCHANGE_EFFICIENCY, GYPSUM_EXAMPLE_PURITY_PCT } from '../../shared/erosion';
import { PRICE_KEYS, type AmendmentChoices, type PriceList } from '../../shared/schemas/treatments';
import type { FarmPrices } from '../models';

/** Example products: a typical agricultural lime, the buffer method's usual target pH, a typical gypsum. */
export const EXAMPLE_AMENDMENTS: AmendmentChoices = {
  limeTargetPh: null,
  limeCcePct: EXAMPLE_LIME_PRODUCT.ccePct,
  limePassing20MeshPct: EXAMPLE_LIME_PRODUCT.fineness.passing20MeshPct,
  limePassing60MeshPct: EXAMPLE_LIME_PRODUCT.fineness.passing60MeshPct,
  limePassing100MeshPct: EXAMPLE_LIME_PRODUCT.fineness.passing100MeshPct,
  gypsumPurityPct: GYPSUM_EXAMPLE_PURITY_PCT,
  gypsumExchangeEfficiency: GYPSUM_EXCHANGE_EFFICIENCY.default,
};

export function presentPrices(row: (FarmPrices & { editor?: { name: string } | null }) | null): PriceList {
  if (!row) {
    return {
      currency: EXAMPLE_PRICES.currency,
      prices: { ...EXAMPLE_PRICES.prices },
      examples: true,
      exampleKeys: [...PRICE_KEYS],
      amendments: { ...EXAMPLE_AMENDMENTS },
      amendmentExamples: true,
      version: 0,
      updatedBy: null,
      updatedAt: null,
    };
  }
  // An item still at its example figure (in the example currency) is still an example to replace.
  const exampleKeys = row.currency === EXAMPLE_PRICES.currency ? PRICE_KEYS.filter((k) => row.prices[k] === EXAMPLE_PRICES.prices[k]) : [];
  return {
    currency: row.currency,
    prices: row.prices,
    examples: exampleKeys.length === PRICE_KEYS.length,
    exampleKeys,
    amendments: row.amendments ?? { ...EXAMPLE_AMENDMENTS },
    amendmentExamples: row.amendments === null,
    version: row.version,
    updatedBy: row.editor?.name ?? null,
    updatedAt: row.updatedAt ? row.updatedAt.toISOString() : null,
  };
}
