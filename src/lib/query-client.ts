// TanStack Query defaults: do not retry what the server refused (4xx), retry a flaky network once.
// Queries run even when the browser says it is offline ('offlineFirst'): the service worker may
// answer them from its copy, so the farm map and the field screens open in the field.
import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      networkMode: 'offlineFirst',
      refetchOnWindowFocus: false,
      retry: (failureCount, error) => {
        if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
        return failureCount < 1;
      },
    },
    mutations: { retry: false },
  },
});
