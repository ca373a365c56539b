// PUT /api/farms/:farmId/prices (farmer, advisor) — with the version read; 409 when someone else
// saved in the meantime (the list is read again). Every cost follows the prices, so every
// treatments answer and budget plan is read again after a save.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import { treatmentsRootKey } from '../../../lib/query-keys';
import type { PriceList, PricesUpdate } from '../../../../shared/schemas/treatments';
import { getPricesQueryOptions } from './get-prices';

export const updatePrices = (farmId: number, input: PricesUpdate) => api.put<PriceList>(`/api/farms/${farmId}/prices`, input);

export function useUpdatePrices(farmId: number) {
  const queryClient = useQueryClient();
  const key = getPricesQueryOptions(farmId).queryKey;
  return useMutation({
    mutationFn: (input: PricesUpdate) => updatePrices(farmId, input),
    onSuccess: (list) => {
      queryClient.setQueryData(key, list);
      void queryClient.invalidateQueries({ queryKey: treatmentsRootKey });
    },
    onError: (error) => {
      if (isApiError(error, 409)) {
        void queryClient.invalidateQueries({ queryKey: key });
        void queryClient.invalidateQueries({ queryKey: treatmentsRootKey });
      }
    },
  });
}
