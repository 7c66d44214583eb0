import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionUser } from '@shared/schemas/auth';
import { api, isApiError } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/keys';

/** The signed-in user, or null when nobody is signed in (the 401 is an answer here, not an error). */
export async function getMe(signal?: AbortSignal): Promise<SessionUser | null> {
  try {
    const { user } = await api.get<{ user: SessionUser }>('/api/auth/me', { signal });
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
