import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

function shouldRetry(failureCount: number, error: unknown): boolean {
  // A 4xx answers the same way the second time; a dropped connection or a 5xx may not.
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      retry: shouldRetry,
      // Arena Wi-Fi often claims to be online while reaching nothing (or the reverse), so calls
      // are always attempted and fail with a message instead of pausing silently.
      networkMode: 'always',
    },
    mutations: { retry: false, networkMode: 'always' },
  },
});
