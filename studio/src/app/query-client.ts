import { QueryClient } from '@tanstack/react-query';
import { ApiError, NETWORK_FAILURE } from '../api/client';
import { connectSessionToCache } from '../api/session';

/** 4xx answers are decisions, not glitches: only network failures and 5xx are worth a retry. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  const transient = !(error instanceof ApiError) || error.status === NETWORK_FAILURE || error.status >= 500;
  return transient && failureCount < 2;
}

export function createQueryClient(): QueryClient {
  const queryClient = new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
  connectSessionToCache(queryClient);
  return queryClient;
}
