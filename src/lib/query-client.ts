import { QueryClient } from '@tanstack/react-query';
import { ApiError, isApiUnreachable } from './api';

/**
 * Builds the app's QueryClient. Client errors (4xx) are never retried; an unreachable API is retried twice
 * with a short back-off before screens show the "server is not answering" state.
 */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) => {
          if (isApiUnreachable(error)) return failureCount < 2;
          if (error instanceof ApiError) return false;
          return failureCount < 1;
        },
        retryDelay: (attempt) => Math.min(500 * 2 ** attempt, 3000),
      },
      mutations: { retry: false },
    },
  });
}

/** Query keys shared across features, so invalidation stays consistent. */
export const queryKeys = {
  me: ['auth', 'me'] as const,
  workspaces: ['workspaces'] as const,
  workspace: (id: string) => ['workspaces', id] as const,
  members: (id: string) => ['workspaces', id, 'members'] as const,
  invitations: (id: string) => ['workspaces', id, 'invitations'] as const,
};
