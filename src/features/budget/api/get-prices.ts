// GET /api/farms/:farmId/prices — the farm's price list: currency, one price per item, which
// items are still example values, and the version to send back with a change.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PriceList } from '../../../../shared/schemas/treatments';

export const getPrices = (farmId: number) => api.get<PriceList>(`/api/farms/${farmId}/prices`);

export const getPricesQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['prices', farmId], queryFn: () => getPrices(farmId) });

export const usePrices = (farmId: number) => useQuery(getPricesQueryOptions(farmId));
