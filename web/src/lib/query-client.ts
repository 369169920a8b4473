import { QueryClient } from '@tanstack/react-query';
import { shouldRetry, type ApiError } from './api-client';

// Every fetcher goes through api-client, which raises ApiError only.
declare module '@tanstack/react-query' {
  interface Register {
    defaultError: ApiError;
  }
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: shouldRetry,
        staleTime: 30_000,
        refetchOnWindowFocus: false,
      },
      mutations: {
        // A write is repeated only by the person pressing the button again.
        retry: false,
      },
    },
  });
}

export const queryClient = createQueryClient();
