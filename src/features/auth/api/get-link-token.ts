import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/keys';

/** What an invite or reset link is for; 404 `link_invalid` when it was used or has expired. */
export interface LinkToken {
  kind: 'invite' | 'reset';
  email: string;
  name: string;
}

export const getLinkToken = (token: string, signal?: AbortSignal) =>
  api.get<LinkToken>(`/api/auth/tokens/${encodeURIComponent(token)}`, { signal });

export const linkTokenQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.linkToken(token),
    queryFn: ({ signal }) => getLinkToken(token, signal),
    staleTime: Infinity,
    retry: false,
  });

export const useLinkToken = (token: string) => useQuery({ ...linkTokenQueryOptions(token), enabled: Boolean(token) });
