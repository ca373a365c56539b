// GET /api/config — what the installation offers the client (the web basemaps; the dev mailbox while mail goes to the local fake).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ClientConfig } from '../../../../shared/schemas/config';

export type { ClientConfig };

const NO_CONFIG: ClientConfig = { basemaps: [], devMailbox: false };

/** Without a config answer the map simply runs on the farm's own relief. */
export async function getConfig(): Promise<ClientConfig> {
  try {
    return { ...NO_CONFIG, ...(await api.get<Partial<ClientConfig>>('/api/config')) };
  } catch {
    return NO_CONFIG;
  }
}

export const getConfigQueryOptions = () =>
  queryOptions({ queryKey: ['config'], queryFn: getConfig, staleTime: Infinity });

export const useConfig = () => useQuery(getConfigQueryOptions());
