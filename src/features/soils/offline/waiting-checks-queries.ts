// The checks waiting in the browser as a query (read from IndexedDB, so it runs with no
// network), keeping a new check, and sending: each sent check refreshes its field's soils.
import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { getSoilPhotosQueryOptions } from '../api/get-soil-photos';
import { invalidateFieldSoils } from '../api/soil-query-keys';
import { keepCheck, listChecks, changeCheck, dropCheck, type WaitingCheck } from './soil-check-outbox';
import { sendWaitingChecks } from './send-soil-checks';

export const getWaitingChecksQueryOptions = (userId: number) =>
  queryOptions({ queryKey: ['soil-checks', 'waiting', userId], queryFn: () => listChecks(userId), networkMode: 'always', staleTime: Infinity });

export const useWaitingChecks = (userId: number) => useQuery(getWaitingChecksQueryOptions(userId));

async function sendAndRefresh(queryClient: QueryClient, userId: number): Promise<void> {
  const { sentFieldIds } = await sendWaitingChecks(userId);
  await queryClient.invalidateQueries({ queryKey: getWaitingChecksQueryOptions(userId).queryKey });
  for (const fieldId of new Set(sentFieldIds)) {
    await invalidateFieldSoils(queryClient, fieldId);
    await queryClient.invalidateQueries({ queryKey: getSoilPhotosQueryOptions(fieldId).queryKey });
  }
}

/** Sends what waits (a no-op when nothing does). */
export function useSendWaitingChecks(userId: number): () => Promise<void> {
  const queryClient = useQueryClient();
  return useCallback(() => sendAndRefresh(queryClient, userId), [queryClient, userId]);
}

/** Keeps a new check in the browser first, then tries to send it at once. */
export function useKeepSoilCheck() {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: async (check: Parameters<typeof keepCheck>[0]) => {
      await keepCheck(check);
      await queryClient.invalidateQueries({ queryKey: getWaitingChecksQueryOptions(check.userId).queryKey });
      void sendAndRefresh(queryClient, check.userId);
    },
  });
}

/** A failed check: try it again as it is, or let it go. */
export function useSettleFailedCheck() {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: async ({ check, action }: { check: WaitingCheck; action: 'retry' | 'discard' }) => {
      if (action === 'discard') await dropCheck(check.key);
      else await changeCheck(check.key, { state: 'waiting', reason: null });
      await queryClient.invalidateQueries({ queryKey: getWaitingChecksQueryOptions(check.userId).queryKey });
      if (action === 'retry') await sendAndRefresh(queryClient, check.userId);
    },
  });
}
