// GET /api/config — what the installation offers the client (a web basemap, if any; the dev mailbox while mail goes to the local fake).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type ClientConfig = { tileUrl: string | null; tileAttribution: string | null; devMailbox: boolean };

const NO_CONFIG: ClientConfig = { tileUrl: null, tileAttribution: null, devMailbox: false };

/** Without a config answer the map simply runs on its plain base. */
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
