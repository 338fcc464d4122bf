// One TanStack Query client for the app. Retries skip API errors that will not change on retry.
import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api';

export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, error) => count < 2 && (!isApiError(error) || error.code === 'network'),
      },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
