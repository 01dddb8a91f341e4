/**
 * The signed-in user, shared by every feature (features may not import each other, so this lives in lib/).
 *
 * - `useMe()` — the current user, `null` when signed out; errors only when the API is unreachable.
 * - `useSignIn()`, `useSignUp()`, `useSignOut()` — mutations that keep the `me` query in step.
 */
import { useMutation, useQuery, useQueryClient, type UseQueryResult } from '@tanstack/react-query';
import {
  AUTH_PATHS,
  type LoginRequest,
  type SignupRequest,
  type User,
  type UserResponse,
} from '../../server/contract/index.js';
import { api, hasStatus } from './api';
import { queryKeys } from './query-client';

export type { User };

/** Fetches the current user; resolves to null on 401 (signed out). */
export async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  try {
    const body = await api.get<UserResponse>(AUTH_PATHS.me, signal);
    return body.user;
  } catch (error) {
    if (hasStatus(error, 401)) return null;
    throw error;
  }
}

/** The current user (`data` is `User | null`). `isError` means the API could not be asked. */
export function useMe(): UseQueryResult<User | null> {
  return useQuery({ queryKey: queryKeys.me, queryFn: ({ signal }) => fetchMe(signal), staleTime: 60_000 });
}

/** The current user, for components rendered under a signed-in route (throws if called while signed out). */
export function useUser(): User {
  const { data } = useMe();
  if (!data) throw new Error('useUser() needs a signed-in route.');
  return data;
}

/** Signs in; on success the `me` query holds the user. Errors: ApiError `invalid_credentials`, `rate_limited`. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginRequest) => api.post<UserResponse>(AUTH_PATHS.login, input),
    onSuccess: ({ user }) => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== queryKeys.me[0] });
      queryClient.setQueryData(queryKeys.me, user);
    },
  });
}

/** Creates an account and signs in. Errors: ApiError `validation`, `conflict` (email taken). */
export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignupRequest) => api.post<UserResponse>(AUTH_PATHS.signup, input),
    onSuccess: ({ user }) => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== queryKeys.me[0] });
      queryClient.setQueryData(queryKeys.me, user);
    },
  });
}

/** Signs out and forgets every cached query. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>(AUTH_PATHS.logout),
    onSettled: () => {
      queryClient.clear();
      queryClient.setQueryData(queryKeys.me, null);
    },
  });
}
