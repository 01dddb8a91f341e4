import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError, isApiUnreachable } from './api';

/** True for "your session is gone" (not for a wrong password, which is `invalid_credentials`). */
function isSessionLost(error: unknown): boolean {
  return error instanceof ApiError && error.code === 'unauthenticated';
}

/**
 * Builds the app's QueryClient. Client errors (4xx) are never retried; an unreachable API is retried twice
 * with a short back-off before screens show the "server is not answering" state. When any request answers
 * `unauthenticated` (session expired or signed out elsewhere), the `me` query becomes null, so protected
 * routes send the user to sign-in and back.
 */
export function createQueryClient(): QueryClient {
  const onError = (error: unknown) => {
    if (isSessionLost(error) && client.getQueryData(queryKeys.me)) client.setQueryData(queryKeys.me, null);
  };
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
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
  return client;
}

/** Query keys shared across features, so invalidation stays consistent. */
export const queryKeys = {
  me: ['auth', 'me'] as const,
  workspaces: ['workspaces'] as const,
  workspace: (id: string) => ['workspaces', id] as const,
  members: (id: string) => ['workspaces', id, 'members'] as const,
  invitations: (id: string) => ['workspaces', id, 'invitations'] as const,
};
